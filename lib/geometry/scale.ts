import { distance, type Vec2 } from "./vector";

/** Ball diameter, Rules of Golf Equipment Rules Appendix III: at least 1.680 in = 42.67 mm. */
export const BALL_DIAMETER_MM = 42.67;

/** Millimetres per pixel from a drawn segment of known length (default: the ball's diameter). */
export function mmPerPixel(a: Vec2, b: Vec2, lengthMm: number = BALL_DIAMETER_MM): number {
  const px = distance(a, b);
  if (!(px > 0)) throw new Error("a scale needs two distinct points");
  if (!(lengthMm > 0)) throw new Error("a scale needs a positive known length");
  return lengthMm / px;
}
