// The Wilson score interval for a proportion (E. B. Wilson, "Probable inference, the law of
// succession, and statistical inference", J. Am. Stat. Assoc. 22 (1927) 209–212; recommended over
// the Wald interval by Newcombe, Stat. Med. 17 (1998) 857–872, whose Table I gives check values).
export const Z95 = 1.959964;

/** The interval for k successes in n trials at normal quantile z: [low, high]. */
export function wilsonInterval(k: number, n: number, z = Z95): [number, number] {
  if (n <= 0) return [0, 1];
  const p = k / n;
  const z2 = z * z;
  const centre = (p + z2 / (2 * n)) / (1 + z2 / n);
  const half = ((z / (1 + z2 / n)) * Math.sqrt((p * (1 - p)) / n + z2 / (4 * n * n)));
  return [Math.max(0, centre - half), Math.min(1, centre + half)];
}

/**
 * The fewest putts for which a share can say anything: the Wilson 95% interval of the least
 * informative record (half holed, p̂ = ½) must be narrower than ±`halfWidth`. With ±⅓ — enough
 * to tell "mostly holed" from "mostly missed" — that is 5 putts (4 gives ±0.35, 5 gives ±0.33).
 */
export function minimumTrials(halfWidth = 1 / 3, z = Z95): number {
  for (let n = 1; n < 10_000; n++) {
    const [lo, hi] = wilsonInterval(n / 2, n, z);
    if ((hi - lo) / 2 < halfWidth) return n;
  }
  return Infinity;
}

/** Putts a build needs before its estimated share holed is shown (see minimumTrials). */
export const MIN_PUTTS_FOR_MAKE = minimumTrials();
