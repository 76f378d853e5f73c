/**
 * Suggested impact frame from a motion signal (see signal.ts). Impact is the last frame
 * before the ball has moved (docs/measurements.md).
 *
 * Method. Until impact the picture changes only where the head moves; a pendulum head
 * speeds up and slows down smoothly, so its share of the signal changes little from one
 * frame to the next. From the first frame after impact the ball moves too, and keeps
 * moving, faster than the head (a putt leaves at roughly 1.3–1.7 × head speed, from
 * memory). So the signal takes a sudden step up that lasts, between frame k and k + 1.
 * For each frame c we measure a persistent rise:
 *   rise(c) = min(s[c+1], s[c+2]) − max(s[c], s[c−1])
 * Taking the minimum after and the maximum before means a one-frame spike (a flicker, a
 * compression glitch) does not count, while a lasting step counts in full. The suggested
 * impact frame is the c with the largest rise. Its strength is that rise divided by the
 * typical frame-to-frame change of the signal (median absolute first difference); a
 * suggestion weaker than MIN_STRENGTH is withheld, and the fitter marks impact by hand.
 * Limits: anything else that starts moving for good in one frame (a person stepping into
 * view, a light switched on) can win; the fitter confirms every suggestion.
 */

export interface ImpactSuggestion {
  frame: number;
  /** rise at the suggested frame ÷ typical frame-to-frame change of the signal */
  strength: number;
}

export const MIN_STRENGTH = 4;

function median(values: number[]): number {
  if (values.length === 0) return 0;
  const sorted = [...values].sort((a, b) => a - b);
  const mid = sorted.length >> 1;
  return sorted.length % 2 ? sorted[mid]! : (sorted[mid - 1]! + sorted[mid]!) / 2;
}

export function persistentRise(signal: readonly number[], c: number): number {
  const before = Math.max(signal[c] ?? NaN, signal[c - 1] ?? NaN);
  const after = Math.min(signal[c + 1] ?? NaN, signal[c + 2] ?? NaN);
  return after - before;
}

export function suggestImpactFrame(signal: readonly number[]): ImpactSuggestion | null {
  // signal[0] is 0 by definition, so rises are measured from c = 2 on.
  let best = -1;
  let bestRise = -Infinity;
  for (let c = 2; c + 2 < signal.length; c++) {
    const rise = persistentRise(signal, c);
    if (rise > bestRise) {
      bestRise = rise;
      best = c;
    }
  }
  if (best < 0) return null;
  const changes: number[] = [];
  for (let i = 2; i < signal.length; i++) changes.push(Math.abs(signal[i]! - signal[i - 1]!));
  // Floor the typical change so that a perfectly still, noiseless clip cannot divide by 0.
  const typical = Math.max(median(changes), 1e-3);
  const strength = bestRise / typical;
  return strength >= MIN_STRENGTH ? { frame: best, strength } : null;
}
