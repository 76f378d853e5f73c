import { describe, expect, it } from "vitest";
import { skidToRoll } from "@/lib/physics/skid";

describe("skid to roll (Penner 2002, The physics of putting, Can. J. Phys. 80:83–96)", () => {
  it("Penner 2002, spin-free launch: v = 5/7·v0, skid 12v0²/(49μg), time 2v0/(7μg); μ = 0.2, v0 = 2 m/s, g = 9.81", () => {
    const r = skidToRoll({ speed: 2, spin: 0, mu: 0.2, gravity: 9.81 });
    expect(r.rollSpeed).toBeCloseTo(1.4286, 4);
    expect(r.skidDistance).toBeCloseTo(0.4993, 4);
    expect(r.skidTime).toBeCloseTo(0.2912, 4);
  });
  // Hand calculations, r = 0.021335 m (Rules of Golf minimum ball, 42.67 mm), v0 = 1.5 m/s, μ = 0.15, g = 9.81:
  // μg = 1.4715 m/s², 7μg = 10.3005 m/s². Penner 2002: roll speed (5v0 + 2rω0)/7; the slip s = v0 − rω0 closes at
  // 7/2·μg, so skid time 2|s|/(7μg); distance v0·t ∓ ½μg·t² (− when under-spun, s > 0).
  it.each([
    // ω0 = −30 rad/s (backspin): rω0 = −0.640050; v = (7.5 − 1.280100)/7 = 0.888557; s = 2.140050;
    // t = 4.280100/10.3005 = 0.415524 s; d = 1.5·0.415524 − 0.73575·0.415524² = 0.623286 − 0.127035 = 0.496251 m
    { spin: -30, rollSpeed: 0.888557, skidTime: 0.415524, skidDistance: 0.496251 },
    // ω0 = 20 rad/s (some topspin): rω0 = 0.426700; v = (7.5 + 0.853400)/7 = 1.193343; s = 1.073300;
    // t = 2.146600/10.3005 = 0.208398 s; d = 0.312597 − 0.73575·0.208398² = 0.312597 − 0.031954 = 0.280643 m
    { spin: 20, rollSpeed: 1.193343, skidTime: 0.208398, skidDistance: 0.280643 },
    // ω0 = 120 rad/s (over-spun, s < 0: friction speeds the ball up): rω0 = 2.560200; v = (7.5 + 5.120400)/7 = 1.802914;
    // s = −1.060200; t = 2.120400/10.3005 = 0.205854 s; d = 0.308781 + 0.73575·0.205854² = 0.308781 + 0.031178 = 0.339959 m
    { spin: 120, rollSpeed: 1.802914, skidTime: 0.205854, skidDistance: 0.339959 },
  ])("Penner 2002, hand-worked: ω0 = $spin rad/s → rolls at $rollSpeed m/s after $skidTime s and $skidDistance m", ({ spin, rollSpeed, skidTime, skidDistance }) => {
    const r = skidToRoll({ speed: 1.5, spin, mu: 0.15, radius: 0.021335, gravity: 9.81 });
    expect(r.rollSpeed).toBeCloseTo(rollSpeed, 6);
    expect(r.skidTime).toBeCloseTo(skidTime, 6);
    expect(r.skidDistance).toBeCloseTo(skidDistance, 6);
  });
  it("agrees with a step-by-step integration of the sliding equations (rigid-body mechanics, not the closed form)", () => {
    // Friction μmg against the contact point's slip: dv/dt = −μg·sgn(s), dω/dt = +(5μg/2r)·sgn(s) for a uniform
    // sphere (I = 2/5·m·r²). Stepped at 10 µs until the slip changes sign,
    // so the two agree to about one step (a 1 % error in the distance would be 3 mm).
    const radius = 0.021335, mu = 0.15, g = 9.81, dt = 1e-5;
    for (const spin of [-30, 20, 120]) {
      let v = 1.5, w = spin, x = 0, t = 0;
      const sign = Math.sign(v - radius * w);
      while (Math.sign(v - radius * w) === sign) {
        x += v * dt - 0.5 * sign * mu * g * dt * dt;
        v -= sign * mu * g * dt;
        w += sign * ((5 * mu * g) / (2 * radius)) * dt;
        t += dt;
      }
      const r = skidToRoll({ speed: 1.5, spin, mu, radius, gravity: g });
      expect(Math.abs(r.skidTime - t)).toBeLessThan(2e-5);
      expect(Math.abs(r.skidDistance - x)).toBeLessThan(5e-5);
      expect(Math.abs(r.rollSpeed - v)).toBeLessThan(5e-5);
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
