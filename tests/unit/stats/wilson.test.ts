// Wilson score interval (Wilson 1927) against Newcombe, Stat. Med. 17 (1998) 857–872, Table I
// (method 3, score interval without continuity correction) — values from memory of that table.
import { describe, expect, it } from "vitest";
import { minimumTrials, MIN_PUTTS_FOR_MAKE, wilsonInterval } from "@/lib/stats/wilson";
import { paddedDomain, niceStep } from "@/lib/compare/axes";

describe("Wilson score interval", () => {
  it.each([
    [81, 263, 0.2553, 0.3662],
    [15, 148, 0.0624, 0.1605],
    [0, 20, 0, 0.1611],
    [1, 29, 0.0061, 0.1718],
  ])("%i of %i → %f to %f (Newcombe 1998, Table I)", (k, n, lo, hi) => {
    const [a, b] = wilsonInterval(k, n);
    expect(a).toBeCloseTo(lo, 4);
    expect(b).toBeCloseTo(hi, 4);
  });

  it("the fewest putts for a share: the half-holed record's 95% interval under ±1/3 — 5 putts", () => {
    // By hand at p̂ = ½, z = 1.96: n = 4 → 1.96·√(1/16 + 3.8416/64)/(1 + 3.8416/4) = 0.350;
    // n = 5 → 1.96·√(1/20 + 3.8416/100)/(1 + 3.8416/5) = 0.330.
    const half = (n: number) => (wilsonInterval(n / 2, n)[1] - wilsonInterval(n / 2, n)[0]) / 2;
    expect(half(4)).toBeCloseTo(0.35, 3);
    expect(half(5)).toBeCloseTo(0.3297, 3);
    expect(minimumTrials()).toBe(5);
    expect(MIN_PUTTS_FOR_MAKE).toBe(5);
  });
});

describe("padded plot axes", () => {
  it("holds every value with a margin, on whole steps, zero in view when asked", () => {
    expect(niceStep(7)).toBe(2);
    // 1.2…3.9 padded by 10 % of 2.7 → 0.93…4.17; a step of 1 (span 3.24 / 5 = 0.65 → 1) → 0…5.
    expect(paddedDomain([1.2, 3.9])).toEqual([0, 5]);
    expect(paddedDomain([1.2, 3.9], { withZero: true })).toEqual([-1, 5]);
    const [lo, hi] = paddedDomain([0.3, 0.31], { minSpan: 2 });
    expect(lo).toBeLessThan(-0.69);
    expect(hi).toBeGreaterThan(1.31);
  });
});
