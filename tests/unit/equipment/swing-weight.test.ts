import { describe, expect, it } from "vitest";
import { balancePointIn, swingWeightChangePoints, swingWeightFromBalance, swingWeightFromComponents, type Component } from "@/lib/equipment/swing-weight";
import { GRAMS_PER_OUNCE } from "@/lib/physics/units";

// An invented demo putter: 350 g head 34.5 in from the grip end, shaft and grip.
const putter = (headG = 350, headAtIn = 34.5, gripG = 60): Component[] => [
  { name: "head", massG: headG, positionIn: headAtIn },
  { name: "shaft", massG: 120, positionIn: 17 },
  { name: "grip", massG: gripG, positionIn: 5 },
];

describe("swing weight on the 14-inch fulcrum scale", () => {
  it("components and total mass + balance point give the same moment", () => {
    const parts = putter();
    const total = parts.reduce((s, c) => s + c.massG, 0);
    expect(swingWeightFromBalance(total, balancePointIn(parts)).momentInOz).toBeCloseTo(swingWeightFromComponents(parts).momentInOz, 10);
  });
  it("derived (REFERENCES.md): a head 20.5 in beyond the fulcrum needs about 2.43 g per point at 1.75 in·oz per point (common practice)", () => {
    const base = swingWeightFromComponents(putter(350, 34.5));
    const heavier = swingWeightFromComponents(putter(351, 34.5));
    const gramsPerPoint = 1 / swingWeightChangePoints(base, heavier);
    expect(gramsPerPoint).toBeCloseTo((1.75 * GRAMS_PER_OUNCE) / 20.5, 10);
    expect(Math.abs(gramsPerPoint - 2.43)).toBeLessThan(0.02);
  });
  it("common practice rules of thumb, as sanity bounds: +2 g head ≈ +1 point, +½ in length ≈ +3 points, +5 g grip ≈ −1 point", () => {
    const base = swingWeightFromComponents(putter());
    expect(swingWeightChangePoints(base, swingWeightFromComponents(putter(352)))).toBeGreaterThan(0.6);
    expect(swingWeightChangePoints(base, swingWeightFromComponents(putter(352)))).toBeLessThan(1.2);
    const longer = swingWeightChangePoints(base, swingWeightFromComponents(putter(350, 35)));
    expect(longer).toBeGreaterThan(2.5);
    expect(longer).toBeLessThan(4.5);
    const gripChange = swingWeightChangePoints(base, swingWeightFromComponents(putter(350, 34.5, 65)));
    expect(gripChange).toBeGreaterThan(-1.5);
    expect(gripChange).toBeLessThan(-0.6);
  });
  it("labels letters from the from-memory anchors A0 = 161.0 and D0 = 213.5 in·oz (30 points apart)", () => {
    const d0 = swingWeightFromBalance(GRAMS_PER_OUNCE * 213.5, 15); // 1 oz·in per in beyond the fulcrum
    expect(d0.letterFromMemory).toBe("D0.0");
    expect(d0.points).toBeCloseTo(30, 10);
    expect(swingWeightFromBalance(GRAMS_PER_OUNCE * (161 + 1.75 * 12.4), 15).letterFromMemory).toBe("B2.4");
    expect(swingWeightFromBalance(GRAMS_PER_OUNCE * 100, 15).letterFromMemory).toBeNull();
  });
});
