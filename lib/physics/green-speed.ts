import { mean } from "simple-statistics";

export type StimpReading = { readingFt: number; meanUpFt: number; meanDownFt: number; problems: string[] };

const INCH_IN_FT = 1 / 12;

/**
 * Green speed from Stimpmeter rolls (USGA Stimpmeter Instruction Booklet): three balls each way,
 * each set of three within 8 in, the reading is the mean of the two directions' means, and
 * directions more than 18 in apart call for re-measuring.
 */
export function stimpmeterReading(rollsOneWayFt: readonly number[], rollsOtherWayFt: readonly number[]): StimpReading {
  if (rollsOneWayFt.length === 0 || rollsOtherWayFt.length === 0) throw new Error("rolls are needed in both directions");
  const problems: string[] = [];
  for (const [name, set] of [["first", rollsOneWayFt], ["second", rollsOtherWayFt]] as const) {
    if (Math.max(...set) - Math.min(...set) > 8 * INCH_IN_FT + 1e-9) problems.push(`The ${name} direction's balls lie more than 8 in apart: roll them again.`);
  }
  const meanUpFt = mean([...rollsOneWayFt]);
  const meanDownFt = mean([...rollsOtherWayFt]);
  if (Math.abs(meanUpFt - meanDownFt) > 18 * INCH_IN_FT + 1e-9) problems.push("The two directions differ by more than 18 in: the slope is too steep, measure elsewhere or correct for slope.");
  return { readingFt: meanOfDirections(meanUpFt, meanDownFt), meanUpFt, meanDownFt, problems };
}

/** Mean of the two directions' mean rolls (USGA Stimpmeter Instruction Booklet). */
export const meanOfDirections = (oneWayFt: number, otherWayFt: number): number => (oneWayFt + otherWayFt) / 2;

/** Slope-corrected reading S = 2·S↑·S↓/(S↑ + S↓) — A. D. Brede, USGA Green Section Record 28(6), 1990. */
export function slopeCorrectedReading(upFt: number, downFt: number): number {
  if (!(upFt > 0) || !(downFt > 0)) throw new Error("both readings must be positive");
  return (2 * upFt * downFt) / (upFt + downFt);
}
