import { describe, expect, it } from "vitest";
import { checkMarkAgainstClip, markInputSchema, type MarkInput } from "@/lib/marks";

const clip = { width: 1280, height: 720, frameCount: 600, view: "overhead" as const };

describe("markInputSchema", () => {
  it("takes the API's shape and defaults a scale to the ball's 42.67 mm (Rules of Golf, Appendix III)", () => {
    const line = markInputSchema.parse({ frame: 299, kind: "line", role: "face", points: [[1, 2], [3, 4]] });
    expect(line).toEqual({ frame: 299, kind: "line", role: "face", points: [[1, 2], [3, 4]] });
    const scale = markInputSchema.parse({ frame: 0, kind: "scale", role: "ball", points: [[1, 2], [3, 4]] });
    expect(scale.kind === "scale" && scale.lengthMm).toBe(42.67);
  });
  it("refuses a wrong point count, an unknown role, NaN or Infinity, a negative frame, a plane without its size", () => {
    const bad = [
      { frame: 1, kind: "line", role: "face", points: [[1, 2]] },
      { frame: 1, kind: "angle", role: "face", points: [[1, 2], [3, 4]] },
      { frame: 1, kind: "point", role: "putter", points: [[1, 2]] },
      { frame: 1, kind: "point", role: "ball", points: [[Number.NaN, 2]] },
      { frame: 1, kind: "point", role: "ball", points: [[Number.POSITIVE_INFINITY, 2]] },
      { frame: -1, kind: "point", role: "ball", points: [[1, 2]] },
      { frame: 1.5, kind: "point", role: "ball", points: [[1, 2]] },
      { frame: 1, kind: "plane", role: "ground", points: [[0, 0], [1, 0], [1, 1], [0, 1]] },
    ];
    for (const b of bad) expect(markInputSchema.safeParse(b).success, JSON.stringify(b)).toBe(false);
    expect(markInputSchema.safeParse({ frame: 1, kind: "plane", role: "ground", points: [[0, 0], [1, 0], [1, 1], [0, 1]], widthMm: 500, heightMm: 300 }).success).toBe(true);
  });
});

describe("checkMarkAgainstClip", () => {
  const ok: MarkInput = { frame: 10, kind: "line", role: "face", points: [[100, 100], [120, 140]] };
  it("accepts a sound mark", () => {
    expect(checkMarkAgainstClip(ok, clip)).toEqual([]);
  });
  it("names a point outside the frame, a non-finite point and a frame outside the clip", () => {
    expect(checkMarkAgainstClip({ ...ok, points: [[100, 100], [1300, 140]] }, clip).join(" ")).toMatch(/outside the 1280×720 frame/);
    expect(checkMarkAgainstClip({ ...ok, points: [[Number.NaN, 100], [1, 1]] }, clip).join(" ")).toMatch(/not a finite number/);
    expect(checkMarkAgainstClip({ ...ok, frame: 600 }, clip).join(" ")).toMatch(/outside the clip/);
  });
  it("refuses a zero-length line, a zero-length scale and a degenerate plane", () => {
    expect(checkMarkAgainstClip({ ...ok, points: [[5, 5], [5, 5]] }, clip).join(" ")).toMatch(/zero length/);
    expect(checkMarkAgainstClip({ frame: 1, kind: "scale", role: "ball", points: [[5, 5], [5, 5]], lengthMm: 42.67 }, clip).join(" ")).toMatch(/zero length/);
    const flat: MarkInput = { frame: 1, kind: "plane", role: "ground", points: [[0, 0], [10, 0], [20, 0], [0, 10]], widthMm: 100, heightMm: 100 };
    expect(checkMarkAgainstClip(flat, clip).join(" ")).toMatch(/proper four-sided/);
  });
  it("refuses roles that do not fit the view", () => {
    const onView = (view: "overhead" | "face-on" | "down-the-line", m: MarkInput) => checkMarkAgainstClip(m, { ...clip, view });
    const line = (role: MarkInput["role"]): MarkInput => ({ ...ok, role });
    const point = (role: MarkInput["role"]): MarkInput => ({ frame: 1, kind: "point", role, points: [[10, 10]] });
    expect(onView("overhead", line("target"))).toEqual([]);
    expect(onView("face-on", line("target"))).toHaveLength(1);
    expect(onView("down-the-line", line("sole"))).toEqual([]);
    expect(onView("overhead", line("sole"))).toHaveLength(1);
    expect(onView("face-on", point("marker"))).toEqual([]);
    expect(onView("overhead", point("marker"))).toHaveLength(1);
    expect(onView("face-on", line("ground"))).toEqual([]);
    expect(onView("overhead", line("ground"))).toHaveLength(1);
    const plane: MarkInput = { frame: 1, kind: "plane", role: "ground", points: [[0, 0], [10, 0], [10, 10], [0, 10]], widthMm: 100, heightMm: 100 };
    expect(onView("overhead", plane)).toEqual([]);
    expect(onView("face-on", plane)).toHaveLength(1);
  });
});
