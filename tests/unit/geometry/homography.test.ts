import { createRequire } from "node:module";
import fc from "fast-check";
import { beforeAll, describe, expect, it } from "vitest";
import { applyHomography, homographyFromPoints, keepsOrientation, type Homography, type Quad } from "@/lib/geometry/homography";

/** The few OpenCV.js calls used here: the cross-check library of docs/references.md (@techstark/opencv-js 4.12). */
type CvMat = { data64F: Float64Array; delete(): void };
type Cv = { Mat?: unknown; CV_32FC2: number; matFromArray(rows: number, cols: number, type: number, data: number[]): CvMat; getPerspectiveTransform(src: CvMat, dst: CvMat): CvMat };

/**
 * OpenCV.js fills in once its WebAssembly is ready: poll for cv.Mat. The module is a thenable that
 * resolves to itself, so it is handed out in a wrapper, never resolved or awaited directly.
 */
function loadOpenCv(): Promise<{ cv: Cv }> {
  const cv = createRequire(import.meta.url)("@techstark/opencv-js") as Cv;
  return new Promise((resolve) => {
    const poll = () => (typeof cv.Mat === "function" ? resolve({ cv }) : setTimeout(poll, 10));
    poll();
  });
}

/** OpenCV's getPerspectiveTransform (float32 points: the tests use whole-pixel corners, exact in float32). */
function openCvHomography(cv: Cv, src: Quad, dst: Quad): number[] {
  const a = cv.matFromArray(4, 1, cv.CV_32FC2, src.flat());
  const b = cv.matFromArray(4, 1, cv.CV_32FC2, dst.flat());
  const h = cv.getPerspectiveTransform(a, b);
  const out = Array.from(h.data64F);
  [a, b, h].forEach((m) => m.delete());
  return out;
}

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

  it("reproduces the affine case of docs/references.md and maps (3.5, 3) to (3, 3)", () => {
    const h = homographyFromPoints([[1, 1], [2, 5], [6, 5], [5, 1]], [[1, 1], [1, 5], [5, 5], [5, 1]]);
    const expected = [[1, -0.25, 0.25], [0, 1, 0], [0, 0, 1]];
    h.forEach((row, i) => row.forEach((v, j) => expect(v).toBeCloseTo(expected[i]![j]!, 12)));
    const [x, y] = applyHomography(h, [3.5, 3]);
    expect(x).toBeCloseTo(3, 12);
    expect(y).toBeCloseTo(3, 12);
  });

  it("detects a map that flips orientation (matrices written out by hand)", () => {
    const identity: Homography = [[1, 0, 0], [0, 1, 0], [0, 0, 1]];
    const mirrorX: Homography = [[-1, 0, 0], [0, 1, 0], [0, 0, 1]]; // (x, y) → (−x, y): det −1, w = 1
    // (x, y) → (x, y)/(−1) = (−x, −y), a half-turn: det −1 but w = −1, so the orientation is kept.
    const halfTurnByW: Homography = [[1, 0, 0], [0, 1, 0], [0, 0, -1]];
    // w = 1 − x changes sign across x = 1: kept at x = 0.5, flipped at x = 2 (det = 1).
    const horizon: Homography = [[1, 0, 0], [0, 1, 0], [-1, 0, 1]];
    expect(keepsOrientation(identity, [0.5, 0.5])).toBe(true);
    expect(keepsOrientation(mirrorX, [0.5, 0.5])).toBe(false);
    expect(keepsOrientation(halfTurnByW, [0.5, 0.5])).toBe(true);
    expect(keepsOrientation(horizon, [0.5, 0.5])).toBe(true);
    expect(keepsOrientation(horizon, [2, 0.5])).toBe(false);
  });

  describe("against OpenCV's getPerspectiveTransform (cross-check library, docs/references.md)", () => {
    let cv: Cv;
    beforeAll(async () => {
      ({ cv } = await loadOpenCv());
    }, 30_000);

    it("OpenCV itself reproduces the published tile_rectify H (so the cross-check is sound)", () => {
      const h = openCvHomography(cv, [[129, 72], [302, 76], [90, 185], [326, 193]], [[0, 0], [400, 0], [0, 400], [400, 400]]);
      expect(h[0]).toBeCloseTo(3.04026872, 7);
      expect(h[7]).toBeCloseTo(4.17694527e-3, 10);
    });

    it("agrees on any convex ground rectangle seen in perspective, and maps the four corners onto it (property)", () => {
      // Whole-pixel jittered corners of a large quadrilateral, onto a whole-millimetre rectangle.
      const jitter = fc.integer({ min: -60, max: 60 });
      const side = fc.integer({ min: 50, max: 3000 });
      fc.assert(
        fc.property(fc.array(jitter, { minLength: 8, maxLength: 8 }), side, side, (j, w, hgt) => {
          const src: Quad = [[200 + j[0]!, 150 + j[1]!], [1100 + j[2]!, 170 + j[3]!], [1150 + j[4]!, 800 + j[5]!], [180 + j[6]!, 760 + j[7]!]];
          const dst: Quad = [[0, 0], [w, 0], [w, hgt], [0, hgt]];
          const ours = homographyFromPoints(src, dst).flat();
          const reference = openCvHomography(cv, src, dst);
          ours.forEach((v, i) => expect(Math.abs(v - reference[i]!)).toBeLessThanOrEqual(1e-9 * Math.max(1, Math.abs(reference[i]!))));
          src.forEach((p, i) => {
            const q = applyHomography(homographyFromPoints(src, dst), p);
            expect(Math.abs(q[0] - dst[i]![0])).toBeLessThan(1e-7 * w);
            expect(Math.abs(q[1] - dst[i]![1])).toBeLessThan(1e-7 * hgt);
          });
        }),
        { numRuns: 200 },
      );
    });
  });
});
