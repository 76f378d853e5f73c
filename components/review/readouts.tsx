"use client";

import { useQuery } from "@tanstack/react-query";
import { apiFetch } from "@/lib/client/api";
import { inStudioUnits, shownUnit } from "@/lib/format/units";
import { METRICS_BY_VIEW, signWordsFor } from "@/lib/metrics/keys";
import { methodWord, sideWords, uncertaintyText, valueText, type Window } from "@/lib/review/readout";
import { Gauge } from "./gauge";
import { measurementsKey } from "./measurements-cache";
import type { MeasurementsReply, ReviewClip } from "./types";

const VIEW_TITLE: Record<ReviewClip["view"], string> = { overhead: "Overhead", "face-on": "Face-on", "down-the-line": "Down-the-line" };

/** The view's measurements beside the frame: value with its ± and side, how it was made, or what it still needs. */
export function Readouts({ clip }: { clip: ReviewClip }) {
  const { data, error } = useQuery({
    queryKey: measurementsKey(clip.id),
    queryFn: () => apiFetch<MeasurementsReply>(`/api/clips/${clip.id}/measurements`),
  });
  const byKey = new Map((data?.measurements ?? []).map((m) => [m.key, m]));
  return (
    <section aria-labelledby="readouts-heading" className="flex min-h-0 flex-1 flex-col gap-3 overflow-y-auto p-4">
      <h2 id="readouts-heading" className="text-label font-medium uppercase text-slate-300">{VIEW_TITLE[clip.view]} measurements</h2>
      {error && <p className="text-label text-signal-light">Could not load the measurements: {error.message}</p>}
      <dl className="flex flex-col gap-3">
        {METRICS_BY_VIEW[clip.view].map((def) => {
          const raw = byKey.get(def.key);
          const prefs = clip.unitPrefs ?? { units: "m" as const };
          const m = raw && raw.value !== null ? { ...raw, ...inStudioUnits(raw.value, raw.uncertainty, raw.unit, prefs) } : raw;
          const factor = raw ? shownUnit(raw.unit, prefs).factor : 1;
          const words = signWordsFor(clip.view, def.key, clip.handedness);
          const siWindow: Window | undefined = raw?.window ?? data?.windows?.[def.key] ?? clip.windows[def.key];
          const window: Window | undefined = siWindow && { min: siWindow.min * factor, max: siWindow.max * factor };
          const uncertainty = m?.uncertainty ?? null;
          const method = methodWord(m?.method);
          return (
            <div key={def.key} data-testid={`readout-${def.key}`} className="border-b border-ink-700 pb-2">
              <dt className="flex items-baseline justify-between text-label text-slate-300">
                {def.label}
                {method && m?.value != null && <span className="text-[11px] text-slate-400" data-testid="method">{method}</span>}
              </dt>
              {m && m.value !== null ? (
                <dd>
                  <span className="num text-readout text-chalk" data-testid="value">{valueText(m.value, m.unit, words !== null)}</span>
                  {uncertainty !== null && <span className="num ml-1.5 text-body font-light text-slate-300" data-testid="uncertainty">{uncertaintyText(uncertainty, m.unit)}</span>}
                  <span className="ml-2 text-body text-slate-200">{sideWords(m.value, m.unit, words)}</span>
                  {window && <Gauge value={m.value} uncertainty={uncertainty} unit={m.unit} signed={words !== null} window={window} label={def.label} />}
                </dd>
              ) : (
                <dd className="text-label text-slate-400">{m?.needs?.length ? `Needs ${m.needs.join("; ")}` : "Not measured yet"}</dd>
              )}
            </div>
          );
        })}
      </dl>
    </section>
  );
}
