import { describe, expect, it } from "vitest";
import { buildSwingWeight, ruleOfThumbPoints, swingWeightChange } from "@/lib/compare/swing-weight";

const base = { headMassG: 350, gripMassG: 60, shaftMassG: 110, lengthIn: 34, balancePointIn: null };

describe("swing weight of a build (14-inch fulcrum; one point ≈ 1.75 in·oz, common practice)", () => {
  it("with a measured balance point: total mass × (balance point − 14 in)", () => {
    const r = buildSwingWeight({ ...base, balancePointIn: 26 });
    expect(r.ok && r.swingWeight.momentInOz).toBeCloseTo((520 / 28.349523125) * 12, 9);
  });
  it("says what is missing", () => {
    expect(buildSwingWeight({ ...base, gripMassG: null })).toEqual({ ok: false, missing: ["gripMassG"] });
  });
  it("derived: +2.4201 g at 20.5 in beyond the fulcrum adds one point (1.75 × 28.3495 / 20.5, docs/references.md)", () => {
    const a = { ...base, lengthIn: 34.5 };
    const { computedPoints } = swingWeightChange(a, { ...a, headMassG: 350 + 2.4201 });
    expect(computedPoints).toBeCloseTo(1, 3);
  });
  it("common practice rules of thumb: +2 g head +1, +½ in +3, +5 g grip −1", () => {
    expect(ruleOfThumbPoints(base, { ...base, headMassG: 352 })).toBeCloseTo(1, 12);
    expect(ruleOfThumbPoints(base, { ...base, lengthIn: 34.5 })).toBeCloseTo(3, 12);
    expect(ruleOfThumbPoints(base, { ...base, gripMassG: 65 })).toBeCloseTo(-1, 12);
  });
});
