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

export type TrackedRoll = {
  /** Least-squares slope of the ball's distance against time over its tracked frames, m/s. */
  meanSpeed: number;
  /** Times of those frames after the impact instant, s. */
  speedTimes: readonly number[];
  /** Least-squares slope of the ball's turning against time over the marker frames, rad/s (topspin +). */
  meanSpin: number;
  /** Times of the marker frames after the impact instant, s. */
  spinTimes: readonly number[];
  mu: number;
  radius?: number;
  gravity?: number;
};

/** Distance travelled and angle turned t seconds after launch, in the sliding-then-rolling model above. */
function motionAt(speed: number, spin: number, t: number, mu: number, radius: number, gravity: number): { x: number; phi: number } {
  const slip = speed - radius * spin;
  const sign = Math.sign(slip);
  const slideEnd = (2 * Math.abs(slip)) / (7 * mu * gravity);
  const spinAcceleration = (5 * mu * gravity) / (2 * radius);
  const ts = Math.min(t, slideEnd);
  const x = speed * ts - 0.5 * sign * mu * gravity * ts * ts;
  const phi = spin * ts + 0.5 * sign * spinAcceleration * ts * ts;
  if (t <= slideEnd) return { x, phi };
  const rollSpeed = (5 * speed + 2 * radius * spin) / 7;
  return { x: x + rollSpeed * (t - slideEnd), phi: phi + (rollSpeed / radius) * (t - slideEnd) };
}

/** Σ(tᵢ − t̄)·tᵢ² / Σ(tᵢ − t̄)²: the least-squares slope of t² sampled at these times. */
function curvatureFactor(times: readonly number[]): number {
  return slopeOf(times, (t) => t * t);
}

/** Least-squares slope of f(t) sampled at `times` (Σ(tᵢ − t̄)·f(tᵢ) / Σ(tᵢ − t̄)²); run inside Newton's loop, so no arrays. */
function slopeOf(times: readonly number[], f: (t: number) => number): number {
  let tm = 0;
  for (const t of times) tm += t;
  tm /= times.length;
  let sxy = 0, sxx = 0;
  for (const t of times) {
    sxy += (t - tm) * f(t);
    sxx += (t - tm) * (t - tm);
  }
  return sxy / sxx;
}

/**
 * Speed and spin at the impact instant from the least-squares speed and spin a camera measured
 * over later frames: the launch state whose sliding-then-rolling motion (skidToRoll's model)
 * gives the same least-squares slopes over the same frames, found by Newton's method. Null when
 * the ball was rolling over all (or all but the first) tracked frames: the launch state then cannot
 * be told.
 */
export function launchFromTrack({ meanSpeed, speedTimes, meanSpin, spinTimes, mu, radius = BALL_RADIUS_M, gravity = STANDARD_GRAVITY }: TrackedRoll): { speed: number; spin: number } | null {
  if (!(mu > 0) || speedTimes.length < 2 || spinTimes.length < 2) return null;
  // A slide seen on fewer than two tracked frames is one of many launches that fit (down to a ball
  // rolling from the start): not identified.
  const seen = [...speedTimes].sort((a, b) => a - b)[1] as number;
  const identified = (v: number, w: number) => ((2 * Math.abs(v - radius * w)) / (7 * mu * gravity) > seen ? { speed: v, spin: w } : null);
  const predict = (v: number, w: number): [number, number] => [
    slopeOf(speedTimes, (t) => motionAt(v, w, t, mu, radius, gravity).x),
    slopeOf(spinTimes, (t) => motionAt(v, w, t, mu, radius, gravity).phi),
  ];
  // Start from the exact answer for a ball sliding over every tracked frame: the least-squares slope
  // of a + b·t² sampled at tᵢ is a + b·Σ(tᵢ − t̄)tᵢ² / Σ(tᵢ − t̄)², with b = ∓μg/2 for the centre and
  // ±5μg/(4r) for the turning (sign of the slip).
  const sign = Math.sign(meanSpeed - radius * meanSpin) || 1;
  let v = meanSpeed + sign * ((mu * gravity) / 2) * curvatureFactor(speedTimes);
  let w = meanSpin - sign * ((5 * mu * gravity) / (4 * radius)) * curvatureFactor(spinTimes);
  const scaleV = Math.max(Math.abs(meanSpeed), 1e-3);
  const scaleW = Math.max(Math.abs(meanSpin), scaleV / radius, 1e-3);
  for (let i = 0; i < 50; i++) {
    const [pv, pw] = predict(v, w);
    const [ev, ew] = [meanSpeed - pv, meanSpin - pw];
    if (Math.abs(ev) < 1e-10 * scaleV && Math.abs(ew) < 1e-10 * scaleW) return identified(v, w);
    const hv = 1e-7 * scaleV, hw = 1e-7 * scaleW;
    const [av, aw] = predict(v + hv, w);
    const [bv, bw] = predict(v, w + hw);
    const j = [[(av - pv) / hv, (bv - pv) / hw], [(aw - pw) / hv, (bw - pw) / hw]] as const;
    const det = j[0][0] * j[1][1] - j[0][1] * j[1][0];
    // Rolling throughout: speed and spin move together, and only their rolling speed is seen.
    if (Math.abs(det) < 1e-6 * Math.abs(j[0][0] * j[1][1]) || !Number.isFinite(det)) return null;
    const dv = (j[1][1] * ev - j[0][1] * ew) / det;
    const dw = (j[0][0] * ew - j[1][0] * ev) / det;
    v += dv;
    w += dw;
    // Converged to what the finite-difference slopes can resolve.
    if (Math.abs(dv) < 1e-9 * scaleV && Math.abs(dw) < 1e-9 * scaleW) return identified(v, w);
  }
  return identified(v, w);
}
