import { max, mean, median, min, sampleStandardDeviation } from "simple-statistics";

export type Window = { lo: number; hi: number };

export type Summary = {
  n: number;
  mean: number;
  /** Sample standard deviation (n − 1); null below two values. */
  sd: number | null;
  median: number;
  min: number;
  max: number;
  range: number;
  /** Share of values with lo ≤ value ≤ hi, 0..1; null when no window is given. */
  shareInWindow: number | null;
};

/** Per-measurement summary of a build's putts; null for an empty list. */
export function summarize(values: readonly number[], window?: Window): Summary | null {
  if (values.length === 0) return null;
  const xs = [...values];
  const lo = min(xs);
  const hi = max(xs);
  return {
    n: xs.length,
    mean: mean(xs),
    sd: xs.length >= 2 ? sampleStandardDeviation(xs) : null,
    median: median(xs),
    min: lo,
    max: hi,
    range: hi - lo,
    shareInWindow: window ? xs.filter((v) => v >= window.lo && v <= window.hi).length / xs.length : null,
  };
}
