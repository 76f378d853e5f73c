import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { applyHomography, homographyFromPoints, keepsOrientation, type Quad } from "@/lib/geometry/homography";

describe("ground-plane homography", () => {
  it("reproduces the scikit-image tile_rectify worked example", () => {
    const h = homographyFromPoints([[129, 72], [302, 76], [90, 185], [326, 193]], [[0, 0], [400, 0], [0, 400], [400, 400]]);
    // scikit-image documentation, "Using geometric transformations" (tile_rectify): published H.
    const published = [
      [3.04026872, 1.04929628, -467.743998],
      [-0.144134582, 6.23382067, -430.241727],
      [2.63620673e-5, 4.17694527e-3, 1],
    ];
    h.forEach((row, i) => row.forEach((v, j) => {
      const p = published[i]![j]!;
      expect(Math.abs(v - p)).toBeLessThanOrEqual(Math.abs(p) * 1e-8 + 1e-12);
    }));
  });

  it("reproduces the affine case of REFERENCES.md and maps (3.5, 3) to (3, 3)", () => {
    const h = homographyFromPoints([[1, 1], [2, 5], [6, 5], [5, 1]], [[1, 1], [1, 5], [5, 5], [5, 1]]);
    const expected = [[1, -0.25, 0.25], [0, 1, 0], [0, 0, 1]];
    h.forEach((row, i) => row.forEach((v, j) => expect(v).toBeCloseTo(expected[i]![j]!, 12)));
    const [x, y] = applyHomography(h, [3.5, 3]);
    expect(x).toBeCloseTo(3, 12);
    expect(y).toBeCloseTo(3, 12);
  });

  it("detects a map that flips orientation", () => {
    const square: Quad = [[0, 0], [1, 0], [1, 1], [0, 1]];
    const mirrored: Quad = [[0, 0], [-1, 0], [-1, 1], [0, 1]];
    expect(keepsOrientation(homographyFromPoints(square, square), [0.5, 0.5])).toBe(true);
    expect(keepsOrientation(homographyFromPoints(square, mirrored), [0.5, 0.5])).toBe(false);
  });

  it("maps its four points exactly (property)", () => {
    // A convex quadrilateral: jittered corners of a large rectangle, onto an arbitrary rectangle.
    const jitter = fc.double({ min: -60, max: 60, noNaN: true });
    fc.assert(
      fc.property(fc.tuple(jitter, jitter, jitter, jitter, jitter, jitter, jitter, jitter), fc.double({ min: 50, max: 3000, noNaN: true }), fc.double({ min: 50, max: 3000, noNaN: true }), (j, w, hgt) => {
        const src: Quad = [[200 + j[0], 150 + j[1]], [1100 + j[2], 170 + j[3]], [1150 + j[4], 800 + j[5]], [180 + j[6], 760 + j[7]]];
        const dst: Quad = [[0, 0], [w, 0], [w, hgt], [0, hgt]];
        const h = homographyFromPoints(src, dst);
        src.forEach((p, i) => {
          const q = applyHomography(h, p);
          expect(Math.abs(q[0] - dst[i]![0])).toBeLessThan(1e-7 * w);
          expect(Math.abs(q[1] - dst[i]![1])).toBeLessThan(1e-7 * hgt);
        });
        expect(keepsOrientation(h, [640, 480])).toBe(true);
      }),
    );
  });
});
