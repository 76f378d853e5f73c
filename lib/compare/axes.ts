// Plot axes that fit what they show: every value (with its whisker) inside, a margin around it, and
// round ends, so no point sits on the frame and no band is cut off.

/** A nice step (1, 2 or 5 × 10ⁿ) for about `ticks` intervals over `span`. */
export function niceStep(span: number, ticks = 5): number {
  if (!(span > 0)) return 1;
  const raw = span / ticks;
  const power = 10 ** Math.floor(Math.log10(raw));
  const f = raw / power;
  return (f <= 1 ? 1 : f <= 2 ? 2 : f <= 5 ? 5 : 10) * power;
}

/**
 * [low, high] holding every value, padded by `pad` of the span (at least `minSpan` wide, centred on
 * the data), widened to whole steps; `withZero` keeps zero in view (signed angles read against it).
 */
export function paddedDomain(values: readonly number[], o: { pad?: number; minSpan?: number; withZero?: boolean } = {}): [number, number] {
  const { pad = 0.1, minSpan = 1, withZero = false } = o;
  const xs = values.filter(Number.isFinite);
  if (withZero) xs.push(0);
  if (xs.length === 0) return [-minSpan / 2, minSpan / 2];
  let lo = Math.min(...xs), hi = Math.max(...xs);
  if (hi - lo < minSpan) {
    const mid = (lo + hi) / 2;
    lo = mid - minSpan / 2;
    hi = mid + minSpan / 2;
  }
  const margin = (hi - lo) * pad;
  const step = niceStep(hi - lo + 2 * margin);
  return [Math.floor((lo - margin) / step) * step, Math.ceil((hi + margin) / step) * step];
}
