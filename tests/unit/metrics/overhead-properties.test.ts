import fc from "fast-check";
import { describe, expect, it } from "vitest";
import type { Vec2 } from "@/lib/geometry/vector";
import { computeMeasurements } from "@/lib/metrics/compute";

// Properties of the values: the uncertainty's Monte Carlo runs are not needed here.
const FAST = { monteCarloRuns: 0 };
import { overheadClip, overheadMarks, placeScale, valuesByKey, type OverheadScene } from "./scene";

const angle = fc.double({ min: -12, max: 12, noNaN: true });
const sceneArb: fc.Arbitrary<OverheadScene> = fc.record({
  aimDeg: angle,
  faceDeg: angle,
  pathDeg: angle,
  startDeg: angle,
  rotationPerFrameDeg: fc.double({ min: -0.2, max: 0.2, noNaN: true }),
  twistDeg: fc.double({ min: -1, max: 1, noNaN: true }),
  ballStepPx: fc.double({ min: 2, max: 30, noNaN: true }),
});
const RELATIVE_ANGLES = ["aim", "face_angle_impact", "path", "face_to_path", "face_rotation_rate", "twist", "start_direction"] as const;

const rotateAndShift = (theta: number, dx: number, dy: number) => (p: Vec2): Vec2 => [
  Math.cos(theta) * p[0] - Math.sin(theta) * p[1] + dx,
  Math.sin(theta) * p[0] + Math.cos(theta) * p[1] + dy,
];

describe("overhead properties", () => {
  it("recovers the scene's own angles and speed", () => {
    fc.assert(fc.property(sceneArb, (s) => {
      const v = valuesByKey(computeMeasurements(overheadClip(), overheadMarks(s, rotateAndShift(0, 960, 540)), FAST));
      expect(v.aim).toBeCloseTo(s.aimDeg, 8);
      expect(v.face_angle_impact).toBeCloseTo(s.faceDeg, 8);
      expect(v.path).toBeCloseTo(s.pathDeg, 8);
      expect(v.start_direction).toBeCloseTo(s.startDeg, 8);
      expect(v.twist).toBeCloseTo(s.twistDeg, 6);
      expect(v.face_rotation_rate).toBeCloseTo(s.rotationPerFrameDeg * 240, 6);
      expect(v.ball_speed).toBeCloseTo((s.ballStepPx * 240) / 1000, 8);
    }));
  });

  it("rotating or translating the whole scene leaves the relative angles unchanged", () => {
    fc.assert(fc.property(sceneArb, fc.double({ min: -Math.PI, max: Math.PI, noNaN: true }), fc.double({ min: -500, max: 500, noNaN: true }), fc.double({ min: -500, max: 500, noNaN: true }), (s, theta, dx, dy) => {
      const base = valuesByKey(computeMeasurements(overheadClip(), overheadMarks(s, rotateAndShift(0, 960, 540)), FAST));
      const moved = valuesByKey(computeMeasurements(overheadClip(), overheadMarks(s, rotateAndShift(theta, 960 + dx, 540 + dy)), FAST));
      for (const key of RELATIVE_ANGLES) expect(moved[key]).toBeCloseTo(base[key]!, 7);
      expect(moved.ball_speed).toBeCloseTo(base.ball_speed!, 9);
    }));
  });

  it("mirroring the image with mirrored = true keeps every signed value; undeclared, face angle and path flip", () => {
    const width = 1920;
    fc.assert(fc.property(sceneArb, fc.double({ min: -Math.PI, max: Math.PI, noNaN: true }), fc.constantFrom("right" as const, "left" as const), (s, theta, handedness) => {
      const place = rotateAndShift(theta, 960, 540);
      const mirror = (p: Vec2): Vec2 => [width - place(p)[0], place(p)[1]];
      const base = valuesByKey(computeMeasurements(overheadClip({ handedness }), overheadMarks(s, place), FAST));
      const declared = valuesByKey(computeMeasurements(overheadClip({ handedness, mirrored: true }), overheadMarks(s, mirror), FAST));
      const undeclared = valuesByKey(computeMeasurements(overheadClip({ handedness, mirrored: false }), overheadMarks(s, mirror), FAST));
      for (const key of RELATIVE_ANGLES) expect(declared[key]).toBeCloseTo(base[key]!, 7);
      for (const key of ["aim", "face_angle_impact", "path", "start_direction"] as const) expect(undeclared[key]).toBeCloseTo(-base[key]!, 7);
    }));
  });

  it("a left-handed golfer on an unmirrored image reads as the mirror of a right-handed one", () => {
    fc.assert(fc.property(sceneArb, (s) => {
      const marks = overheadMarks(s, rotateAndShift(0, 960, 540));
      const right = valuesByKey(computeMeasurements(overheadClip(), marks, FAST));
      const left = valuesByKey(computeMeasurements(overheadClip({ handedness: "left" }), marks, FAST));
      expect(left.face_angle_impact).toBeCloseTo(-right.face_angle_impact!, 9);
      expect(left.path).toBeCloseTo(-right.path!, 9);
    }));
  });

  it("uniform scaling leaves angles unchanged and scales pixel speeds by the factor", () => {
    fc.assert(fc.property(sceneArb, fc.double({ min: 0.25, max: 4, noNaN: true }), (s, k) => {
      const place = rotateAndShift(0.3, 960, 540);
      const scaled = (p: Vec2): Vec2 => [place(p)[0] * k, place(p)[1] * k];
      const base = valuesByKey(computeMeasurements(overheadClip(), overheadMarks(s, place), FAST));
      // The ruler stays as drawn: the image's pixel speed grows k-fold, and so does the speed read from it.
      const fixedRuler = valuesByKey(computeMeasurements(overheadClip(), overheadMarks(s, scaled), FAST));
      for (const key of RELATIVE_ANGLES) expect(fixedRuler[key]).toBeCloseTo(base[key]!, 7);
      expect(fixedRuler.ball_speed! / base.ball_speed!).toBeCloseTo(k, 9);
      // Scaling the ruler too (a closer camera) leaves the true speed unchanged.
      const wholeImage = valuesByKey(computeMeasurements(overheadClip(), placeScale(overheadMarks(s, scaled), (p) => [p[0] * k, p[1] * k]), FAST));
      expect(wholeImage.ball_speed).toBeCloseTo(base.ball_speed!, 9);
    }));
  });
});
