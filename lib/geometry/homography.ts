import { solveLinearSystem } from "./linear-solve";
import type { Vec2 } from "./vector";

/** 3×3 projective map, row-major, normalised so that H[2][2] = 1. */
export type Homography = readonly [readonly [number, number, number], readonly [number, number, number], readonly [number, number, number]];

export type Quad = readonly [Vec2, Vec2, Vec2, Vec2];

/**
 * Homography taking four source points to four destination points: the direct linear transform
 * with h33 = 1, an 8×8 linear system (Hartley & Zisserman, Multiple View Geometry, 2nd ed., §4.1).
 */
export function homographyFromPoints(src: Quad, dst: Quad): Homography {
  const rows: number[][] = [];
  const rhs: number[] = [];
  for (let i = 0; i < 4; i++) {
    const [x, y] = src[i]!;
    const [u, v] = dst[i]!;
    rows.push([x, y, 1, 0, 0, 0, -u * x, -u * y]);
    rhs.push(u);
    rows.push([0, 0, 0, x, y, 1, -v * x, -v * y]);
    rhs.push(v);
  }
  const h = solveLinearSystem(rows, rhs) as [number, number, number, number, number, number, number, number];
  return [
    [h[0], h[1], h[2]],
    [h[3], h[4], h[5]],
    [h[6], h[7], 1],
  ];
}

/** Applies H to a point in homogeneous coordinates and divides by w. */
export function applyHomography(h: Homography, [x, y]: Vec2): Vec2 {
  const w = h[2][0] * x + h[2][1] * y + h[2][2];
  return [(h[0][0] * x + h[0][1] * y + h[0][2]) / w, (h[1][0] * x + h[1][1] * y + h[1][2]) / w];
}

export function determinant3(h: Homography): number {
  const [[a, b, c], [d, e, f], [g, i, j]] = h;
  return a * (e * j - f * i) - b * (d * j - f * g) + c * (d * i - e * g);
}

/**
 * Whether H keeps orientation at point p: the Jacobian determinant of a projective map is
 * det(H) / w³ (Hartley & Zisserman §2.3), so its sign is sign(det H)·sign(w).
 */
export function keepsOrientation(h: Homography, p: Vec2): boolean {
  const w = h[2][0] * p[0] + h[2][1] * p[1] + h[2][2];
  return determinant3(h) * w > 0;
}

/** The rectangle's corners in millimetres, in the same order as the drawn plane points. */
export function rectangleCornersMm(widthMm: number, heightMm: number): Quad {
  return [[0, 0], [widthMm, 0], [widthMm, heightMm], [0, heightMm]];
}
