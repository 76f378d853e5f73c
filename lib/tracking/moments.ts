/**
 * Moments of the clip decided from per-frame series (pure, no images).
 * - Impact from the ball: the last frame before the ball's centre leaves its rest position.
 * - Address: the last frame of the last still run (the head region unchanged against the
 *   first frame) before impact; the takeaway starts after it.
 */
import { median } from "./image";

/** A move smaller than this (px) is the fit's own jitter, not the ball starting to roll. */
export const MIN_BALL_MOVE_PX = 0.5;

/** Frames within which a real start must carry the ball `confirmPx` from rest. */
export const CONFIRM_FRAMES = 10;

/**
 * `displacement[f]`: distance of the ball's centre on frame f from its rest position, px
 * (null when the ball was not found on that frame, e.g. blurred away or in deep shadow). The ball
 * has moved at frame f when displacement exceeds the threshold from f on and, within
 * CONFIRM_FRAMES, reaches `confirmPx`, or, seen clearly moving (twice the threshold), is not
 * found again on any of those frames (gone for good): a shadow sweeping over the ball shifts its fitted centre a little, may hide
 * it for a while, and gives it back; a struck ball keeps going. Returns impact = that f − 1, or
 * null when the ball never moves (or the series ends before a move is confirmed).
 */
export function impactFromBall(displacement: readonly (number | null)[], jitterPx = 0, confirmPx = 0): number | null {
  const threshold = Math.max(MIN_BALL_MOVE_PX, 6 * jitterPx);
  const confirm = Math.max(confirmPx, 2 * threshold);
  for (let f = 1; f < displacement.length - 1; f++) {
    const d = displacement[f];
    if (d === null || d === undefined || d <= threshold) continue;
    let lost = 0, farthest = d;
    for (let g = f + 1; g < Math.min(displacement.length, f + CONFIRM_FRAMES + 1); g++) {
      const v = displacement[g];
      if (v === null || v === undefined) {
        if (++lost === CONFIRM_FRAMES && farthest >= 2 * threshold) return f - 1;
        continue;
      }
      farthest = Math.max(farthest, v);
      if (v <= threshold) break;
      if (v >= confirm) return f - 1;
    }
  }
  return null;
}

/** The fit's jitter at rest: median displacement over the first frames (before anything moves). */
export function restJitter(displacement: readonly (number | null)[], frames = 20): number {
  const values = displacement.slice(0, frames).filter((v): v is number => v !== null);
  return values.length ? median(values) : 0;
}

/** Frames still for this many in a row make an address (a single quiet frame is a head passing by). */
export const MIN_STILL_RUN = 3;

/**
 * `changed[f]`: pixels near the ball that differ from the first frame. Still means at most
 * `threshold` of them. The address is the last frame of the last run of ≥ MIN_STILL_RUN still
 * frames at or before `impact`; null when there is none.
 */
export function addressFromStillness(changed: readonly number[], threshold: number, impact: number): number | null {
  let run = 0;
  let address: number | null = null;
  for (let f = 0; f <= Math.min(impact, changed.length - 1); f++) {
    if (changed[f]! <= threshold) {
      run++;
      if (run >= MIN_STILL_RUN) address = f;
    } else run = 0;
  }
  return address;
}

/**
 * The address frame to the frame: a head creeping off by a fraction of a pixel changes no pixel
 * past the threshold but does raise the mean absolute change near the ball (`meanChange`,
 * against the first frame, flicker's common offset removed). The baseline is the still run's
 * first half; the address is the last frame of the run within 4 of its robust s.d. of it.
 */
export function refineAddress(meanChange: readonly number[], runStart: number, runEnd: number): number {
  const half = meanChange.slice(runStart, runStart + Math.max(2, Math.floor((runEnd - runStart + 1) / 2)));
  const base = median(half);
  const m = median(half.map((v) => Math.abs(v - base)));
  const limit = base + Math.max(4 * 1.4826 * m, 0.02 * base, 0.01);
  let address = runEnd;
  while (address > runStart && meanChange[address]! > limit) address--;
  return address;
}
