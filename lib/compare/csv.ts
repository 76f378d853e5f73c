// CSV (RFC 4180: comma-separated, CRLF line ends, fields with a comma, quote or line break in quotes).

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

const csvNumber = (value: number | null) => (value === null || !Number.isFinite(value) ? "" : String(value));

/** One row per clip per measurement; an empty value (or uncertainty) where it could not be computed. */
export function measurementsCsv(rows: readonly MeasurementCsvRow[]): string {
  const lines = [MEASUREMENT_CSV_HEADER.join(",")];
  for (const r of rows) {
    lines.push(
      [
        r.fittingId, String(r.buildPosition), csvText(r.buildLabel), r.clipId, r.view, r.clipCreatedAt.toISOString(),
        csvText(r.key), csvNumber(r.value), csvNumber(r.uncertainty ?? null), csvText(r.unit), r.method,
      ].join(","),
    );
  }
  return lines.join("\r\n") + "\r\n";
}
