import fc from "fast-check";
import { describe, expect, it } from "vitest";
import type { Vec2 } from "@/lib/geometry/vector";
import type { MarkInput, StoredMark } from "@/lib/marks/types";
import { computeMeasurements } from "@/lib/metrics/compute";
import type { ClipContext } from "@/lib/metrics/types";
import { valuesByKey } from "./scene";

const rad = (d: number) => (d * Math.PI) / 180;
const IMPACT = 300;
const FPS = 240;

const clip = (view: ClipContext["view"], over: Partial<ClipContext> = {}): ClipContext => ({
  view, width: 1920, height: 1080, frameCount: 1000, captureFps: FPS, handedness: "right", mirrored: false,
  moments: { address: 40, impact: IMPACT }, staticLoftDeg: 3, frictionMu: 0.2, ...over,
});
const stored = (marks: MarkInput[]): StoredMark[] => marks.map((m, i) => ({ ...m, id: `m${i}` }));

type FaceOnScene = { leanAddressDeg: number; leanImpactDeg: number; attackDeg: number; launchDeg: number; rpm: number; stepPx: number };

/** Face-on scene, image 1 px = 1 mm through the ball-diameter scale; the target is toward +x. */
function faceOnMarks(s: FaceOnScene): MarkInput[] {
  const shaft = (frame: number, lean: number): MarkInput => ({ frame, kind: "line", role: "shaft", points: [[800, 800], [800 + 600 * Math.sin(rad(lean)), 800 - 600 * Math.cos(rad(lean))]] });
  const marks: MarkInput[] = [
    { frame: 40, kind: "scale", role: "ball", points: [[100, 100], [142.67, 100]] },
    shaft(40, s.leanAddressDeg),
    shaft(IMPACT, s.leanImpactDeg),
  ];
  for (let k = 0; k < 4; k++) marks.push({ frame: IMPACT - 3 + k, kind: "point", role: "clubhead", points: [[780 + (k - 3) * 6 * Math.cos(rad(s.attackDeg)), 820 - (k - 3) * 6 * Math.sin(rad(s.attackDeg))]] });
  const omega = (s.rpm * 2 * Math.PI) / 60; // rad/s, topspin positive
  for (let k = 1; k <= 6; k++) {
    const centre: Vec2 = [850 + k * s.stepPx * Math.cos(rad(s.launchDeg)), 780 - k * s.stepPx * Math.sin(rad(s.launchDeg))];
    // Marker angle in the (g, u) frame turns clockwise (decreasing) for topspin; image y is −u.
    const theta = rad(70) - (omega * k) / FPS;
    marks.push({ frame: IMPACT + k, kind: "point", role: "ball", points: [centre] });
    marks.push({ frame: IMPACT + k, kind: "point", role: "marker", points: [[centre[0] + 15 * Math.cos(theta), centre[1] - 15 * Math.sin(theta)]] });
  }
  return marks;
}

const scene: FaceOnScene = { leanAddressDeg: -1, leanImpactDeg: 2, attackDeg: 2, launchDeg: 1.5, rpm: 300, stepPx: 5 };

describe("face-on measurements, hand-worked", () => {
  const v = valuesByKey(computeMeasurements(clip("face-on"), stored(faceOnMarks(scene))));
  it("shaft lean (+ handle toward the target), attack angle (+ rising), launch", () => {
    expect(v.shaft_lean_address).toBeCloseTo(-1, 10);
    expect(v.shaft_lean_impact).toBeCloseTo(2, 10);
    expect(v.attack_angle).toBeCloseTo(2, 10);
    expect(v.launch_angle).toBeCloseTo(1.5, 10);
  });
  it("dynamic loft = static loft − shaft lean at impact (derived, small-angle geometry)", () => {
    expect(v.dynamic_loft).toBeCloseTo(3 - 2, 10);
  });
  it("spin from a marker dot turning at a known rate: 300 rpm topspin is +300", () => {
    expect(v.spin_rpm).toBeCloseTo(300, 8);
    const backspin = valuesByKey(computeMeasurements(clip("face-on"), stored(faceOnMarks({ ...scene, rpm: -200 }))));
    expect(backspin.spin_rpm).toBeCloseTo(-200, 8);
  });
  it("ball speed and roll ratio ω·r/v, hand-worked", () => {
    // 5 px = 5 mm per frame at 240 frames per second: 1.2 m/s.
    expect(v.ball_speed).toBeCloseTo(1.2, 10);
    // 300 rpm = 31.41593 rad/s; × 0.021335 m = 0.670259 m/s; / 1.2 m/s = 0.558549.
    expect(v.roll_ratio).toBeCloseTo(0.558549, 6);
  });
  it("a ball rolling purely has roll ratio 1 and no skid", () => {
    const rpm = ((5 * FPS) / 1000 / 0.021335) * (60 / (2 * Math.PI));
    const rolling = valuesByKey(computeMeasurements(clip("face-on"), stored(faceOnMarks({ ...scene, rpm }))));
    expect(rolling.roll_ratio).toBeCloseTo(1, 10);
    expect(rolling.skid_distance).toBeCloseTo(0, 10);
  });
  it("names what is missing: static loft, friction, marker points", () => {
    const list = computeMeasurements(clip("face-on", { staticLoftDeg: null, frictionMu: 0 }), stored(faceOnMarks(scene).filter((m) => m.role !== "marker")));
    const byKey = Object.fromEntries(list.map((m) => [m.key, m]));
    expect(byKey.dynamic_loft).toEqual({ key: "dynamic_loft", value: null, unit: "deg", needs: ["the build's static loft"] });
    expect(byKey.skid_distance).toMatchObject({ value: null, needs: ["marker and ball points on the same 2 frames after impact (have 0 frames)", "the studio's ball–green friction setting (μ)"] });
    expect(byKey.spin_rpm).toMatchObject({ value: null, needs: ["marker and ball points on the same 2 frames after impact (have 0 frames)"] });
    expect(list.map((m) => m.key)).toEqual(["shaft_lean_address", "shaft_lean_impact", "attack_angle", "dynamic_loft", "launch_angle", "ball_speed", "spin_rpm", "roll_ratio", "skid_distance"]);
  });
  it("mirroring the image with mirrored = true keeps every signed value (property)", () => {
    const small = fc.double({ min: -8, max: 8, noNaN: true });
    fc.assert(fc.property(small, small, small, small, fc.double({ min: -900, max: 900, noNaN: true }), (a, b, c, d, rpm) => {
      const s = { leanAddressDeg: a, leanImpactDeg: b, attackDeg: c, launchDeg: d, rpm, stepPx: 6 };
      const base = valuesByKey(computeMeasurements(clip("face-on"), stored(faceOnMarks(s)), { monteCarloRuns: 0 }));
      const mirrored = stored(faceOnMarks(s).map((m) => ({ ...m, points: m.points.map((p): Vec2 => [1920 - p[0], p[1]]) })));
      const declared = valuesByKey(computeMeasurements(clip("face-on", { mirrored: true }), mirrored, { monteCarloRuns: 0 }));
      for (const key of Object.keys(base)) expect(declared[key]).toBeCloseTo(base[key]!, 7);
    }));
  });
});

describe("down-the-line measurements, hand-worked", () => {
  // Right-handed: heel on the left, toe toward +x. Toe 3° lower than the heel = heel up.
  const sole = (leftY: number, rightY: number): MarkInput => ({ frame: IMPACT, kind: "line", role: "sole", points: [[600, rightY], [400, leftY]] });
  it("heel up is positive and asks for a more upright lie by the same amount (common practice)", () => {
    const drop = 200 * Math.tan(rad(3));
    const list = computeMeasurements(clip("down-the-line"), stored([sole(500, 500 + drop)]));
    const v = valuesByKey(list);
    expect(v.sole_tilt_impact).toBeCloseTo(3, 10);
    expect(v.lie_change).toBeCloseTo(3, 10);
    expect(list.map((m) => m.key)).toEqual(["sole_tilt_impact", "lie_change"]);
  });
  it("toe up is negative", () => {
    expect(valuesByKey(computeMeasurements(clip("down-the-line"), stored([sole(500, 490)]))).sole_tilt_impact).toBeCloseTo(-Math.atan2(10, 200) * 180 / Math.PI, 10);
  });
  it("a tilted ground line sets the level", () => {
    const ground: MarkInput = { frame: 0, kind: "line", role: "ground", points: [[700, 600 + 700 * Math.tan(rad(2))], [0, 600]] };
    // Sole parallel to the tilted ground: no tilt.
    const soleAlongGround: MarkInput = { frame: IMPACT, kind: "line", role: "sole", points: [[400, 500], [600, 500 + 200 * Math.tan(rad(2))]] };
    expect(valuesByKey(computeMeasurements(clip("down-the-line"), stored([ground, soleAlongGround]))).sole_tilt_impact).toBeCloseTo(0, 10);
  });
  it("a left-handed golfer's heel is on the right: the same image reads with the opposite sign", () => {
    const v = valuesByKey(computeMeasurements(clip("down-the-line", { handedness: "left" }), stored([sole(500, 510)])));
    expect(v.sole_tilt_impact).toBeCloseTo(-Math.atan2(10, 200) * 180 / Math.PI, 10);
  });
  it("needs a sole line on the impact frame", () => {
    const list = computeMeasurements(clip("down-the-line"), stored([{ ...sole(500, 510), frame: IMPACT - 1 }]));
    expect(list[0]).toEqual({ key: "sole_tilt_impact", value: null, unit: "deg", needs: ["a sole line on frame 300 (impact)"] });
  });
});
