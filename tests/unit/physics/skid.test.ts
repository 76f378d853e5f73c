import { describe, expect, it } from "vitest";
import { skidToRoll } from "@/lib/physics/skid";

describe("skid to roll (Penner 2002, The physics of putting, Can. J. Phys. 80:83–96)", () => {
  it("Penner 2002, spin-free launch: v = 5/7·v0, skid 12v0²/(49μg), time 2v0/(7μg); μ = 0.2, v0 = 2 m/s, g = 9.81", () => {
    const r = skidToRoll({ speed: 2, spin: 0, mu: 0.2, gravity: 9.81 });
    expect(r.rollSpeed).toBeCloseTo(1.4286, 4);
    expect(r.skidDistance).toBeCloseTo(0.4993, 4);
    expect(r.skidTime).toBeCloseTo(0.2912, 4);
  });
  it("Penner 2002, with initial spin: pure roll at v = (5v0 + 2rω0)/7, and the ball then rolls (v = rω)", () => {
    const radius = 0.021335, v0 = 1.5, mu = 0.15, g = 9.81;
    for (const spin of [-30, 0, 20, 40, 120]) {
      const r = skidToRoll({ speed: v0, spin, mu, radius, gravity: g });
      expect(r.rollSpeed).toBeCloseTo((5 * v0 + 2 * radius * spin) / 7, 12);
      // Integrate the sliding equations (rigid-body mechanics) to the same end: v·t and ω·t meet.
      const sign = Math.sign(v0 - radius * spin);
      const v = v0 - sign * mu * g * r.skidTime;
      const w = spin + sign * (5 * mu * g / (2 * radius)) * r.skidTime;
      expect(v).toBeCloseTo(radius * w, 10);
      expect(v).toBeCloseTo(r.rollSpeed, 10);
    }
  });
  it("a ball launched already rolling does not skid", () => {
    const r = skidToRoll({ speed: 1.2, spin: 1.2 / 0.021335, mu: 0.2 });
    expect(r.skidDistance).toBeCloseTo(0, 12);
    expect(r.rollSpeed).toBeCloseTo(1.2, 12);
  });
  it("refuses a non-positive friction coefficient", () => {
    expect(() => skidToRoll({ speed: 1, spin: 0, mu: 0 })).toThrow();
  });
});
