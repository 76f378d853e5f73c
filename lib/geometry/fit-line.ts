import { normalize, type Vec2 } from "./vector";

export type FittedLine = { centroid: Vec2; direction: Vec2 };

/**
 * Total (orthogonal) least-squares line through points, so a vertical line works as well as a
 * horizontal one: the direction is the principal eigenvector of the 2×2 scatter matrix
 * (Pearson 1901, "On lines and planes of closest fit"). The direction is oriented so that the
 * projection grows from the earliest point to the latest (points are given in time order).
 */
export function fitLine(points: readonly Vec2[]): FittedLine {
  if (points.length < 2) throw new Error("a line needs at least two points");
  const n = points.length;
  const cx = points.reduce((s, p) => s + p[0], 0) / n;
  const cy = points.reduce((s, p) => s + p[1], 0) / n;
  let sxx = 0, sxy = 0, syy = 0;
  for (const [x, y] of points) {
    sxx += (x - cx) ** 2;
    sxy += (x - cx) * (y - cy);
    syy += (y - cy) ** 2;
  }
  if (sxx + syy === 0) throw new Error("all points coincide: no line");
  // Angle of the major axis of the scatter ellipse: θ = ½·atan2(2Sxy, Sxx − Syy).
  const theta = 0.5 * Math.atan2(2 * sxy, sxx - syy);
  let direction: Vec2 = normalize([Math.cos(theta), Math.sin(theta)]);
  // Orientation: covariance between point order and position along the line must be positive.
  const meanIndex = (n - 1) / 2;
  const trend = points.reduce((s, p, i) => s + (i - meanIndex) * ((p[0] - cx) * direction[0] + (p[1] - cy) * direction[1]), 0);
  if (trend < 0) direction = [-direction[0], -direction[1]];
  return { centroid: [cx, cy], direction };
}

/** Signed position of each point along a fitted line, measured from its centroid. */
export function positionsAlong(line: FittedLine, points: readonly Vec2[]): number[] {
  return points.map((p) => (p[0] - line.centroid[0]) * line.direction[0] + (p[1] - line.centroid[1]) * line.direction[1]);
}
