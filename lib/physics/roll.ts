/**
 * Speed of the ball leaving the Stimpmeter ramp, ≈ 6.0 ft/s = 1.8288 m/s: a widely quoted
 * secondary value, from memory for the USGA booklet itself.
 */
export const STIMP_RAMP_SPEED_MPS = 1.8288;

// Flat-green roll model, derived: constant deceleration a with v² = 2·a·s, so a ball leaving the
// ramp at v₀ and rolling the reading S gives a = v₀²/(2S); every other roll scales as v².

/** Rolling deceleration (m/s²) on a green whose reading is `readingM` metres. */
export function rollingDeceleration(readingM: number, rampSpeed = STIMP_RAMP_SPEED_MPS): number {
  if (!(readingM > 0)) throw new Error("the green's reading must be positive");
  return rampSpeed ** 2 / (2 * readingM);
}

/** Distance (m) a ball rolling at `speed` m/s covers before stopping on that green. */
export function rollOutDistance(speed: number, readingM: number, rampSpeed = STIMP_RAMP_SPEED_MPS): number {
  return speed ** 2 / (2 * rollingDeceleration(readingM, rampSpeed));
}

/** Rolling speed (m/s) needed to roll `distanceM` metres on that green. */
export function speedToRoll(distanceM: number, readingM: number, rampSpeed = STIMP_RAMP_SPEED_MPS): number {
  if (!(distanceM >= 0)) throw new Error("the distance must not be negative");
  return Math.sqrt(2 * rollingDeceleration(readingM, rampSpeed) * distanceM);
}
