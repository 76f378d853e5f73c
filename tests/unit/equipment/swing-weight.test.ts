import { describe, expect, it } from "vitest";
import { balancePointIn, swingWeightChangePoints, swingWeightFromBalance, swingWeightFromComponents, type Component } from "@/lib/equipment/swing-weight";

// 1 oz (avoirdupois) = 28.349523125 g exactly (international yard and pound agreement, 1959).
const OUNCE_G = 28.349523125;

// An invented demo putter: 350 g head 34.5 in from the grip end, shaft and grip.
const putter = (headG = 350, headAtIn = 34.5, gripG = 60): Component[] => [
  { name: "head", massG: headG, positionIn: headAtIn },
  { name: "shaft", massG: 120, positionIn: 17 },
  { name: "grip", massG: gripG, positionIn: 5 },
];

describe("swing weight on the 14-inch fulcrum scale", () => {
  it("hand-worked moment about the 14 in fulcrum: 350·20.5 + 120·3 − 60·9 = 6995 g·in = 246.7414 in·oz, from the parts or the balance point", () => {
    const parts = putter();
    // 6995 g·in ÷ 28.349523125 g/oz = 246.7414 in·oz
    expect(swingWeightFromComponents(parts).momentInOz).toBeCloseTo(246.7414, 4);
    // balance point (350·34.5 + 120·17 + 60·5) / 530 = 14415 / 530 = 27.1981 in from the grip end
    expect(balancePointIn(parts)).toBeCloseTo(27.1981, 4);
    // 530 g × (27.1981 − 14) in = 6995 g·in again
    expect(swingWeightFromBalance(530, 14415 / 530).momentInOz).toBeCloseTo(246.7414, 4);
  });
  it("derived (docs/references.md): a head 20.5 in beyond the fulcrum needs 1.75 × 28.3495 / 20.5 = 2.4201 g per point at 1.75 in·oz per point (common practice)", () => {
    const base = swingWeightFromComponents(putter(350, 34.5));
    const heavier = swingWeightFromComponents(putter(351, 34.5));
    expect(1 / swingWeightChangePoints(base, heavier)).toBeCloseTo(2.4201, 4);
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
    const d0 = swingWeightFromBalance(OUNCE_G * 213.5, 15); // 1 oz·in per in beyond the fulcrum
    expect(d0.letterFromMemory).toBe("D0.0");
    expect(d0.points).toBeCloseTo(30, 10);
    expect(swingWeightFromBalance(OUNCE_G * (161 + 1.75 * 12.4), 15).letterFromMemory).toBe("B2.4");
    expect(swingWeightFromBalance(OUNCE_G * 100, 15).letterFromMemory).toBeNull();
  });
});
