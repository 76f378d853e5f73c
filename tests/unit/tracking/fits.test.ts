import { describe, expect, it } from "vitest";
import { fitCircleClipped, fitCircleKasa, fitLineTls, lineStdErrAt } from "@/lib/tracking/fits";
import { random } from "./render";

const gauss = (next: () => number) => Math.sqrt(-2 * Math.log(1 - next())) * Math.cos(2 * Math.PI * next());

describe("Kåsa's algebraic circle fit (Kåsa 1976, IEEE Trans. Instrum. Meas. 25(1))", () => {
  it("recovers an exact circle from points on it", () => {
    const pts = Array.from({ length: 12 }, (_, k) => [37.25 + 20.5 * Math.cos(k / 2), -4.5 + 20.5 * Math.sin(k / 2)] as const);
    const fit = fitCircleKasa(pts)!;
    expect(fit.cx).toBeCloseTo(37.25, 9);
    expect(fit.cy).toBeCloseTo(-4.5, 9);
    expect(fit.r).toBeCloseTo(20.5, 9);
    expect(fit.residualStd).toBeLessThan(1e-9);
  });

  it("refuses fewer than three points and collinear points", () => {
    expect(fitCircleKasa([[0, 0], [1, 1]])).toBeNull();
    expect(fitCircleKasa([[0, 0], [1, 1], [2, 2], [3, 3]])).toBeNull();
  });

  it("states a centre standard error that matches the scatter of 400 seeded noisy fits within 20 %", () => {
    const next = random(11);
    const sd = 0.3, n = 72;
    const xs: number[] = [], stated: number[] = [];
    for (let trial = 0; trial < 400; trial++) {
      const pts = Array.from({ length: n }, (_, k) => {
        const a = (2 * Math.PI * k) / n, r = 25 + sd * gauss(next);
        return [100 + r * Math.cos(a), 50 + r * Math.sin(a)] as const;
      });
      const fit = fitCircleKasa(pts)!;
      xs.push(fit.cx - 100);
      stated.push(fit.centreStdErr);
    }
    const empirical = Math.sqrt(xs.reduce((a, v) => a + v * v, 0) / xs.length);
    const mean = stated.reduce((a, v) => a + v, 0) / stated.length;
    // Hand value: σ·√(2/n) = 0.3·√(2/72) = 0.05 px.
    expect(mean).toBeCloseTo(0.05, 2);
    expect(Math.abs(empirical / mean - 1)).toBeLessThan(0.2);
  });

  it("ignores a few stray points when clipping", () => {
    const pts: [number, number][] = Array.from({ length: 40 }, (_, k) => [10 * Math.cos(k / 6.3), 10 * Math.sin(k / 6.3)]);
    pts.push([30, 0], [0, 25]);
    const fit = fitCircleClipped(pts)!;
    expect(fit.r).toBeCloseTo(10, 6);
    expect(Math.hypot(fit.cx, fit.cy)).toBeLessThan(1e-6);
  });
});

describe("total least squares line", () => {
  it("recovers a steep line exactly (orthogonal regression handles vertical lines)", () => {
    const pts = Array.from({ length: 10 }, (_, k) => [5 + 0.01 * k, 3 + k] as const);
    const fit = fitLineTls(pts)!;
    expect(Math.abs(Math.atan2(fit.direction[1], fit.direction[0]))).toBeCloseTo(Math.atan2(1, 0.01), 9);
    expect(fit.residualStd).toBeLessThan(1e-9);
  });

  it("states the standard error of a point on the line as σ√(1/n + t²/Σt²)", () => {
    // Hand check: points at t = −2, −1, 0, 1, 2 with offsets +1, −1, 0, −1, +1 across the x axis:
    // Σxy = 0, so the line is the x axis; Σt² = 10; σ² = 4 / (5 − 2).
    const fit = fitLineTls([[-2, 1], [-1, -1], [0, 0], [1, -1], [2, 1]])!;
    expect(Math.abs(fit.direction[1])).toBeLessThan(1e-12);
    expect(fit.spread).toBeCloseTo(10, 12);
    expect(fit.residualStd).toBeCloseTo(Math.sqrt(4 / 3), 12);
    expect(lineStdErrAt(fit, 0)).toBeCloseTo(Math.sqrt(4 / 3) * Math.sqrt(1 / 5), 12);
    expect(lineStdErrAt(fit, 2)).toBeCloseTo(Math.sqrt(4 / 3) * Math.sqrt(1 / 5 + 4 / 10), 12);
  });
});
