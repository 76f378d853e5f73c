import { errorFunction } from "simple-statistics";

/**
 * Standard normal CDF Φ(x) = ½(1 + erf(x/√2)). simple-statistics' errorFunction is the Chebyshev
 * approximation `erfcc` of Numerical Recipes in C (2nd ed., §6.2), fractional error below 1.2e-7 —
 * ample for probabilities shown to four decimals. (Its cumulativeStdNormalProbability is a
 * two-decimal table lookup, too coarse here.)
 */
export function normalCdf(x: number): number {
  return 0.5 * (1 + errorFunction(x / Math.SQRT2));
}
