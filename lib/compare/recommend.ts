import type { BuildComparison } from "./compare";
import { degrees, percent, signedDeg } from "./format";

export type Recommendation = { buildId: string; label: string; basis: "start_direction" | "face_angle_impact"; reasons: string[] };

/** Fewer putts than this and a build is not ranked: its spread is not known well enough. */
export const MIN_PUTTS = 3;
const FOCUS_FT = 6;

const statOf = (b: BuildComparison, key: string) => b.stats.find((s) => s.key === key);

/**
 * A suggested build with its reasons in plain words. Builds are ranked by the mean make probability
 * over the listed distances (from start-direction mean and spread); without start directions, by the
 * smallest face-angle spread at impact. A suggestion only: the fitter decides.
 */
export function recommend(builds: readonly BuildComparison[]): Recommendation | null {
  const ranked = builds
    .map((b) => {
      const start = statOf(b, "start_direction")?.summary;
      const chances = b.make.map((m) => m.probability).filter((p): p is number => p !== null);
      const usable = start && start.n >= MIN_PUTTS && chances.length > 0;
      return { b, score: usable ? chances.reduce((s, p) => s + p, 0) / chances.length : null };
    })
    .filter((r): r is { b: BuildComparison; score: number } => r.score !== null)
    .sort((x, y) => y.score - x.score);
  if (ranked.length > 0) return fromStartDirection(ranked.map((r) => r.b), builds);
  return fromFaceSpread(builds);
}

function fromStartDirection(ranked: BuildComparison[], all: readonly BuildComparison[]): Recommendation {
  const best = ranked[0]!;
  const startStats = statOf(best, "start_direction")!;
  const start = startStats.summary;
  const at = (b: BuildComparison) => b.make.find((m) => m.distanceFt === FOCUS_FT)?.probability ?? null;
  const reasons = [
    `Its putts started on line most often: mean start direction ${signedDeg(start.mean)}, spread (sd) ${degrees(startStats.spread!)} over ${start.n} putts.`,
  ];
  const p = at(best);
  if (p !== null) reasons.push(`From ${FOCUS_FT} ft that start-direction spread gives an estimated ${percent(p)} of putts holed${ranked.length > 1 ? `, the highest of the ${ranked.length} builds with enough putts` : ""}.`);
  const runnerUp = ranked[1];
  const q = runnerUp ? at(runnerUp) : null;
  if (runnerUp && p !== null && q !== null && p - q < 0.05) {
    reasons.push(`${runnerUp.label} is close behind (${percent(q)} from ${FOCUS_FT} ft): the difference may be chance; more putts would tell them apart.`);
  }
  reasons.push(...faceReasons(best, all));
  if (start.n < 5) reasons.push(`Only ${start.n} putts measured on this build: record a few more to firm this up.`);
  return { buildId: best.buildId, label: best.label, basis: "start_direction", reasons };
}

function fromFaceSpread(builds: readonly BuildComparison[]): Recommendation | null {
  const candidates = builds
    .map((b) => ({ b, face: statOf(b, "face_angle_impact") }))
    .filter((c) => c.face && c.face.summary.n >= MIN_PUTTS && c.face.spread !== null)
    .sort((x, y) => x.face!.spread! - y.face!.spread!);
  const best = candidates[0];
  if (!best) return null;
  return {
    buildId: best.b.buildId,
    label: best.b.label,
    basis: "face_angle_impact",
    reasons: [
      "No start directions measured yet, so this rests on the face at impact, which sets most of the start direction.",
      ...faceReasons(best.b, builds),
    ],
  };
}

function faceReasons(best: BuildComparison, all: readonly BuildComparison[]): string[] {
  const face = statOf(best, "face_angle_impact");
  if (!face || face.spread === null) return [];
  const reasons: string[] = [];
  const others = all.filter((b) => b.buildId !== best.buildId).map((b) => statOf(b, "face_angle_impact")?.spread).filter((s): s is number => s != null);
  const steadiest = others.every((s) => face.spread! <= s);
  reasons.push(
    `Face angle at impact: mean ${signedDeg(face.summary.mean)}, spread ${degrees(face.spread)}${steadiest && others.length > 0 ? ", the steadiest of the builds" : ""}.`,
  );
  if (face.noise !== null && face.summary.sd !== null && face.noise >= face.summary.sd) {
    reasons.push(`Its face spread is within the measurement's own precision (${degrees(face.noise)}): the putts may be steadier than can be told.`);
  }
  if (face.window && face.summary.shareInWindow !== null) {
    const inside = Math.round(face.summary.shareInWindow * face.summary.n);
    reasons.push(`${inside} of ${face.summary.n} putts had the face inside the studio's window (${signedDeg(face.window.min)} to ${signedDeg(face.window.max)}).`);
  }
  return reasons;
}
