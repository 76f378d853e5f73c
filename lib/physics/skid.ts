import { STANDARD_GRAVITY } from "./units";

/** Ball radius from the Rules of Golf minimum diameter 42.67 mm (Equipment Rules, Appendix III). */
export const BALL_RADIUS_M = 0.021335;

export type SkidInput = {
  /** Launch speed of the ball's centre, m/s (forward positive). */
  speed: number;
  /** Initial spin, rad/s; topspin (turning with forward roll) positive. */
  spin: number;
  /** Sliding friction coefficient between ball and green; no agreed published value, so the studio sets it. */
  mu: number;
  radius?: number;
  gravity?: number;
};

export type SkidResult = { rollSpeed: number; skidTime: number; skidDistance: number };

/**
 * Sliding-to-rolling transition of a uniform sphere (I = 2/5·m·r²) — A. R. Penner, "The physics of
 * putting", Can. J. Phys. 80:83–96 (2002). Friction μmg acts against the contact point's slip
 * v − rω until v = rω; pure roll then starts at v = (5v₀ + 2rω₀)/7.
 */
export function skidToRoll({ speed, spin, mu, radius = BALL_RADIUS_M, gravity = STANDARD_GRAVITY }: SkidInput): SkidResult {
  if (!(mu > 0) || !(gravity > 0) || !(radius > 0)) throw new Error("friction, gravity and radius must be positive");
  const slip = speed - radius * spin;
  const rollSpeed = (5 * speed + 2 * radius * spin) / 7;
  // The slip changes at (1 + 5/2)·μg = 7/2·μg, so it vanishes after 2|slip|/(7μg).
  const skidTime = (2 * Math.abs(slip)) / (7 * mu * gravity);
  // The centre decelerates at μg when slipping forward (under-spun), accelerates when over-spun.
  const acceleration = -Math.sign(slip) * mu * gravity;
  const skidDistance = speed * skidTime + 0.5 * acceleration * skidTime ** 2;
  return { rollSpeed, skidTime, skidDistance };
}
