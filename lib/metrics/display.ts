// Rounding for the screens only; stored and API values keep full precision.
const DECIMALS: Record<string, number> = { deg: 1, "deg/s": 1, "m/s": 2, rpm: 0, ratio: 2, m: 2 };

/** Decimals a unit is shown with on the screens. */
export const decimalsOf = (unit: string) => DECIMALS[unit] ?? 2;

export function formatMeasurement(value: number, unit: string): string {
  const text = value.toFixed(DECIMALS[unit] ?? 2);
  return /^-0(\.0*)?$/.test(text) ? text.slice(1) : text;
}
