import { describe, expect, it } from "vitest";
import type { Vec2 } from "@/lib/geometry/vector";
import type { StoredMark } from "@/lib/marks/types";
import { computeMeasurements } from "@/lib/metrics/compute";
import { overheadClip, overheadMarks, valuesByKey } from "./scene";

// A tilted camera: ground millimetres → image pixels through a projective map written out here
// (not built with the code under test): x' = (0.9x + 0.05y + 960)/w, y' = (0.02x + 0.8y + 540)/w,
// w = 0.00002x + 0.0004y + 1 (Hartley & Zisserman, Multiple View Geometry, §2.3: a plane's image).
const project = ([x, y]: Vec2): Vec2 => {
  const w = 0.00002 * x + 0.0004 * y + 1;
  return [(0.9 * x + 0.05 * y + 960) / w, (0.02 * x + 0.8 * y + 540) / w];
};
const groundRect: Vec2[] = [[-300, -400], [300, -400], [300, 200], [-300, 200]];
const imageOfRect = groundRect.map(project);

const scene = { aimDeg: 1.2, faceDeg: -0.8, pathDeg: 2.5, startDeg: -0.6, rotationPerFrameDeg: 0.04, twistDeg: 0.3, ballStepPx: 7 };

function planeMark(order: readonly number[]): StoredMark {
  const corners = order.map((i) => imageOfRect[i]!);
  const size = [600, 600];
  // Going round the other way swaps which side is "width".
  if (order[1] === 3) size.reverse();
  return { id: "plane", frame: 0, kind: "plane", role: "ground", points: corners, widthMm: size[0]!, heightMm: size[1]! };
}

describe("ground-plane correction (overhead)", () => {
  const marks = overheadMarks(scene, project).filter((m) => m.kind !== "scale");
  it("without a plane the tilt distorts the angles", () => {
    const v = valuesByKey(computeMeasurements(overheadClip(), marks));
    expect(Math.abs(v.path! - scene.pathDeg)).toBeGreaterThan(0.05);
  });
  it("with the plane, true ground angles and speed (mm) come back", () => {
    const list = computeMeasurements(overheadClip(), [...marks, planeMark([0, 1, 2, 3])]);
    const v = valuesByKey(list);
    expect(v.aim).toBeCloseTo(scene.aimDeg, 8);
    expect(v.face_angle_impact).toBeCloseTo(scene.faceDeg, 8);
    expect(v.path).toBeCloseTo(scene.pathDeg, 8);
    expect(v.start_direction).toBeCloseTo(scene.startDeg, 8);
    expect(v.twist).toBeCloseTo(scene.twistDeg, 6);
    expect(v.ball_speed).toBeCloseTo((7 * 240) / 1000, 8);
    expect(list.find((m) => m.key === "path")).toMatchObject({ markIds: expect.arrayContaining(["plane"]) });
  });
  it("a plane drawn the other way round (a flipping map) gives the same signs", () => {
    const v = valuesByKey(computeMeasurements(overheadClip(), [...marks, planeMark([0, 3, 2, 1])]));
    expect(v.face_angle_impact).toBeCloseTo(scene.faceDeg, 8);
    expect(v.path).toBeCloseTo(scene.pathDeg, 8);
    expect(v.start_direction).toBeCloseTo(scene.startDeg, 8);
  });
});
