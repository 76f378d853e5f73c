import type { MarkKind, MarkRole, View } from "./types";

/**
 * Which roles a mark may carry, by view and kind. Our choices, from what each camera can see:
 * - target only overhead (the line of play is seen from above); sole only down-the-line;
 *   marker (a dot on the ball's side) only face-on, where the ball's turning is seen;
 * - ground lines face-on and down-the-line (overhead the image itself is the ground);
 * - angle marks are free annotations of the club (face, shaft, sole, path) where that part is seen;
 * - scale: the ball's diameter (role ball) in every view, or a known length on the ground;
 * - plane: four corners of a known rectangle on the ground, overhead only (the ground-plane map).
 */
export const ROLES_BY_VIEW_AND_KIND: Record<View, Record<MarkKind, readonly MarkRole[]>> = {
  overhead: {
    point: ["ball", "clubhead"],
    line: ["face", "target", "path"],
    angle: ["face", "path"],
    scale: ["ball", "ground"],
    plane: ["ground"],
  },
  "face-on": {
    point: ["ball", "clubhead", "marker"],
    line: ["face", "shaft", "path", "ground"],
    angle: ["face", "shaft", "path"],
    scale: ["ball", "ground"],
    plane: [],
  },
  "down-the-line": {
    point: ["ball", "clubhead"],
    line: ["shaft", "sole", "face", "ground"],
    angle: ["shaft", "sole"],
    scale: ["ball", "ground"],
    plane: [],
  },
};

export function roleFits(view: View, kind: MarkKind, role: MarkRole): boolean {
  return ROLES_BY_VIEW_AND_KIND[view][kind].includes(role);
}
