// Playback on the review screen: which frame to show a given time after pressing play. Speeds are
// fractions of real time, and real time is the camera's: one second of swing takes one second on
// screen only at 1×, i.e. `captureFps` frames a second (the file's own frame rate plays no part).
import { clampFrame } from "./frames";

export const PLAYBACK_SPEEDS: readonly { label: string; value: number }[] = [
  { label: "Real time", value: 1 },
  { label: "1/2", value: 1 / 2 },
  { label: "1/4", value: 1 / 4 },
  { label: "1/8", value: 1 / 8 },
  { label: "1/16", value: 1 / 16 },
  { label: "1/32", value: 1 / 32 },
];

export type PlayRange = { from: number; to: number };
export type Playback = PlayRange & { captureFps: number; speed: number; loop: boolean };

/** Address → finish when both are set, else as much of that as is known, else the whole clip. */
export function defaultRange(moments: { address: number | null; finish: number | null }, frameCount: number): PlayRange {
  const last = Math.max(frameCount - 1, 0);
  const from = clampFrame(moments.address ?? 0, frameCount);
  const to = clampFrame(moments.finish ?? last, frameCount);
  return to > from ? { from, to } : { from: 0, to: last };
}

/** Frames shown per second of wall time. */
export const framesPerSecond = (captureFps: number, speed: number) => captureFps * speed;

/**
 * The frame `elapsedMs` after play was pressed on `start` (a frame inside the range): frames
 * advance at captureFps × speed; a loop wraps to `from` after `to`, otherwise play ends on `to`.
 */
export function frameAt(p: Playback, start: number, elapsedMs: number): { frame: number; ended: boolean } {
  const length = p.to - p.from + 1;
  const advanced = Math.floor((Math.max(elapsedMs, 0) / 1000) * framesPerSecond(p.captureFps, p.speed) + 1e-9);
  const offset = Math.min(Math.max(start, p.from), p.to) - p.from + advanced;
  if (p.loop) return { frame: p.from + (offset % length), ended: false };
  return offset >= length - 1 ? { frame: p.to, ended: true } : { frame: p.from + offset, ended: false };
}

/** Where play starts: from the cursor when it is inside the range and not on its last frame, else from the range's start. */
export const startFrame = (r: PlayRange, cursor: number) => (cursor >= r.from && cursor < r.to ? cursor : r.from);
