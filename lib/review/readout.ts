// What a readout says: the value with an explicit sign and the side in words, and where it
// sits against the studio's window (`in window`, `near`, `outside`; never a grade).
import { formatMeasurement } from "@/lib/metrics/display";
import type { MetricDefinition } from "@/lib/metrics/keys";

export type Window = { min: number; max: number };
export type WindowStanding = "in window" | "near" | "outside";

const UNIT_TEXT: Record<string, string> = { deg: "°", "deg/s": "°/s", "m/s": " m/s", rpm: " rpm", ratio: "", m: " m", mm: " mm" };

/** "+1.4°" / "−2.9°" for signed numbers (sign always shown, a true minus), "1.85 m/s" for the rest. */
export function valueText(value: number, unit: string, signed: boolean): string {
  const text = formatMeasurement(value, unit);
  const sign = signed && Number(text) > 0 ? "+" : "";
  return `${sign}${text.replace(/^-/, "\u2212")}${UNIT_TEXT[unit] ?? ` ${unit}`}`;
}

/** The side in words, or "" when the shown number is zero or has no sign. */
export function sideWords(value: number, unit: string, words: MetricDefinition["signWords"]): string {
  if (!words) return "";
  const shown = Number(formatMeasurement(value, unit));
  return shown > 0 ? words.positive : shown < 0 ? words.negative : "";
}

/** In the window; near = outside by at most half the window's width; otherwise outside. */
export function standing(value: number, w: Window): WindowStanding {
  if (value >= w.min && value <= w.max) return "in window";
  const slack = (w.max - w.min) / 2;
  return value >= w.min - slack && value <= w.max + slack ? "near" : "outside";
}

/**
 * The gauge's scale: symmetric about zero, wide enough for the window with its slack and the
 * value, so zero sits in the middle. Returns a function from value to 0…100 %.
 */
export function gaugeScale(value: number, w: Window): (v: number) => number {
  const slack = (w.max - w.min) / 2;
  const reach = Math.max(Math.abs(w.min - slack), Math.abs(w.max + slack), Math.abs(value) * 1.1, 1e-9);
  return (v: number) => Math.min(Math.max(50 + (v / reach) * 50, 0), 100);
}
