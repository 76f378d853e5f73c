import type { Vec2 } from "@/lib/geometry/vector";
import type { MarkRole, StoredMark } from "@/lib/marks/types";

// When several marks compete for one slot, a hand mark wins over a tracked proposal, and among
// marks of the same source the last in the list (the latest drawn) wins.

const isHand = (m: StoredMark) => (m.source ?? "hand") === "hand";

/** The winning mark of a slot: the latest hand mark, else the latest proposal. */
export function preferred<T extends StoredMark>(candidates: readonly T[]): T | undefined {
  return candidates.filter(isHand).at(-1) ?? candidates.at(-1);
}

/** Of several marks that each read the same thing (scales), the hand ones when any, else all. */
export function preferredSet<T extends StoredMark>(candidates: readonly T[]): T[] {
  const hand = candidates.filter(isHand);
  return hand.length > 0 ? hand : [...candidates];
}

export function lastLine(marks: readonly StoredMark[], role: MarkRole, frame?: number): StoredMark | undefined {
  return preferred(marks.filter((m) => m.kind === "line" && m.role === role && (frame === undefined || m.frame === frame)));
}

export type TrackPoint = { frame: number; point: Vec2; markId: string };

/** One point per frame for a role (ball, clubhead, marker), sorted by frame. */
export function track(marks: readonly StoredMark[], role: MarkRole, keep: (frame: number) => boolean): TrackPoint[] {
  const byFrame = new Map<number, StoredMark[]>();
  for (const m of marks) {
    if (m.kind === "point" && m.role === role && keep(m.frame) && m.points[0]) byFrame.set(m.frame, [...(byFrame.get(m.frame) ?? []), m]);
  }
  return [...byFrame.entries()]
    .map(([frame, list]) => {
      const m = preferred(list)!;
      return { frame, point: m.points[0] as Vec2, markId: m.id };
    })
    .sort((a, b) => a.frame - b.frame);
}

/** Lines of a role on each frame that passes `keep`, one per frame, sorted by frame. */
export function linesByFrame(marks: readonly StoredMark[], role: MarkRole, keep: (frame: number) => boolean): StoredMark[] {
  const byFrame = new Map<number, StoredMark[]>();
  for (const m of marks) if (m.kind === "line" && m.role === role && keep(m.frame)) byFrame.set(m.frame, [...(byFrame.get(m.frame) ?? []), m]);
  return [...byFrame.values()].map((list) => preferred(list)!).sort((a, b) => a.frame - b.frame);
}

export const plural = (n: number, word: string): string => `${n} ${word}${n === 1 ? "" : "s"}`;
