/**
 * The least-squares fits behind every proposal, each with its precision from its own residuals.
 * - Circle: the algebraic fit of Kåsa (1976, "A circle fitting procedure and its error analysis",
 *   IEEE Trans. Instrum. Meas. 25(1)): minimise Σ (x² + y² + Dx + Ey + F)², a linear problem.
 * - Line: total least squares (orthogonal regression; principal axis of the points' scatter).
 */
import type { Vec2 } from "@/lib/geometry/vector";

export type CircleFit = { cx: number; cy: number; r: number; residualStd: number; n: number; centreStdErr: number; radiusStdErr: number };

function solve3(a: number[][], b: number[]): number[] | null {
  // Cramer's rule on a 3×3 system: small, exact enough for the normal equations here.
  const det = (m: number[][]) =>
    m[0]![0]! * (m[1]![1]! * m[2]![2]! - m[1]![2]! * m[2]![1]!) -
    m[0]![1]! * (m[1]![0]! * m[2]![2]! - m[1]![2]! * m[2]![0]!) +
    m[0]![2]! * (m[1]![0]! * m[2]![1]! - m[1]![1]! * m[2]![0]!);
  const d = det(a);
  if (!Number.isFinite(d) || Math.abs(d) < 1e-12) return null;
  return [0, 1, 2].map((col) => det(a.map((row, i) => row.map((v, j) => (j === col ? b[i]! : v)))) / d);
}

/** Kåsa's algebraic circle fit; null for fewer than 3 points or collinear points. */
export function fitCircleKasa(points: readonly Vec2[]): CircleFit | null {
  const n = points.length;
  if (n < 3) return null;
  // Centred coordinates keep the normal equations well conditioned.
  let mx = 0, my = 0;
  for (const [x, y] of points) { mx += x; my += y; }
  mx /= n; my /= n;
  let sxx = 0, sxy = 0, syy = 0, sx = 0, sy = 0, sz = 0, sxz = 0, syz = 0;
  for (const [px, py] of points) {
    const x = px - mx, y = py - my, z = x * x + y * y;
    sxx += x * x; sxy += x * y; syy += y * y; sx += x; sy += y; sz += z; sxz += x * z; syz += y * z;
  }
  // Unknowns D, E, F of x² + y² + Dx + Ey + F = 0.
  const sol = solve3([[sxx, sxy, sx], [sxy, syy, sy], [sx, sy, n]], [-sxz, -syz, -sz]);
  if (!sol) return null;
  const [D, E, F] = sol as [number, number, number];
  const cx = -D / 2, cy = -E / 2;
  const r2 = cx * cx + cy * cy - F;
  if (!(r2 > 0)) return null;
  const r = Math.sqrt(r2);
  let ss = 0;
  for (const [px, py] of points) ss += (Math.hypot(px - mx - cx, py - my - cy) - r) ** 2;
  const residualStd = n > 3 ? Math.sqrt(ss / (n - 3)) : 0;
  // For points spread round the whole circle, var(centre coordinate) ≈ 2σ²/n, var(r) ≈ σ²/n.
  return { cx: cx + mx, cy: cy + my, r, residualStd, n, centreStdErr: residualStd * Math.sqrt(2 / n), radiusStdErr: residualStd / Math.sqrt(n) };
}

/** Refits without points more than `k` residual standard deviations off, a few times. */
export function fitCircleClipped(points: readonly Vec2[], k = 3, rounds = 2, floorPx = 0.05): CircleFit | null {
  let kept = [...points];
  let fit = fitCircleKasa(kept);
  for (let i = 0; i < rounds && fit; i++) {
    const f = fit;
    const limit = k * Math.max(f.residualStd, floorPx);
    const next = kept.filter(([x, y]) => Math.abs(Math.hypot(x - f.cx, y - f.cy) - f.r) <= limit);
    if (next.length === kept.length || next.length < 6) break;
    kept = next;
    fit = fitCircleKasa(kept);
  }
  return fit;
}

export type LineFit = {
  /** the points' centroid, on the line */
  centre: Vec2;
  /** unit direction */
  direction: Vec2;
  residualStd: number;
  n: number;
  /** Σ t² of the points' positions t along the line from the centre */
  spread: number;
};

/** Total least squares line; null for fewer than 2 distinct points. */
export function fitLineTls(points: readonly Vec2[]): LineFit | null {
  const n = points.length;
  if (n < 2) return null;
  let mx = 0, my = 0;
  for (const [x, y] of points) { mx += x; my += y; }
  mx /= n; my /= n;
  let sxx = 0, sxy = 0, syy = 0;
  for (const [x, y] of points) { sxx += (x - mx) ** 2; sxy += (x - mx) * (y - my); syy += (y - my) ** 2; }
  if (sxx + syy === 0) return null;
  const angle = 0.5 * Math.atan2(2 * sxy, sxx - syy);
  const direction: Vec2 = [Math.cos(angle), Math.sin(angle)];
  const normal: Vec2 = [-direction[1], direction[0]];
  let ss = 0, spread = 0;
  for (const [x, y] of points) {
    ss += ((x - mx) * normal[0] + (y - my) * normal[1]) ** 2;
    spread += ((x - mx) * direction[0] + (y - my) * direction[1]) ** 2;
  }
  return { centre: [mx, my], direction, residualStd: n > 2 ? Math.sqrt(ss / (n - 2)) : 0, n, spread };
}

/** The point at signed distance t along the line from its centre. */
export function pointOnLine(fit: LineFit, t: number): Vec2 {
  return [fit.centre[0] + fit.direction[0] * t, fit.centre[1] + fit.direction[1] * t];
}

/** One standard error, across the line, of its point at distance t: σ²(1/n + t²/Σt²). */
export function lineStdErrAt(fit: LineFit, t: number): number {
  if (fit.n < 3 || fit.spread === 0) return fit.residualStd;
  return fit.residualStd * Math.sqrt(1 / fit.n + (t * t) / fit.spread);
}

/** Refits keeping points within `k` residual standard deviations (at least `floorPx`) of the line. */
export function fitLineClipped(points: readonly Vec2[], k = 3, rounds = 3, floorPx = 0.5): LineFit | null {
  let kept = [...points];
  let fit = fitLineTls(kept);
  for (let i = 0; i < rounds && fit; i++) {
    const f = fit;
    const normal: Vec2 = [-f.direction[1], f.direction[0]];
    const limit = k * Math.max(f.residualStd, floorPx);
    const next = kept.filter(([x, y]) => Math.abs((x - f.centre[0]) * normal[0] + (y - f.centre[1]) * normal[1]) <= limit);
    if (next.length === kept.length || next.length < 3) break;
    kept = next;
    fit = fitLineTls(kept);
  }
  return fit;
}
