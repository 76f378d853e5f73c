import { toDegrees, toRadians } from "@/lib/geometry/angle";
import { normalCdf } from "./normal";
import { METRES_PER_INCH } from "./units";

/** Hole radius: the hole is 4.25 in (108 mm) across — Rules of Golf, Definitions, "Hole". */
export const HOLE_RADIUS_M = 2.125 * METRES_PER_INCH;

/** Lateral miss at the hole for a start-direction error θ over distance D: D·tan θ (derived). */
export function lateralMiss(distanceM: number, errorDeg: number): number {
  return distanceM * Math.tan(toRadians(errorDeg));
}

/**
 * Largest start-direction error (deg) whose line still crosses the hole: atan(r/D) with the hole
 * radius r from the Rules of Golf (derived; a dying-speed ball, the rim as the edge).
 */
export function holingWindowDeg(distanceM: number): number {
  if (!(distanceM > 0)) throw new Error("the distance must be positive");
  return toDegrees(Math.atan(HOLE_RADIUS_M / distanceM));
}

/**
 * Probability that a start direction ~ Normal(mean, sd) falls inside ±θ, θ the holing window:
 * Φ((θ − μ)/σ) − Φ((−θ − μ)/σ) (derived).
 */
export function makeProbability(distanceM: number, meanDeg: number, sdDeg: number): number {
  if (!(sdDeg > 0)) throw new Error("the spread must be positive");
  const window = holingWindowDeg(distanceM);
  return normalCdf((window - meanDeg) / sdDeg) - normalCdf((-window - meanDeg) / sdDeg);
}
