import { describe, expect, it } from "vitest";
import { computeMeasurements } from "@/lib/metrics/compute";
import type { StoredMark } from "@/lib/marks/types";
import { ADDRESS, IMPACT, overheadClip, overheadMarks, valuesByKey } from "./scene";

const rad = (d: number) => (d * Math.PI) / 180;

describe("overhead measurements, hand-worked", () => {
  it("target line up the image, face 2° open at address: aim = +2° exactly", () => {
    // t = (0, −1), r = (1, 0); face normal at 2° right of t: (sin 2°, −cos 2°), face line ⟂ to it.
    const f = [Math.cos(rad(2)), Math.sin(rad(2))] as const;
    const marks: StoredMark[] = [
      { id: "t", frame: 5, kind: "line", role: "target", points: [[640, 600], [640, 100]] },
      { id: "f", frame: ADDRESS, kind: "line", role: "face", points: [[640 - 40 * f[0], 500 - 40 * f[1]], [640 + 40 * f[0], 500 + 40 * f[1]]] },
    ];
    const aim = computeMeasurements(overheadClip(), marks).find((m) => m.key === "aim")!;
    expect(aim.value).toBeCloseTo(2, 12);
    expect(aim).toMatchObject({ unit: "deg", frames: [5, ADDRESS], markIds: ["f", "t"], method: "marked" });
  });

  it("the face line's drawing direction does not matter", () => {
    const marks: StoredMark[] = [
      { id: "t", frame: 5, kind: "line", role: "target", points: [[640, 600], [640, 100]] },
      { id: "f", frame: ADDRESS, kind: "line", role: "face", points: [[700, 510], [600, 500]] },
    ];
    const expected = (Math.atan2(10, 100) * 180) / Math.PI; // face turned clockwise: open
    expect(valuesByKey(computeMeasurements(overheadClip(), marks)).aim).toBeCloseTo(expected, 12);
  });

  it("a full scene: face, path, face to path, rotation rate, twist, start direction and ball speed", () => {
    const scene = { aimDeg: -1.5, faceDeg: 1, pathDeg: 3, startDeg: 1.5, rotationPerFrameDeg: 0.05, twistDeg: 0.25, ballStepPx: 8 };
    const v = valuesByKey(computeMeasurements(overheadClip(), overheadMarks(scene)));
    expect(v.aim).toBeCloseTo(-1.5, 10);
    expect(v.face_angle_impact).toBeCloseTo(1, 10);
    expect(v.path).toBeCloseTo(3, 10);
    expect(v.face_to_path).toBeCloseTo(-2, 10);
    expect(v.face_rotation_rate).toBeCloseTo(0.05 * 240, 8);
    expect(v.twist).toBeCloseTo(0.25, 8);
    expect(v.start_direction).toBeCloseTo(1.5, 10);
    // 8 px per frame at 42.67 mm per 42.67 px and 240 frames per second: 1.92 m/s.
    expect(v.ball_speed).toBeCloseTo(1.92, 10);
  });

  it("lists every overhead key in a stable order with what is missing, never a guessed number", () => {
    const list = computeMeasurements(overheadClip({ moments: { address: null, impact: null } }), []);
    expect(list.map((m) => m.key)).toEqual(["aim", "face_angle_impact", "path", "face_to_path", "face_rotation_rate", "twist", "start_direction", "ball_speed"]);
    expect(list.every((m) => m.value === null)).toBe(true);
    // Every missing input at once, not the first one found.
    expect(list.find((m) => m.key === "aim")).toEqual({ key: "aim", value: null, unit: "deg", needs: ["the address frame moment", "a target line (from the ball toward the hole)"] });
    expect(list.find((m) => m.key === "face_rotation_rate")).toMatchObject({ needs: ["the address frame moment", "the impact frame moment", "a target line (from the ball toward the hole)"] });
  });

  it("says which marks are missing", () => {
    const marks = overheadMarks({ aimDeg: 0, faceDeg: 0, pathDeg: 0, startDeg: 0, rotationPerFrameDeg: 0, twistDeg: 0, ballStepPx: 8 });
    const withoutHead = marks.filter((m) => !(m.role === "clubhead" && m.frame !== IMPACT));
    const path = computeMeasurements(overheadClip(), withoutHead).find((m) => m.key === "path")!;
    expect(path).toEqual({ key: "path", value: null, unit: "deg", needs: ["clubhead points on 2 frames up to impact (have 1 frame)"] });
    const noScale = computeMeasurements(overheadClip(), marks.filter((m) => m.kind !== "scale")).find((m) => m.key === "ball_speed")!;
    expect(noScale.value).toBeNull();
    expect("needs" in noScale && noScale.needs).toEqual(["a scale mark (the ball's diameter) or a ground plane"]);
    const noTarget = computeMeasurements(overheadClip(), marks.filter((m) => m.role !== "target"));
    expect(valuesByKey(noTarget).face_angle_impact).toBeNull();
    expect(valuesByKey(noTarget).ball_speed).toBeCloseTo(1.92, 10); // speed needs no target
  });
});
