export type BuildForRules = {
  loftDeg?: number | null;
  lengthIn?: number | null;
  lieDeg?: number | null;
  /** The head's designed shaft lean at normal address along the line of play, degrees, + toward the target. */
  designShaftLeanDeg?: number | null;
  /** Largest cross-section dimension of the grip (of either grip when there are two), inches. */
  gripMaxWidthIn?: number | null;
  /** 1, or 2 for a putter with two separate grips. */
  gripCount?: number | null;
  /** Whether both grips are circular in cross-section (read only with two grips); null = not recorded. */
  gripsCircular?: boolean | null;
  /** Length of bare shaft between two grips, inches (read only with two grips). */
  gripGapIn?: number | null;
};

export type RuleWarning = { field: keyof BuildForRules; message: string; rule: string };

// R&A/USGA Equipment Rules (2019), Part 2 "Clubs"; every limit is inclusive. The rule numbers are
// those of Part 2 (1 clubs in general, 3 the grip); docs/references.md lists where each is tested.
const LIMITS = {
  maxLoftDeg: 10,
  minLengthIn: 18,
  maxLieDeg: 80, // 1d(i): shaft at least 10° from vertical in the heel–toe plane
  maxForwardLeanDeg: 20, // 1d(ii): along the line of play at most 20° forward …
  maxBackLeanDeg: 10, // … or 10° back, at normal address
  maxGripWidthIn: 1.75, // 3b(iii): no cross-section dimension over 1.75 in (44.45 mm)
  minGripGapIn: 1.5, // 3c: two grips at least 1.5 in (38.1 mm) apart
};

/** Warnings for a putter build that breaks an equipment rule (conformance is the rule body's call; these are flags). */
export function equipmentWarnings(build: BuildForRules): RuleWarning[] {
  const warnings: RuleWarning[] = [];
  const { loftDeg, lengthIn, lieDeg, designShaftLeanDeg: lean, gripMaxWidthIn, gripCount, gripsCircular, gripGapIn } = build;
  if (loftDeg != null && loftDeg > LIMITS.maxLoftDeg) {
    warnings.push({ field: "loftDeg", message: `Loft ${loftDeg}° is over the 10° allowed for a putter.`, rule: "Equipment Rules, Part 2 (putter loft at most 10°)" });
  }
  if (lengthIn != null && lengthIn < LIMITS.minLengthIn) {
    warnings.push({ field: "lengthIn", message: `Length ${lengthIn} in is under the 18 in minimum.`, rule: "Equipment Rules, Part 2 (club length at least 18 in)" });
  }
  if (lieDeg != null && lieDeg > LIMITS.maxLieDeg) {
    warnings.push({ field: "lieDeg", message: `Lie ${lieDeg}° leaves the shaft less than 10° from vertical (at most 80°).`, rule: "Equipment Rules, Part 2, 1d(i) (shaft at least 10° from vertical in the heel–toe plane)" });
  }
  if (lean != null && lean > LIMITS.maxForwardLeanDeg) {
    warnings.push({ field: "designShaftLeanDeg", message: `Designed shaft lean ${lean}° forward is over the 20° allowed along the line of play.`, rule: "Equipment Rules, Part 2, 1d(ii) (shaft at most 20° forward along the line of play at normal address)" });
  }
  if (lean != null && -lean > LIMITS.maxBackLeanDeg) {
    warnings.push({ field: "designShaftLeanDeg", message: `Designed shaft lean ${-lean}° back is over the 10° allowed along the line of play.`, rule: "Equipment Rules, Part 2, 1d(ii) (shaft at most 10° back along the line of play at normal address)" });
  }
  if (gripMaxWidthIn != null && gripMaxWidthIn > LIMITS.maxGripWidthIn) {
    warnings.push({ field: "gripMaxWidthIn", message: `Grip width ${gripMaxWidthIn} in is over the 1.75 in allowed in any direction.`, rule: "Equipment Rules, Part 2, 3b(iii) (grip cross-section at most 1.75 in in any direction)" });
  }
  if (gripCount === 2) {
    if (gripsCircular === false) {
      warnings.push({ field: "gripsCircular", message: "Two grips must each be circular in cross-section.", rule: "Equipment Rules, Part 2, 3c (a putter's two grips each circular in cross-section)" });
    }
    if (gripGapIn != null && gripGapIn < LIMITS.minGripGapIn) {
      warnings.push({ field: "gripGapIn", message: `Grips ${gripGapIn} in apart: two grips need at least 1.5 in of shaft between them.`, rule: "Equipment Rules, Part 2, 3c (a putter's two grips at least 1.5 in apart)" });
    }
  }
  return warnings;
}
