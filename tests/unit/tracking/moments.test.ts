import { describe, expect, it } from "vitest";
import { addressFromStillness, impactFromBall, refineAddress, MIN_BALL_MOVE_PX } from "@/lib/tracking/moments";

describe("impact from the ball's displacement", () => {
  it("is the last frame before the ball moves (the fixtures' convention: still on k, moving from k + 1)", () => {
    const k = 12;
    const series = Array.from({ length: 30 }, (_, f) => (f <= k ? 0.02 * ((f * 7) % 3) : 9 * (f - k)));
    expect(impactFromBall(series)).toBe(k);
  });

  it("ignores a one-frame jump (the head brushing the fit) that falls back", () => {
    const series = [0, 0.01, 0.02, 0.9, 0.01, 0.02, 0.01, 2, 4, 6];
    expect(impactFromBall(series)).toBe(6);
  });

  it("ignores a shift that grows and goes back (a shadow edge sweeping over the ball) and needs the ball carried away", () => {
    const shadow = [0, 0, 0, 0.6, 1.2, 1.8, 1.2, 0.6, 0.1, 0, 0, 0, 3, 6, 9, 12];
    expect(impactFromBall(shadow, 0, 5)).toBe(11);
    // Not confirmed yet: the series ends before the ball is 5 px from rest.
    expect(impactFromBall([0, 0, 0, 1, 2, 3], 0, 5)).toBeNull();
  });

  it("counts a ball lost for good (blurred away, out of the picture) as moved, but not one a shadow hides for a while", () => {
    const gone = [0, 0, 0, 0, 3, ...Array.from({ length: 10 }, () => null)];
    expect(impactFromBall(gone)).toBe(3);
    // Not decided while the ball might still come back.
    expect(impactFromBall(gone.slice(0, 10))).toBeNull();
    // A shadow creeping over the ball: the fit drifts, the ball is lost, then found at rest again.
    const shaded = [0, 0, 0, 0.2, 0.4, 0.6, null, null, null, null, 0.3, 0.1, 0, 0, 0];
    expect(impactFromBall(shaded)).toBeNull();
  });

  it("raises its threshold with the fit's jitter and finds nothing when the ball never moves", () => {
    const still = Array.from({ length: 50 }, (_, f) => 0.1 * ((f * 5) % 4));
    expect(impactFromBall(still, 0.1)).toBeNull();
    expect(impactFromBall([0, 0.4, 0.45, 0.4], 0)).toBeNull();
    expect(MIN_BALL_MOVE_PX).toBe(0.5);
  });
});

describe("address frame", () => {
  it("is the last frame of the last still run of at least three frames before impact", () => {
    // still 0–9, takeaway from 10; a single quiet frame (16) as the head passes its address spot.
    const changed = [0, 0, 1, 0, 0, 0, 1, 0, 0, 0, 40, 90, 200, 300, 200, 90, 3, 80, 120];
    expect(addressFromStillness(changed, 5, 18)).toBe(9);
  });

  it("is null when nothing is still", () => {
    expect(addressFromStillness([50, 60, 70], 5, 2)).toBeNull();
  });

  it("moves back to where the mean change leaves its still baseline (a creeping takeaway)", () => {
    const mean = [1.5, 1.51, 1.49, 1.5, 1.52, 1.48, 1.5, 1.51, 1.56, 1.65, 1.8];
    expect(refineAddress(mean, 0, 10)).toBe(7);
  });
});
