import { fitLine } from "@/lib/geometry/fit-line";
import type { Vec2 } from "@/lib/geometry/vector";
import { HAND_CLICK_PRECISION_PX, type StoredMark } from "@/lib/marks/types";
import { seededNormal } from "@/lib/stats/random";

/**
 * Uncertainty by a seeded Monte Carlo (JCGM 101:2008, "Propagation of distributions using a Monte
 * Carlo method"): every point is moved by independent normal noise of its mark's precision and
 * the whole computation is run again; a value's uncertainty is the root-mean-square of its
 * deviations from the unperturbed value. Fixed seed: the same marks always give the same figure.
 */
export const MONTE_CARLO_RUNS = 64;
const SEED = 0x5eed;

/**
 * Each mark's point precision (px): its own, or the stated hand-click default. A track's points
 * are given at least the scatter of the track about its fitted line (√(SSE/(n−2)) of the
 * perpendicular residuals), so a track that does not lie on a line is not trusted beyond it.
 */
export function pointPrecisions(marks: readonly StoredMark[]): Map<string, number> {
  const out = new Map(marks.map((m) => [m.id, m.precisionPx ?? HAND_CLICK_PRECISION_PX]));
  for (const role of ["ball", "clubhead"] as const) {
    for (const source of ["hand", "tracked"] as const) {
      const points = marks.filter((m) => m.kind === "point" && m.role === role && (m.source ?? "hand") === source).sort((a, b) => a.frame - b.frame);
      if (points.length < 3) continue;
      const scatter = perpendicularScatter(points.map((m) => m.points[0] as Vec2));
      if (scatter === null) continue;
      for (const m of points) out.set(m.id, Math.max(out.get(m.id) as number, scatter));
    }
  }
  return out;
}

function perpendicularScatter(points: Vec2[]): number | null {
  try {
    const line = fitLine(points);
    const normal: Vec2 = [-line.direction[1], line.direction[0]];
    const sse = points.reduce((s, p) => s + ((p[0] - line.centroid[0]) * normal[0] + (p[1] - line.centroid[1]) * normal[1]) ** 2, 0);
    return Math.sqrt(sse / (points.length - 2));
  } catch {
    return null;
  }
}

/** The marks with every point moved by noise of its precision; one call per Monte Carlo run. */
export function perturbations(marks: readonly StoredMark[], runs = MONTE_CARLO_RUNS): StoredMark[][] {
  const precision = pointPrecisions(marks);
  const normal = seededNormal(SEED);
  return Array.from({ length: runs }, () =>
    marks.map((m) => {
      const sigma = precision.get(m.id) as number;
      return { ...m, points: m.points.map((p): Vec2 => [p[0] + sigma * normal(), p[1] + sigma * normal()]) };
    }),
  );
}
