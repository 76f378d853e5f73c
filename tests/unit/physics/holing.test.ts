import { describe, expect, it } from "vitest";
import { HOLE_RADIUS_M, holingWindowDeg, lateralMiss, makeProbability } from "@/lib/physics/holing";
import { normalCdf } from "@/lib/physics/normal";

// Exact unit definitions (international yard and pound agreement, 1959): 1 ft = 0.3048 m, 1 in = 0.0254 m.
const ft = (x: number) => x * 0.3048;
const INCH_M = 0.0254;

describe("holing window from the hole radius (Rules of Golf, Definitions: hole 4.25 in across)", () => {
  it("Rules of Golf, Definitions (Hole): 4.25 in across, so radius 2.125 in × 0.0254 m/in = 0.053975 m, diameter 107.95 mm", () => {
    expect(HOLE_RADIUS_M).toBeCloseTo(0.053975, 12);
    // 4.25 in × 25.4 mm/in = 107.95 mm (often rounded to 108 mm)
    expect(2 * HOLE_RADIUS_M * 1000).toBeCloseTo(107.95, 2);
  });
  it.each([
    [ft(3), 3.3781],
    [ft(6), 1.6905],
    [ft(10), 1.0145],
    [ft(20), 0.5073],
  ])("derived from the Rules of Golf hole radius: atan(2.125 in / %f m) = %f°", (d, expected) => {
    expect(holingWindowDeg(d)).toBeCloseTo(expected, 4);
  });
});

describe("holing window at 3 m", () => {
  // 1.0312° is the figure for a rounded 54 mm radius (atan(0.054 / 3)); the Rules' 2.125 in radius gives
  // atan(0.053975 / 3) = 1.0307°, and that is what the engine must give.
  it("derived from the Rules of Golf hole radius: atan(0.053975 m / 3 m) = 1.0307°, not the 54 mm figure 1.0312°", () => {
    expect(holingWindowDeg(3)).toBeCloseTo(1.0307, 4);
    expect(Math.abs(holingWindowDeg(3) - 1.0312)).toBeGreaterThan(0.0004);
  });
});

describe("lateral miss D·tan θ (derived)", () => {
  it.each([
    [10, 1, 2.0946],
    [10, 0.5, 1.0472],
    [5, 2, 2.0952],
  ])("%f ft at %f° misses by %f in", (dFt, deg, inches) => {
    expect(lateralMiss(ft(dFt), deg) / INCH_M).toBeCloseTo(inches, 4);
  });
});

describe("make probability Φ((θ−μ)/σ) − Φ((−θ−μ)/σ)", () => {
  it("normal CDF: Φ(1) − Φ(−1) = 0.6827 and Φ(1.96) = 0.9750 (standard normal tables, e.g. Abramowitz & Stegun Table 26.1)", () => {
    expect(normalCdf(1) - normalCdf(-1)).toBeCloseTo(0.6827, 4);
    expect(normalCdf(1.96)).toBeCloseTo(0.975, 4);
    expect(normalCdf(0)).toBeCloseTo(0.5, 7);
  });
  it("hand-worked: μ = 0, σ = 1.0145°, 10 ft → 0.6827", () => {
    expect(makeProbability(ft(10), 0, 1.0145)).toBeCloseTo(0.6827, 4);
  });
  it("hand-worked: a 0.8° bias at 6 ft, σ = 1° → Φ(1.6905 − 0.8) − Φ(−1.6905 − 0.8) = 0.8134 − 0.0064 = 0.8070, either side", () => {
    // Window at 6 ft: atan(2.125 in / 72 in) = 1.6905° (above). Φ(0.8905) = 0.81341 and Φ(−2.4905) = 0.00638,
    // read from a standard normal table (Abramowitz & Stegun Table 26.1) between 0.89/0.90 and 2.49/2.50.
    expect(makeProbability(ft(6), 0.8, 1)).toBeCloseTo(0.8070, 3);
    expect(makeProbability(ft(6), -0.8, 1)).toBeCloseTo(0.8070, 3);
    // No bias: 2·Φ(1.6905) − 1 = 2 × 0.95454 − 1 = 0.9091 (table: Φ(1.69) = 0.95449, Φ(1.70) = 0.95543).
    expect(makeProbability(ft(6), 0, 1)).toBeCloseTo(0.9091, 3);
  });
});
