import { normalize, type Vec2 } from "@/lib/geometry/vector";
import type { StoredMark } from "@/lib/marks/types";
import type { ClipContext } from "./types";

/** Left-handed XOR mirrored reverses the reference directions (docs/measurements.md); both at once cancel. */
export const reversesReference = (clip: Pick<ClipContext, "handedness" | "mirrored">): boolean =>
  (clip.handedness === "left") !== clip.mirrored;

/** Overhead: t along the target line, r = (−t_y, t_x) to its right on a y-down image, reversed as above. */
export function overheadAxes(targetDirection: Vec2, reversed: boolean): { t: Vec2; r: Vec2 } {
  const t = normalize(targetDirection);
  const r: Vec2 = reversed ? [t[1], -t[0]] : [-t[1], t[0]];
  return { t, r };
}

/**
 * Side views: g along the ground (toward the target face-on, toward the toe down-the-line), by
 * default image +x (−x when reversed); a drawn ground line sets its direction, its sense taken to
 * agree with the default. u ⟂ g points up in the image. Null when the ground line is vertical.
 */
export function sideAxes(ground: StoredMark | undefined, reversed: boolean): { g: Vec2; u: Vec2 } | null {
  const fallback: Vec2 = reversed ? [-1, 0] : [1, 0];
  let g = fallback;
  if (ground && ground.points[0] && ground.points[1]) {
    const [a, b] = [ground.points[0], ground.points[1]];
    g = normalize([b[0] - a[0], b[1] - a[1]]);
    if (g[0] * fallback[0] < 0) g = [-g[0], -g[1]];
  }
  if (Math.abs(g[0]) < 1e-9) return null;
  const u: Vec2 = g[0] > 0 ? [g[1], -g[0]] : [-g[1], g[0]];
  return { g, u };
}
