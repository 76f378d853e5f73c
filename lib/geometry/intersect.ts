import { add, cross, scale, sub, type Vec2 } from "./vector";

/** Intersection of the lines p + s·d and q + t·e (Cramer's rule); null when they are parallel. */
export function intersectLines(p: Vec2, d: Vec2, q: Vec2, e: Vec2): Vec2 | null {
  const denominator = cross(d, e);
  if (Math.abs(denominator) < 1e-12 * Math.hypot(...d) * Math.hypot(...e)) return null;
  const s = cross(sub(q, p), e) / denominator;
  return add(p, scale(d, s));
}
