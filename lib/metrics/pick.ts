import type { Vec2 } from "@/lib/geometry/vector";
import type { MarkRole, StoredMark } from "@/lib/marks/types";

// When several marks compete for one slot, the last in the list (the latest drawn) wins.

export function lastLine(marks: readonly StoredMark[], role: MarkRole, frame?: number): StoredMark | undefined {
  return marks.filter((m) => m.kind === "line" && m.role === role && (frame === undefined || m.frame === frame)).at(-1);
}

export function lastOfKind(marks: readonly StoredMark[], kind: StoredMark["kind"]): StoredMark | undefined {
  return marks.filter((m) => m.kind === kind).at(-1);
}

export type TrackPoint = { frame: number; point: Vec2; markId: string };

/** One point per frame for a role (ball, clubhead, marker), sorted by frame. */
export function track(marks: readonly StoredMark[], role: MarkRole, keep: (frame: number) => boolean): TrackPoint[] {
  const byFrame = new Map<number, TrackPoint>();
  for (const m of marks) {
    if (m.kind === "point" && m.role === role && keep(m.frame) && m.points[0]) {
      byFrame.set(m.frame, { frame: m.frame, point: m.points[0], markId: m.id });
    }
  }
  return [...byFrame.values()].sort((a, b) => a.frame - b.frame);
}

/** Lines of a role on each frame that passes `keep`, one per frame, sorted by frame. */
export function linesByFrame(marks: readonly StoredMark[], role: MarkRole, keep: (frame: number) => boolean): StoredMark[] {
  const byFrame = new Map<number, StoredMark>();
  for (const m of marks) if (m.kind === "line" && m.role === role && keep(m.frame)) byFrame.set(m.frame, m);
  return [...byFrame.values()].sort((a, b) => a.frame - b.frame);
}

export const plural = (n: number, word: string): string => `${n} ${word}${n === 1 ? "" : "s"}`;
