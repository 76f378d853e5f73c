/**
 * Sub-pixel motion of a rigid patch between two pictures: the Lucas–Kanade method (Lucas & Kanade
 * 1981, "An iterative image registration technique with an application to stereo vision", IJCAI)
 * as Gauss–Newton on the sum of squared differences, for a shift, a small turn about the patch's
 * centre and a brightness offset (Baker & Matthews 2004, "Lucas-Kanade 20 years on", IJCV 56(3)).
 * Every pixel of the patch speaks, so a rigid thing's displacement is found far finer than any one
 * edge point; the turn keeps a face that closes through the stroke from dragging the shift sideways.
 */
import type { Vec2 } from "@/lib/geometry/vector";

/** A value at any picture position (bilinear); NaN outside the picture. */
export type Sampler = (x: number, y: number) => number;

/** The patch: its pixel positions and the values there in the reference picture. */
export type Template = { points: readonly Vec2[]; values: readonly number[] };

export type Registration = {
  /** the patch's centre moves by `shift` and the patch turns by `turnRad` about it */
  centre: Vec2;
  shift: Vec2;
  turnRad: number;
  /** the picture's level minus the template's (flicker) */
  offset: number;
  /** one standard error of the shift along its worse axis, px: residual variance × (JᵀJ)⁻¹ */
  precisionPx: number;
  turnPrecisionRad: number;
  residual: number;
  iterations: number;
};

const GRADIENT_STEP_PX = 0.5;
const MAX_ITERATIONS = 40;
const CONVERGED_PX = 1e-4;
const PARAMETERS = 4; // shift x, shift y, turn, offset

/** Inverse of a small symmetric positive-definite matrix (Gauss–Jordan); null when singular. */
function invert(m: number[][]): number[][] | null {
  const n = m.length;
  const a = m.map((row, i) => [...row, ...Array.from({ length: n }, (_, j) => (i === j ? 1 : 0))]);
  for (let c = 0; c < n; c++) {
    let pivot = c;
    for (let r = c + 1; r < n; r++) if (Math.abs(a[r]![c]!) > Math.abs(a[pivot]![c]!)) pivot = r;
    if (!(Math.abs(a[pivot]![c]!) > 1e-12)) return null;
    [a[c], a[pivot]] = [a[pivot]!, a[c]!];
    const p = a[c]![c]!;
    for (let j = 0; j < 2 * n; j++) a[c]![j]! /= p;
    for (let r = 0; r < n; r++) {
      if (r === c) continue;
      const f = a[r]![c]!;
      if (f !== 0) for (let j = 0; j < 2 * n; j++) a[r]![j]! -= f * a[c]![j]!;
    }
  }
  return a.map((row) => row.slice(n));
}

/** Where a template point lands for shift (tx, ty) and turn θ about the centre. */
function warp(p: Vec2, centre: Vec2, tx: number, ty: number, theta: number): Vec2 {
  const dx = p[0] - centre[0], dy = p[1] - centre[1];
  const c = Math.cos(theta), s = Math.sin(theta);
  return [centre[0] + c * dx - s * dy + tx, centre[1] + s * dx + c * dy + ty];
}

/**
 * The motion that best makes `sample(warp(p)) = value(p) + offset` over the template, from the
 * shift `start`. The Jacobian is the template's own gradient (`templateSample`, the reference
 * picture's sampler), fixed over the iterations (Hager & Belhumeur 1998; Baker & Matthews 2004,
 * §3.2): stable where the picture's own gradient, read between pixels, would swing from step to
 * step. A step that raises the squared error is halved. Null when the patch has no texture to
 * register on (singular), a sample falls outside the picture, or it does not converge.
 * `noiseAreaPx`: the pixels over which the pictures' noise is correlated (4πσ² after a Gaussian
 * smoothing of σ): the least-squares covariance assumes independent residuals and would otherwise
 * state the shift that many times too precisely (in variance).
 */
export function registerPatch(template: Template, templateSample: Sampler, sample: Sampler, start: Vec2, noiseAreaPx = 1): Registration | null {
  const { points, values } = template;
  const n = points.length;
  if (n < 3 * PARAMETERS) return null;
  const centre: Vec2 = [points.reduce((a, p) => a + p[0], 0) / n, points.reduce((a, p) => a + p[1], 0) / n];
  const h = GRADIENT_STEP_PX;
  const jacobian = points.map(([x, y]) => {
    const gx = (templateSample(x + h, y) - templateSample(x - h, y)) / (2 * h);
    const gy = (templateSample(x, y + h) - templateSample(x, y - h)) / (2 * h);
    return [gx, gy, gx * -(y - centre[1]) + gy * (x - centre[0]), -1];
  });
  if (jacobian.some((j) => !Number.isFinite(j[0]!) || !Number.isFinite(j[1]!))) return null;
  const jtj = Array.from({ length: PARAMETERS }, () => new Array<number>(PARAMETERS).fill(0));
  for (const j of jacobian) for (let r = 0; r < PARAMETERS; r++) for (let c = 0; c < PARAMETERS; c++) jtj[r]![c]! += j[r]! * j[c]!;
  const cov = invert(jtj);
  if (!cov) return null;

  const errors = (q: readonly number[]): { e: Float64Array; sse: number } | null => {
    const e = new Float64Array(n);
    let sse = 0;
    for (let i = 0; i < n; i++) {
      const [x, y] = warp(points[i]!, centre, q[0]!, q[1]!, q[2]!);
      const c = sample(x, y);
      if (!Number.isFinite(c)) return null;
      e[i] = c - values[i]! - q[3]!;
      sse += e[i]! * e[i]!;
    }
    return { e, sse };
  };
  let q = [start[0], start[1], 0, 0];
  let current = errors(q);
  if (!current) return null;
  for (let iteration = 1; iteration <= MAX_ITERATIONS; iteration++) {
    const jte = new Array<number>(PARAMETERS).fill(0);
    for (let i = 0; i < n; i++) for (let r = 0; r < PARAMETERS; r++) jte[r]! += jacobian[i]![r]! * current.e[i]!;
    const step = cov.map((row) => -row.reduce((acc, v, c) => acc + v * jte[c]!, 0));
    let scale = 1;
    let trial = q.map((v, i) => v + step[i]!);
    let next = errors(trial);
    while (next && next.sse > current.sse && scale > 1 / 64) {
      scale /= 2;
      trial = q.map((v, i) => v + scale * step[i]!);
      next = errors(trial);
    }
    if (!next) return null;
    const improved = next.sse <= current.sse;
    if (improved) {
      q = trial;
      current = next;
    }
    if (scale * Math.hypot(step[0]!, step[1]!) < CONVERGED_PX || !improved) {
      const s2 = (current.sse / Math.max(1, n - PARAMETERS)) * Math.max(1, noiseAreaPx);
      // The worse axis: the larger eigenvalue of the shift's 2×2 covariance.
      const [a, b, d] = [cov[0]![0]! * s2, cov[0]![1]! * s2, cov[1]![1]! * s2];
      const worst = (a + d) / 2 + Math.sqrt(((a - d) / 2) ** 2 + b * b);
      return {
        centre, shift: [q[0]!, q[1]!], turnRad: q[2]!, offset: q[3]!, precisionPx: Math.sqrt(Math.max(0, worst)),
        turnPrecisionRad: Math.sqrt(Math.max(0, cov[2]![2]! * s2)), residual: Math.sqrt(current.sse / Math.max(1, n - PARAMETERS)), iterations: iteration,
      };
    }
    if (Math.hypot(q[0]! - start[0], q[1]! - start[1]) > 64) return null;
  }
  return null;
}

/** Where a point of the reference picture is after the registration's motion. */
export function movedPoint(r: Pick<Registration, "centre" | "shift" | "turnRad">, p: Vec2): Vec2 {
  return warp(p, r.centre, r.shift[0], r.shift[1], r.turnRad);
}
