// CSV (RFC 4180: comma-separated, CRLF line ends, fields with a comma, quote or line break in quotes).
// Numbers are rounded to the precision the screens show (lib/metrics/display.ts), with a plain
// hyphen-minus so spreadsheets read them. Two layouts: long (one row per clip per measurement) and
// wide (one row per putt, a value and an uncertainty column per measurement).
import { decimalsOf } from "@/lib/metrics/display";
import { metricOrder } from "./metric-labels";

export type MeasurementCsvRow = {
  fittingId: string;
  buildPosition: number;
  buildLabel: string;
  clipId: string;
  view: string;
  clipCreatedAt: Date;
  key: string;
  value: number | null;
  /** One standard error, same unit; absent or null when not known (rows from before tracking). */
  uncertainty?: number | null;
  unit: string;
  method: string;
};

export const MEASUREMENT_CSV_HEADER = ["fitting_id", "build_position", "build_label", "clip_id", "view", "clip_recorded_at", "key", "value", "uncertainty", "unit", "method"];

/** A text cell; one that a spreadsheet would run as a formula gets a leading apostrophe (OWASP CSV injection). */
export function csvText(value: string): string {
  const safe = /^[=+\-@\t\r]/.test(value) ? `'${value}` : value;
  return /[",\r\n]/.test(safe) ? `"${safe.replace(/"/g, '""')}"` : safe;
}

/** A value at the shown precision; never "-0.0". */
export function csvNumber(value: number | null, unit: string): string {
  if (value === null || !Number.isFinite(value)) return "";
  const text = value.toFixed(decimalsOf(unit));
  return Number(text) === 0 ? text.replace("-", "") : text;
}

/** An uncertainty at the value's precision; one that rounds to nothing is written as one unit of the last digit (never a claimed exact 0). */
export function csvUncertainty(u: number | null | undefined, unit: string): string {
  if (u == null || !Number.isFinite(u) || u < 0) return "";
  const d = decimalsOf(unit);
  return Number(u.toFixed(d)) > 0 ? u.toFixed(d) : (10 ** -d).toFixed(d);
}

/** Long layout: one row per clip per measurement; an empty value (or uncertainty) where it could not be computed. */
export function measurementsCsv(rows: readonly MeasurementCsvRow[]): string {
  const lines = [MEASUREMENT_CSV_HEADER.join(",")];
  for (const r of rows) {
    lines.push(
      [
        r.fittingId, String(r.buildPosition), csvText(r.buildLabel), r.clipId, r.view, r.clipCreatedAt.toISOString(),
        csvText(r.key), csvNumber(r.value, r.unit), csvUncertainty(r.uncertainty, r.unit), csvText(r.unit), r.method,
      ].join(","),
    );
  }
  return lines.join("\r\n") + "\r\n";
}

const unitSlug = (unit: string) => unit.replace(/[^a-z0-9]+/gi, "_").replace(/_$/, "");

/** Wide layout: one row per clip (putt), then `<key>_<unit>` and `<key>_<unit>_se` for every measurement present. */
export function measurementsCsvWide(rows: readonly MeasurementCsvRow[]): string {
  const keys = [...new Map(rows.map((r) => [r.key, r.unit])).entries()].sort(([a], [b]) => metricOrder(a) - metricOrder(b) || a.localeCompare(b));
  const header = ["fitting_id", "build_position", "build_label", "clip_id", "view", "clip_recorded_at", ...keys.flatMap(([k, u]) => [`${k}_${unitSlug(u)}`, `${k}_${unitSlug(u)}_se`])];
  const clips = new Map<string, MeasurementCsvRow[]>();
  for (const r of rows) clips.set(r.clipId, [...(clips.get(r.clipId) ?? []), r]);
  const lines = [header.join(",")];
  for (const own of clips.values()) {
    const first = own[0]!;
    const byKey = new Map(own.map((r) => [r.key, r]));
    lines.push(
      [
        first.fittingId, String(first.buildPosition), csvText(first.buildLabel), first.clipId, first.view, first.clipCreatedAt.toISOString(),
        ...keys.flatMap(([k, u]) => [csvNumber(byKey.get(k)?.value ?? null, u), csvUncertainty(byKey.get(k)?.uncertainty, u)]),
      ].join(","),
    );
  }
  return lines.join("\r\n") + "\r\n";
}
