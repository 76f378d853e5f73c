export type BuildForRules = {
  loftDeg?: number | null;
  lengthIn?: number | null;
  lieDeg?: number | null;
  /** Largest cross-section dimension of the grip, inches. */
  gripMaxDimensionIn?: number | null;
};

export type RuleWarning = { field: keyof BuildForRules; message: string; rule: string };

// R&A/USGA Equipment Rules (2019), Part 2 "Clubs" and Appendix III; every limit is inclusive.
const LIMITS = {
  maxLoftDeg: 10,
  minLengthIn: 18,
  maxLieDeg: 80,
  maxGripDimensionIn: 1.75,
};

/** Warnings for a putter build that breaks an equipment rule (conformance is the rule body's call; these are flags). */
export function equipmentWarnings(build: BuildForRules): RuleWarning[] {
  const warnings: RuleWarning[] = [];
  const { loftDeg, lengthIn, lieDeg, gripMaxDimensionIn } = build;
  if (loftDeg != null && loftDeg > LIMITS.maxLoftDeg) {
    warnings.push({ field: "loftDeg", message: `Loft ${loftDeg}° is over the 10° allowed for a putter.`, rule: "Equipment Rules, Part 2 (putter loft at most 10°)" });
  }
  if (lengthIn != null && lengthIn < LIMITS.minLengthIn) {
    warnings.push({ field: "lengthIn", message: `Length ${lengthIn} in is under the 18 in minimum.`, rule: "Equipment Rules, Part 2 (club length at least 18 in)" });
  }
  if (lieDeg != null && lieDeg > LIMITS.maxLieDeg) {
    warnings.push({ field: "lieDeg", message: `Lie ${lieDeg}° leaves the shaft less than 10° from vertical (at most 80°).`, rule: "Equipment Rules, Part 2 (shaft at least 10° from vertical in the heel–toe plane)" });
  }
  if (gripMaxDimensionIn != null && gripMaxDimensionIn > LIMITS.maxGripDimensionIn) {
    warnings.push({ field: "gripMaxDimensionIn", message: `Grip dimension ${gripMaxDimensionIn} in is over the 1.75 in allowed for a putter grip.`, rule: "Equipment Rules, Part 2 and Appendix III (putter grip cross-section at most 1.75 in)" });
  }
  return warnings;
}
