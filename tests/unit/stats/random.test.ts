import { describe, expect, it } from "vitest";
import { seededNormal, seededUniform } from "@/lib/stats/random";

describe("seeded random numbers", () => {
  it("repeat for one seed and differ between seeds", () => {
    const a = seededUniform(7), b = seededUniform(7), c = seededUniform(8);
    const xs = [a(), a(), a()];
    expect([b(), b(), b()]).toEqual(xs);
    expect(c()).not.toBe(xs[0]);
  });
  it("uniform: in [0, 1) with mean 1/2 and variance 1/12 (the uniform distribution's moments)", () => {
    const u = seededUniform(1);
    const xs = Array.from({ length: 100_000 }, u);
    expect(xs.every((x) => x >= 0 && x < 1)).toBe(true);
    const mean = xs.reduce((s, x) => s + x, 0) / xs.length;
    const variance = xs.reduce((s, x) => s + (x - mean) ** 2, 0) / xs.length;
    // Standard errors over 100 000 draws: 0.0009 for the mean, 0.0001 for the variance.
    expect(Math.abs(mean - 0.5)).toBeLessThan(0.004);
    expect(Math.abs(variance - 1 / 12)).toBeLessThan(0.0005);
  });
  it("normal: mean 0, sd 1, and 68.27 % within one sd (the standard normal's Φ(1) − Φ(−1), Abramowitz & Stegun 26.2)", () => {
    const n = seededNormal(2);
    const xs = Array.from({ length: 100_000 }, n);
    const mean = xs.reduce((s, x) => s + x, 0) / xs.length;
    const sd = Math.sqrt(xs.reduce((s, x) => s + (x - mean) ** 2, 0) / xs.length);
    expect(Math.abs(mean)).toBeLessThan(0.015);
    expect(Math.abs(sd - 1)).toBeLessThan(0.01);
    const within = xs.filter((x) => Math.abs(x) <= 1).length / xs.length;
    expect(Math.abs(within - 0.6827)).toBeLessThan(0.006);
  });
});
