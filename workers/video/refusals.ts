/** Which uploads the pipeline refuses, and the plain words it gives the fitter. */

import type { VideoHeader } from "./ffmpeg";

export const CLIP_LIMITS = { maxDurationS: 60, maxFrames: 20_000, maxLongSidePx: 4096 } as const;

export type RefusalCode =
  | "empty-file" | "not-a-video" | "no-video-stream" | "still-image" | "truncated"
  | "too-long" | "too-many-frames" | "too-large";

/** The clip cannot be used; `reason` is shown to the fitter as the clip's failure. */
export class ClipRefusedError extends Error {
  constructor(readonly code: RefusalCode, readonly reason: string) {
    super(reason);
    this.name = "ClipRefusedError";
  }
}

export function refuseUnusable(header: VideoHeader): void {
  if (!header.hasVideo) {
    throw new ClipRefusedError("no-video-stream", header.hasAudio ? "The file has sound but no picture." : "The file has no video picture in it.");
  }
  if (header.isStillImage) throw new ClipRefusedError("still-image", "This is a still picture, not a video.");
  const longSide = Math.max(header.width, header.height);
  if (longSide > CLIP_LIMITS.maxLongSidePx) {
    throw new ClipRefusedError("too-large", `The video is ${header.width} × ${header.height} pixels; the limit is ${CLIP_LIMITS.maxLongSidePx} pixels on the long side. Record at 4K or less.`);
  }
  if (header.durationS > CLIP_LIMITS.maxDurationS) {
    throw new ClipRefusedError("too-long", `The clip lasts ${Math.round(header.durationS)} seconds; the limit is ${CLIP_LIMITS.maxDurationS}. Trim it to the stroke.`);
  }
  if ((header.headerFrameCount ?? 0) > CLIP_LIMITS.maxFrames) throw tooManyFrames(header.headerFrameCount ?? 0);
}

export function tooManyFrames(count: number): ClipRefusedError {
  return new ClipRefusedError("too-many-frames", `The clip has ${count.toLocaleString("en")} frames; the limit is ${CLIP_LIMITS.maxFrames.toLocaleString("en")}. Trim it to the stroke.`);
}

export function truncated(framesRead: number, framesInHeader: number): ClipRefusedError {
  return new ClipRefusedError("truncated", `The video file is incomplete: only ${framesRead} of its ${framesInHeader} frames could be read. It was probably cut short during upload.`);
}
