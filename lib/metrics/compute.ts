import { wrapDegrees } from "@/lib/geometry/angle";
import type { StoredMark } from "@/lib/marks/types";
import { downTheLineOutcomes } from "./down-the-line";
import { faceOnOutcomes } from "./face-on";
import { METRICS_BY_VIEW } from "./keys";
import { isMissing, type Outcome } from "./outcome";
import { overheadOutcomes } from "./overhead";
import { perturbations } from "./uncertainty";
import type { ClipContext, Measurement, MeasurementMethod } from "./types";

const BY_VIEW = { overhead: overheadOutcomes, "face-on": faceOnOutcomes, "down-the-line": downTheLineOutcomes } as const;

export type ComputeOptions = { monteCarloRuns?: number };

/**
 * Every measurement the clip's view knows, in a stable order; a missing mark gives value null and
 * everything it needs. Each value carries its uncertainty (uncertainty.ts) and which marks it used.
 */
export function computeMeasurements(clip: ClipContext, marks: StoredMark[], options: ComputeOptions = {}): Measurement[] {
  const compute = BY_VIEW[clip.view];
  const outcomes: Record<string, Outcome> = compute(clip, marks);
  const definitions = METRICS_BY_VIEW[clip.view];
  const measured = definitions.filter(({ key }) => { const o = outcomes[key]; return o && !isMissing(o) && Number.isFinite(o.value); });
  const deviations = new Map<string, number[]>(measured.map(({ key }) => [key, []]));
  if (measured.length > 0) {
    for (const noisy of perturbations(marks, options.monteCarloRuns)) {
      const again = compute(clip, noisy);
      for (const { key, unit } of measured) {
        const o = again[key];
        if (!o || isMissing(o) || !Number.isFinite(o.value)) continue;
        const d = o.value - (outcomes[key] as { value: number }).value;
        deviations.get(key)!.push(unit === "deg" ? wrapDegrees(d) : d);
      }
    }
  }
  const source = new Map(marks.map((m) => [m.id, m.source ?? "hand"]));
  return definitions.map(({ key, unit }) => {
    const o = outcomes[key];
    if (!o) throw new Error(`no computation for ${key}`);
    if (isMissing(o)) return { key, value: null, unit, needs: o.needs };
    if (!Number.isFinite(o.value)) return { key, value: null, unit, needs: ["marks that give a finite value (check for a zero ball speed)"] };
    const d = deviations.get(key) ?? [];
    const uncertainty = d.length > 1 ? Math.sqrt(d.reduce((s, x) => s + x * x, 0) / d.length) : null;
    const markIds = [...new Set(o.markIds)];
    const frames = [...new Set(o.frames)].sort((a, b) => a - b);
    return { key, value: o.value, uncertainty, unit, frames, markIds, method: methodOf(markIds, source) };
  });
}

function methodOf(markIds: readonly string[], source: Map<string, string>): MeasurementMethod {
  const kinds = new Set(markIds.map((id) => source.get(id) ?? "hand"));
  if (kinds.has("tracked")) return kinds.has("hand") ? "mixed" : "tracked";
  return "marked";
}
