// Marking faster: the camera-still verdict on synthetic frames with a known shift, what is carried
// and where, and the checklist built from the engine's own `needs` for an unmarked clip.
import { describe, expect, it } from "vitest";
import type { Vec2 } from "@/lib/geometry/vector";
import { computeMeasurements } from "@/lib/metrics/compute";
import { cameraStill, greyFromRgba } from "@/lib/review/camera-still";
import { carriable, carriedWords, carryDrafts, segmentsOf, wantsCarry } from "@/lib/review/carry";
import { actionForNeed, checklist } from "@/lib/review/checklist";
import type { ReviewMark } from "@/lib/review/marks";
import { seededUniform as makeRandom } from "@/lib/stats/random";

const W = 320, H = 240;
/** A textured carpet (seeded noise, smoothed) that can be drawn shifted by (dx, dy) and with a dark blob (a golfer's shoe) at `blob`. */
function carpet(seed: number) {
  const rnd = makeRandom(seed);
  const base = new Float64Array((W + 20) * (H + 20)).map(() => rnd() * 255);
  return (dx: number, dy: number, blob?: Vec2, noise = 0) => {
    const data = new Uint8Array(W * H);
    const jitter = makeRandom(seed + 1);
    for (let y = 0; y < H; y++)
      for (let x = 0; x < W; x++) {
        const sx = x + 10 - dx, sy = y + 10 - dy;
        let v = (base[sy * (W + 20) + sx]! + base[sy * (W + 20) + sx + 1]!) / 2;
        if (blob && Math.hypot(x - blob[0], y - blob[1]) < 18) v = 20;
        data[y * W + x] = Math.max(0, Math.min(255, Math.round(v + (jitter() - 0.5) * 2 * noise)));
      }
    return { data, width: W, height: H };
  };
}
const line: [Vec2, Vec2][] = [[[160, 200], [160, 40]]];

describe("has the camera moved?", () => {
  const draw = carpet(7);
  it("the same picture with sensor noise (±3 grey levels) is still", () => {
    const v = cameraStill(draw(0, 0), draw(0, 0, undefined, 3), line);
    expect(v.still).toBe(true);
    expect(v.shift).toEqual([0, 0]);
  });
  it("a shoe over part of the band does not count as a move (median, not mean)", () => {
    expect(cameraStill(draw(0, 0), draw(0, 0, [165, 190]), line).still).toBe(true);
  });
  it("a camera knocked by 3 px is caught, and the shift is found", () => {
    const v = cameraStill(draw(0, 0), draw(3, -2), line);
    expect(v.still).toBe(false);
    expect(v.shift).toEqual([3, -2]);
  });
  it("frames of another size are never still", () => {
    expect(cameraStill(draw(0, 0), { data: new Uint8Array(4), width: 2, height: 2 }, line).still).toBe(false);
  });
  it("grey is ITU-R BT.601 luma: pure green (0,255,0) → round(0.587 × 255) = 150", () => {
    expect(greyFromRgba(new Uint8Array([0, 255, 0, 255]), 1, 1).data[0]).toBe(150);
  });
});

describe("carried marks", () => {
  const mark = (o: Partial<ReviewMark>): ReviewMark => ({ id: Math.random().toString(36), frame: 3, kind: "line", role: "target", points: [[1, 2], [3, 4]], version: 1, ...o });
  const earlier = [
    mark({ role: "target", points: [[0, 0], [0, 10]] }),
    mark({ role: "target", points: [[5, 5], [5, 50]] }),
    mark({ role: "face" }),
    mark({ kind: "scale", role: "ball", lengthMm: 42.67 }),
    mark({ kind: "scale", role: "ball", source: "tracked" }),
  ];
  it("takes the latest hand target line and scale, nothing else", () => {
    const picked = carriable(earlier, "overhead");
    expect(picked.map((m) => [m.kind, m.role, m.source ?? "hand"])).toEqual([["line", "target", "hand"], ["scale", "ball", "hand"]]);
    expect(picked[0]!.points).toEqual([[5, 5], [5, 50]]);
    expect(carriedWords(picked)).toBe("target line and scale");
    expect(carriable(earlier, "face-on").map((m) => m.kind)).toEqual(["scale"]);
  });
  it("puts them on the opening frame with their known lengths", () => {
    expect(carryDrafts(carriable(earlier, "overhead"), 0)).toEqual([
      { frame: 0, kind: "line", role: "target", points: [[5, 5], [5, 50]] },
      { frame: 0, kind: "scale", role: "ball", points: [[1, 2], [3, 4]], lengthMm: 42.67 },
    ]);
  });
  it("carries only into a clip without hand marks, and bands a plane by its four sides", () => {
    expect(wantsCarry([mark({ source: "tracked" })])).toBe(true);
    expect(wantsCarry([mark({})])).toBe(false);
    expect(segmentsOf([mark({ kind: "plane", role: "ground", points: [[0, 0], [1, 0], [1, 1], [0, 1]] })])).toHaveLength(4);
  });
});

describe("checklist from the engine's needs", () => {
  const clip = { view: "overhead" as const, width: 640, height: 360, frameCount: 60, captureFps: 240, handedness: "right" as const, mirrored: false, frictionMu: 0.2,
    moments: { address: null, takeaway: null, top: null, impact: null, finish: null } };
  it("an unmarked overhead clip asks for the moments and the target line, each once", () => {
    const items = checklist(computeMeasurements(clip, []), { address: null, impact: null, suggestedImpact: 40, frameCount: 60 });
    const target = items.find((i) => i.tool === "line" && i.role === "target");
    expect(target?.keys).toContain("aim");
    const impact = items.find((i) => i.need === "the impact frame moment");
    expect(impact).toMatchObject({ frame: 40, tool: null });
    expect(new Set(items.map((i) => i.need)).size).toBe(items.length);
  });
  it("with moments set, the face line goes to its frame and the ball to the frame after impact", () => {
    const set = { ...clip, moments: { ...clip.moments, address: 5, impact: 30 } };
    const items = checklist(computeMeasurements(set, []), { address: 5, impact: 30, suggestedImpact: 30, frameCount: 60 });
    expect(items.find((i) => i.keys.includes("face_angle_impact") && i.role === "face")).toMatchObject({ frame: 30, tool: "line" });
    expect(items.find((i) => i.keys.includes("start_direction") && i.role === "ball")).toMatchObject({ frame: 31, tool: "ballTrack" });
    expect(items.find((i) => i.keys.includes("path") && i.role === "clubhead")).toMatchObject({ frame: 27, tool: "point" });
    expect(actionForNeed("the studio's ball–green friction setting (μ)", { address: 5, impact: 30, suggestedImpact: null, frameCount: 60 })).toMatchObject({ frame: null, tool: null });
  });
});
