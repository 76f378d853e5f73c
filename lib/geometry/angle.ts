import { cross, dot, type Vec2 } from "./vector";

export const toDegrees = (radians: number): number => (radians * 180) / Math.PI;
export const toRadians = (degrees: number): number => (degrees * Math.PI) / 180;

/** Signed angle from direction a to direction b in radians, in (−π, π]; positive is clockwise on a y-down image. */
export function signedAngle(a: Vec2, b: Vec2): number {
  // atan2 of the cross and dot products: standard plane trigonometry, robust near 0 and π.
  return Math.atan2(cross(a, b), dot(a, b));
}

/** Angle of direction d in a frame with forward axis `forward` and side axis `side` (atan2(d·side, d·forward)), degrees. */
export function angleInFrameDeg(d: Vec2, forward: Vec2, side: Vec2): number {
  return toDegrees(Math.atan2(dot(d, side), dot(d, forward)));
}

/** Removes 2π jumps from a sequence of angles (radians) so consecutive values differ by at most π. */
export function unwrapRadians(angles: readonly number[]): number[] {
  const out: number[] = [];
  let offset = 0;
  angles.forEach((a, i) => {
    if (i > 0) {
      const previousRaw = angles[i - 1] as number;
      let step = a - previousRaw;
      while (step > Math.PI) { offset -= 2 * Math.PI; step -= 2 * Math.PI; }
      while (step <= -Math.PI) { offset += 2 * Math.PI; step += 2 * Math.PI; }
    }
    out.push(a + offset);
  });
  return out;
}

/** An angle difference in degrees wrapped into (−180°, 180°]. */
export function wrapDegrees(degrees: number): number {
  const wrapped = degrees - 360 * Math.floor((degrees + 180) / 360);
  return wrapped === -180 ? 180 : wrapped;
}

/**
 * Unwraps a sequence of angles (radians) sampled at `times` (s), choosing each step's whole
 * number of turns so that the step is nearest to `expectedRate`·Δt (rad/s): a prior that decides
 * the branch when samples are so far apart that the turn between them can exceed half a turn.
 */
export function unwrapRadiansNear(angles: readonly number[], times: readonly number[], expectedRate: number): number[] {
  const out: number[] = [];
  angles.forEach((a, i) => {
    if (i === 0) return void out.push(a);
    const raw = a - (angles[i - 1] as number);
    const expected = expectedRate * ((times[i] as number) - (times[i - 1] as number));
    const turns = Math.round((expected - raw) / (2 * Math.PI));
    out.push((out[i - 1] as number) + raw + 2 * Math.PI * turns);
  });
  return out;
}
