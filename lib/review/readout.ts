// What a readout says: the value with an explicit sign and the side in words, its precision
// (± one standard error), and where it sits against the studio's window (`in window`, `near`,
// `outside`, or `undecided` when the number is too imprecise to tell; never a grade).
import { signed } from "@/lib/format/signed";
import { decimalsOf, formatMeasurement } from "@/lib/metrics/display";
import type { MetricDefinition } from "@/lib/metrics/keys";

export type Window = { min: number; max: number };
export type WindowStanding = "in window" | "near" | "outside" | "undecided";
export type MeasurementMethod = "marked" | "tracked" | "mixed";

const UNIT_TEXT: Record<string, string> = { deg: "°", "deg/s": "°/s", "m/s": " m/s", rpm: " rpm", ratio: "", m: " m", mm: " mm" };
export const unitText = (unit: string) => UNIT_TEXT[unit] ?? ` ${unit}`;

/** "+1.4°" / "−2.9°" for signed numbers (sign always shown, a true minus), "1.85 m/s" for the rest. */
export function valueText(value: number, unit: string, withSign: boolean): string {
  return `${signed(value, decimalsOf(unit), { plus: withSign })}${unitText(unit)}`;
}

/**
 * "±0.3°": one standard error at the value's own decimals, the unit after it. An uncertainty that
 * rounds to nothing reads "±<0.1°" (never "±0.0°", which would claim an exact number); none is "".
 */
export function uncertaintyText(uncertainty: number | null | undefined, unit: string): string {
  if (uncertainty == null || !Number.isFinite(uncertainty) || uncertainty < 0) return "";
  const text = formatMeasurement(uncertainty, unit);
  if (Number(text) > 0) return `±${text}${unitText(unit)}`;
  const step = text.includes(".") ? `0.${"0".repeat(text.split(".")[1]!.length - 1)}1` : "1";
  return `±<${step}${unitText(unit)}`;
}

/**
 * A window as a range, never with ±: "−1° to +1°", "1.5 to 2.2 m/s". Ends keep only the decimals
 * they need (at most the unit's); signed measurements show an explicit plus.
 */
export function windowText(w: Window, unit: string, withSign: boolean): string {
  // Ends keep only the decimals they need: "−1°", "+0.5°".
  const end = (v: number) => {
    const n = Number(formatMeasurement(v, unit));
    const decimals = (String(Math.abs(n)).split(".")[1] ?? "").length;
    return signed(n, decimals, { plus: withSign });
  };
  const u = unitText(unit);
  // A symbol that hugs its number (°) goes on both ends; a spaced unit once, at the end.
  return u.startsWith(" ") ? `${end(w.min)} to ${end(w.max)}${u}` : `${end(w.min)}${u} to ${end(w.max)}${u}`;
}

/** The side in words, or "" when the shown number is zero or has no sign. */
export function sideWords(value: number, unit: string, words: MetricDefinition["signWords"]): string {
  if (!words) return "";
  const shown = Number(formatMeasurement(value, unit));
  return shown > 0 ? words.positive : shown < 0 ? words.negative : "";
}

/**
 * Undecided when the uncertainty is wider than half the window (the number cannot tell in from
 * out); otherwise in the window; near = outside by at most half the window's width; else outside.
 */
export function standing(value: number, w: Window, uncertainty?: number | null): WindowStanding {
  const half = (w.max - w.min) / 2;
  if (uncertainty != null && uncertainty > half) return "undecided";
  if (value >= w.min && value <= w.max) return "in window";
  return value >= w.min - half && value <= w.max + half ? "near" : "outside";
}

/** How a measurement was made, in the readout's small print; "" for rows from before tracking. */
export function methodWord(method: string | null | undefined): MeasurementMethod | "" {
  return method === "marked" || method === "tracked" || method === "mixed" ? method : "";
}

/**
 * The gauge's scale: symmetric about zero, wide enough for the window with its slack and the
 * value with its whisker, so zero sits in the middle. Returns a function from value to 0…100 %.
 */
export function gaugeScale(value: number, w: Window, uncertainty: number | null = null): (v: number) => number {
  const slack = (w.max - w.min) / 2;
  const reach = Math.max(Math.abs(w.min - slack), Math.abs(w.max + slack), (Math.abs(value) + (uncertainty ?? 0)) * 1.1, 1e-9);
  return (v: number) => Math.min(Math.max(50 + (v / reach) * 50, 0), 100);
}
