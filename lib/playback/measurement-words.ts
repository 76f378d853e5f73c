// A measurement as one plain sentence for the golfer:
// "Face angle at impact: 0.6° ±0.3° closed — in window (−1° to +1°)". The ± is the number's
// precision (one standard error); a window is always a range, so ± never means a window.
import { formatMeasurement } from "@/lib/metrics/display";
import { METRICS_BY_VIEW, signWordsFor } from "@/lib/metrics/keys";
import type { Handedness } from "@/lib/metrics/types";
import type { View } from "@/lib/marks/types";
import { standing, uncertaintyText, unitText, windowText, type Window } from "@/lib/review/readout";

export type PhoneMeasurement = { key: string; value: number | null; unit: string; uncertainty?: number | null; window?: Window };

/** The sentence in parts, so the page can set the ± in a lighter weight; `text` is all of it. */
export type MeasurementSentence = { label: string; value: string; uncertainty: string; rest: string; text: string };

export function measurementSentence(m: PhoneMeasurement, view: View, handedness: Handedness): MeasurementSentence {
  const label = METRICS_BY_VIEW[view].find((d) => d.key === m.key)?.label ?? m.key;
  if (m.value === null) {
    const rest = "not measured on this clip";
    return { label, value: "", uncertainty: "", rest, text: rest };
  }
  const words = signWordsFor(view, m.key, handedness);
  const shown = Number(formatMeasurement(m.value, m.unit));
  const side = words && shown !== 0 ? ` ${shown > 0 ? words.positive : words.negative}` : "";
  // The side word carries the sign, so the number is shown without one.
  const value = `${formatMeasurement(words ? Math.abs(m.value) : m.value, m.unit)}${unitText(m.unit)}`;
  const uncertainty = uncertaintyText(m.uncertainty, m.unit);
  const against = m.window ? ` — ${standing(m.value, m.window, m.uncertainty)} (${windowText(m.window, m.unit, words !== null)})` : "";
  const rest = `${side}${against}`.trimStart();
  return { label, value, uncertainty, rest, text: [value, uncertainty, rest].filter(Boolean).join(" ") };
}
