import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { fitViewport, imageToScreen, panBy, pinch, screenToImage, zoomAbout, type Viewport } from "@/lib/review/viewport";

const finite = (min: number, max: number) => fc.double({ min, max, noNaN: true, noDefaultInfinity: true });
const viewport = fc.record({ scale: finite(0.05, 50), x: finite(-5000, 5000), y: finite(-5000, 5000) });
const point = fc.tuple(finite(-4000, 4000), finite(-4000, 4000));
const close = (a: readonly number[], b: readonly number[], tol = 1e-6) => a.every((v, i) => Math.abs(v - b[i]!) <= tol * Math.max(1, Math.abs(v)));

describe("screen ↔ image", () => {
  it("maps by scale then offset", () => {
    const vp: Viewport = { scale: 2, x: 10, y: -5 };
    expect(imageToScreen(vp, [3, 4])).toEqual([16, 3]);
    expect(screenToImage(vp, [16, 3])).toEqual([3, 4]);
  });

  it("round-trips image → screen → image for any viewport (property)", () => {
    fc.assert(fc.property(viewport, point, (vp, p) => close(screenToImage(vp, imageToScreen(vp, p)), p)));
  });

  it("round-trips screen → image → screen for any viewport (property)", () => {
    fc.assert(fc.property(viewport, point, (vp, p) => close(imageToScreen(vp, screenToImage(vp, p)), p)));
  });
});

describe("fitting the frame", () => {
  it("centres a 16:9 frame in a taller stage, as large as fits", () => {
    expect(fitViewport({ width: 1920, height: 1080 }, { width: 960, height: 800 })).toEqual({ scale: 0.5, x: 0, y: 130 });
  });

  it("letterboxes a narrow stage the other way", () => {
    const vp = fitViewport({ width: 640, height: 360 }, { width: 1000, height: 360 });
    expect(vp).toEqual({ scale: 1, x: 180, y: 0 });
  });

  it("falls back to identity on an empty stage", () => {
    expect(fitViewport({ width: 640, height: 360 }, { width: 0, height: 0 })).toEqual({ scale: 1, x: 0, y: 0 });
  });
});

describe("zoom and pan", () => {
  it("keeps the image point under the anchor fixed when zooming (property)", () => {
    fc.assert(
      fc.property(viewport, point, finite(0.5, 2), (vp, anchor, factor) => {
        const before = screenToImage(vp, anchor);
        const after = screenToImage(zoomAbout(vp, anchor, factor, vp.scale), anchor);
        return close(before, after, 1e-6);
      }),
    );
  });

  it("zooms in by the factor within limits and clamps beyond them", () => {
    const vp: Viewport = { scale: 1, x: 0, y: 0 };
    expect(zoomAbout(vp, [100, 50], 2).scale).toBe(2);
    expect(zoomAbout(vp, [100, 50], 2)).toEqual({ scale: 2, x: -100, y: -50 });
    expect(zoomAbout(vp, [0, 0], 1000, 1).scale).toBe(40);
    expect(zoomAbout(vp, [0, 0], 0.001, 1).scale).toBe(0.25);
  });

  it("panning moves every image point by the same screen distance", () => {
    const vp: Viewport = { scale: 3, x: 5, y: 7 };
    const moved = panBy(vp, 12, -4);
    const p = [20, 30] as const;
    const a = imageToScreen(vp, p);
    const b = imageToScreen(moved, p);
    expect([b[0] - a[0], b[1] - a[1]]).toEqual([12, -4]);
  });

  it("a pinch that spreads the fingers twice as far doubles the zoom about their midpoint", () => {
    const vp: Viewport = { scale: 1, x: 0, y: 0 };
    const next = pinch(vp, [[90, 100], [110, 100]], [[80, 100], [120, 100]]);
    expect(next.scale).toBe(2);
    expect(screenToImage(next, [100, 100])).toEqual([100, 100]);
  });

  it("a pinch with the fingers moving together only pans", () => {
    const vp: Viewport = { scale: 1.5, x: 0, y: 0 };
    const next = pinch(vp, [[90, 100], [110, 100]], [[100, 110], [120, 110]], 1);
    expect(next).toEqual({ scale: 1.5, x: 10, y: 10 });
  });
});
