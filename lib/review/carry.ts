// Carrying reference marks from the previous putt of the same camera: the line that gives the
// view its direction (target overhead, ground face-on and down-the-line), the scale and the ground
// plane stay valid as long as the camera has not moved (see camera-still.ts). Only the fitter's
// own marks are carried; the clip's tracker makes its own proposals.
import type { Vec2 } from "@/lib/geometry/vector";
import type { View } from "@/lib/marks/types";
import type { ReviewMark } from "./marks";
import type { MarkDraft } from "./tools";

const directionRole = (view: View) => (view === "overhead" ? "target" : "ground");
const isHand = (m: ReviewMark) => (m.source ?? "hand") === "hand";

/** The latest hand-made direction line, scale and plane of an earlier clip (each at most once). */
export function carriable(marks: readonly ReviewMark[], view: View): ReviewMark[] {
  const hand = marks.filter(isHand);
  const last = (keep: (m: ReviewMark) => boolean) => hand.filter(keep).at(-1);
  return [
    last((m) => m.kind === "line" && m.role === directionRole(view)),
    last((m) => m.kind === "scale"),
    last((m) => m.kind === "plane" && view === "overhead"),
  ].filter((m): m is ReviewMark => m !== undefined);
}

/** Worth carrying only into a clip the fitter has not touched yet (no hand marks at all). */
export const wantsCarry = (marks: readonly ReviewMark[]) => !marks.some(isHand);

/** The straight pieces of the marks, for the camera comparison's band. */
export function segmentsOf(marks: readonly ReviewMark[]): [Vec2, Vec2][] {
  return marks.flatMap((m) => {
    const ring = m.kind === "plane" ? [...m.points, m.points[0]!] : m.points;
    return ring.slice(1).map((p, i) => [ring[i]!, p] as [Vec2, Vec2]);
  });
}

/** The carried marks as new marks of this clip, all on `frame` (the frame the screen opens on). */
export function carryDrafts(marks: readonly ReviewMark[], frame: number): MarkDraft[] {
  return marks.map((m) => {
    const draft: MarkDraft = { frame, kind: m.kind, role: m.role, points: m.points.map((p) => [p[0], p[1]] as Vec2) };
    if (m.lengthMm != null) draft.lengthMm = m.lengthMm;
    if (m.widthMm != null) draft.widthMm = m.widthMm;
    if (m.heightMm != null) draft.heightMm = m.heightMm;
    return draft;
  });
}

/** "target line and scale" — what was carried, in words. */
export function carriedWords(marks: readonly ReviewMark[]): string {
  const names = marks.map((m) => (m.kind === "line" ? `${m.role} line` : m.kind === "plane" ? "ground plane" : "scale"));
  return names.length <= 1 ? (names[0] ?? "") : `${names.slice(0, -1).join(", ")} and ${names.at(-1)}`;
}
