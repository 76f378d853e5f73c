// A measurement as one plain sentence for the golfer: "Face angle at impact: 0.6° closed — in window (±1.0°)".
import { formatMeasurement } from "@/lib/metrics/display";
import { METRICS_BY_VIEW, signWordsFor } from "@/lib/metrics/keys";
import type { Handedness } from "@/lib/metrics/types";
import type { View } from "@/lib/marks/types";
import { standing, type Window } from "@/lib/review/readout";

export type PhoneMeasurement = { key: string; value: number | null; unit: string; window?: Window };

const UNIT: Record<string, string> = { deg: "°", "deg/s": "°/s", "m/s": " m/s", rpm: " rpm", ratio: "", m: " m", mm: " mm" };
const withUnit = (v: number, unit: string) => `${formatMeasurement(v, unit)}${UNIT[unit] ?? ` ${unit}`}`;

function windowWords(w: Window, unit: string): string {
  if (Math.abs(w.min + w.max) < 1e-9) return `±${withUnit(w.max, unit)}`;
  const signed = (v: number) => (v > 0 ? `+${withUnit(v, unit)}` : withUnit(v, unit));
  return `${signed(w.min)} to ${signed(w.max)}`;
}

export function measurementSentence(m: PhoneMeasurement, view: View, handedness: Handedness): { label: string; text: string } {
  const label = METRICS_BY_VIEW[view].find((d) => d.key === m.key)?.label ?? m.key;
  if (m.value === null) return { label, text: "not measured on this clip" };
  const words = signWordsFor(view, m.key, handedness);
  const shown = Number(formatMeasurement(m.value, m.unit));
  const side = words && shown !== 0 ? ` ${shown > 0 ? words.positive : words.negative}` : "";
  const value = words ? withUnit(Math.abs(m.value), m.unit) : withUnit(m.value, m.unit);
  const against = m.window ? ` — ${standing(m.value, m.window)} (${windowWords(m.window, m.unit)})` : "";
  return { label, text: `${value}${side}${against}` };
}
