import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { fitBall } from "@/lib/tracking/ball";
import { findMarker } from "@/lib/tracking/marker";
import { Canvas } from "./render";

// A white ball (240) on turf (110), as the clip fixtures draw it; r = 25.2 px is 3.5 % of 720 px.
const TURF = 110, BALL = 240;

describe("sub-pixel ball centre and diameter (edge rays + Kåsa 1976 circle fit)", () => {
  it("finds rendered discs' centres to 0.1 px and diameters to 0.1 px wherever the centre falls in a pixel", () => {
    fc.assert(
      fc.property(fc.double({ min: 60, max: 140, noNaN: true }), fc.double({ min: 60, max: 100, noNaN: true }), fc.double({ min: 6, max: 30, noNaN: true }), (x, y, r) => {
        const image = new Canvas(200, 160, TURF).disc(x, y, r, BALL).toImage();
        const fit = fitBall(image, { x: x + r * 0.3, y: y - r * 0.2, r: r * 1.1 })!;
        expect(fit).not.toBeNull();
        expect(Math.hypot(fit.x - x, fit.y - y)).toBeLessThan(0.1);
        expect(Math.abs(2 * fit.r - 2 * r)).toBeLessThan(0.1);
      }),
      { numRuns: 40, seed: 7 },
    );
  });

  it("keeps 0.1 px with sensor noise (σ = 3 grey levels) and states a precision that covers its error", () => {
    let covered = 0;
    const runs = 40;
    for (let seed = 1; seed <= runs; seed++) {
      const x = 100 + seed * 0.037, y = 80 - seed * 0.021;
      const image = new Canvas(200, 160, TURF).disc(x, y, 20, BALL).toImage({ seed, sd: 3 });
      const fit = fitBall(image, { x, y, r: 20 })!;
      const error = Math.hypot(fit.x - x, fit.y - y);
      expect(error).toBeLessThan(0.1);
      // A 2-D error within √2 of the per-axis standard error: about 63 % of the time for a normal error.
      if (error <= Math.SQRT2 * fit.precisionPx) covered++;
    }
    expect(covered / runs).toBeGreaterThan(0.5);
  });

  it("is not pulled by a dark marker dot inside the ball, nor by a dark head touching it", () => {
    const image = new Canvas(200, 160, TURF).disc(100.3, 80.6, 20, BALL).disc(107, 74, 3, 40).box(100.3, 80.6 + 20 + 8, [1, 0], 90, 16, 40).toImage();
    const fit = fitBall(image, { x: 100, y: 80, r: 20 })!;
    expect(Math.hypot(fit.x - 100.3, fit.y - 80.6)).toBeLessThan(0.1);
  });

  it("finds no ball where there is none", () => {
    expect(fitBall(new Canvas(200, 160, TURF).toImage({ seed: 3, sd: 3 }), { x: 100, y: 80, r: 20 })).toBeNull();
  });
});

describe("marker dot", () => {
  it("finds a dark dot's centre to 0.1 px and moves with it (property: translation)", () => {
    fc.assert(
      fc.property(fc.double({ min: -10, max: 10, noNaN: true }), fc.double({ min: -10, max: 10, noNaN: true }), (dx, dy) => {
        const ball = { x: 100, y: 80, r: 25 };
        const image = new Canvas(200, 160, TURF).disc(ball.x, ball.y, ball.r, BALL).disc(ball.x + dx, ball.y + dy, 3, 60).toImage();
        const found = findMarker(image, { ...ball, inside: BALL, background: TURF }, 1)!;
        expect(Math.hypot(found.point[0] - (ball.x + dx), found.point[1] - (ball.y + dy))).toBeLessThan(0.1);
      }),
      { numRuns: 30, seed: 5 },
    );
  });

  it("reports none on a plain ball", () => {
    const image = new Canvas(200, 160, TURF).disc(100, 80, 25, BALL).toImage({ seed: 2, sd: 2 });
    expect(findMarker(image, { x: 100, y: 80, r: 25, inside: BALL, background: TURF }, 2)).toBeNull();
  });
});
