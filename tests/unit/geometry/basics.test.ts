import { describe, expect, it } from "vitest";
import { signedAngle, toDegrees, unwrapRadians } from "@/lib/geometry/angle";
import { fitLine } from "@/lib/geometry/fit-line";
import { intersectLines } from "@/lib/geometry/intersect";
import { BALL_DIAMETER_MM, mmPerPixel } from "@/lib/geometry/scale";

describe("signed angle", () => {
  it("is positive clockwise on a y-down image and lies in (−180°, 180°]", () => {
    expect(toDegrees(signedAngle([1, 0], [0, 1]))).toBeCloseTo(90, 12);
    expect(toDegrees(signedAngle([1, 0], [0, -1]))).toBeCloseTo(-90, 12);
    expect(toDegrees(signedAngle([1, 0], [-1, 0]))).toBeCloseTo(180, 12);
    expect(toDegrees(signedAngle([1, 1], [1, 1]))).toBe(0);
  });
  it("unwraps a turning angle across ±π", () => {
    const turning = [3.0, -3.0, -2.5];
    const out = unwrapRadians(turning);
    expect(out[1]).toBeCloseTo(-3.0 + 2 * Math.PI, 12);
    expect(out[2]).toBeCloseTo(-2.5 + 2 * Math.PI, 12);
  });
});

describe("total least-squares line", () => {
  it("fits a vertical line exactly, oriented from the earliest point to the latest", () => {
    const line = fitLine([[5, 10], [5, 8], [5, 6]]);
    expect(line.direction[0]).toBeCloseTo(0, 12);
    expect(line.direction[1]).toBeCloseTo(-1, 12);
    expect(line.centroid).toEqual([5, 8]);
  });
  it("minimises perpendicular distance (points symmetric about y = x give the diagonal)", () => {
    const line = fitLine([[0, 0], [1, 0], [0, 1], [2, 2], [3, 2], [2, 3]]);
    expect(line.direction[0]).toBeCloseTo(Math.SQRT1_2, 12);
    expect(line.direction[1]).toBeCloseTo(Math.SQRT1_2, 12);
  });
  it("refuses fewer than two distinct points", () => {
    expect(() => fitLine([[1, 1]])).toThrow();
    expect(() => fitLine([[1, 1], [1, 1]])).toThrow();
  });
});

describe("line intersection", () => {
  it("meets at the crossing point and is null for parallel lines", () => {
    expect(intersectLines([0, 0], [1, 1], [0, 2], [1, -1])).toEqual([1, 1]);
    expect(intersectLines([0, 0], [1, 0], [0, 1], [2, 0])).toBeNull();
  });
});

describe("scale from a known length", () => {
  it("uses the ball's 42.67 mm diameter by default (Rules of Golf, Equipment Rules Appendix III)", () => {
    expect(BALL_DIAMETER_MM).toBe(42.67);
    expect(mmPerPixel([100, 100], [100, 142.67])).toBeCloseTo(1, 12);
    expect(mmPerPixel([0, 0], [30, 40], 100)).toBeCloseTo(2, 12);
  });
  it("refuses a zero-length scale", () => {
    expect(() => mmPerPixel([3, 3], [3, 3])).toThrow();
  });
});
