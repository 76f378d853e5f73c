import { holingWindowDeg, makeProbability } from "@/lib/physics/holing";
import { METRES_PER_FOOT } from "@/lib/physics/units";
import type { Summary } from "@/lib/stats/summary";
import { MIN_PUTTS_FOR_MAKE } from "@/lib/stats/wilson";

export { MIN_PUTTS_FOR_MAKE };

export const MAKE_DISTANCES_FT = [3, 6, 10, 20] as const;

export type MakeChance = { distanceFt: number; windowDeg: number; probability: number | null };

/**
 * Make probability at each distance from a build's start direction, taken as Normal(mean, sd)
 * (derived: the holing window atan(r/D) of lib/physics/holing). Null with no spread, and below
 * MIN_PUTTS_FOR_MAKE putts: a share read off fewer putts cannot tell mostly holed from mostly
 * missed (Wilson score interval, lib/stats/wilson.ts), so no percentage is given for it.
 */
export function makeChances(startDirection: Summary | null, distancesFt: readonly number[] = MAKE_DISTANCES_FT): MakeChance[] {
  return distancesFt.map((distanceFt) => {
    const distanceM = distanceFt * METRES_PER_FOOT;
    const usable = startDirection && startDirection.n >= MIN_PUTTS_FOR_MAKE && startDirection.sd !== null && startDirection.sd > 0;
    return {
      distanceFt,
      windowDeg: holingWindowDeg(distanceM),
      probability: usable ? makeProbability(distanceM, startDirection.mean, startDirection.sd!) : null,
    };
  });
}
