import type { StoredMark } from "@/lib/marks/types";
import { downTheLineOutcomes } from "./down-the-line";
import { faceOnOutcomes } from "./face-on";
import { METRICS_BY_VIEW } from "./keys";
import { isMissing, type Outcome } from "./outcome";
import { overheadOutcomes } from "./overhead";
import type { ClipContext, Measurement } from "./types";

const BY_VIEW = { overhead: overheadOutcomes, "face-on": faceOnOutcomes, "down-the-line": downTheLineOutcomes } as const;

/** Every measurement the clip's view knows, in a stable order; a missing mark gives value null and what it needs. */
export function computeMeasurements(clip: ClipContext, marks: StoredMark[]): Measurement[] {
  const outcomes: Record<string, Outcome> = BY_VIEW[clip.view](clip, marks);
  return METRICS_BY_VIEW[clip.view].map(({ key, unit }) => {
    const o = outcomes[key];
    if (!o) throw new Error(`no computation for ${key}`);
    if (isMissing(o)) return { key, value: null, unit, needs: o.needs };
    if (!Number.isFinite(o.value)) return { key, value: null, unit, needs: ["marks that give a finite value (check for a zero ball speed)"] };
    return { key, value: o.value, unit, frames: o.frames, markIds: o.markIds, method: "derived" };
  });
}
