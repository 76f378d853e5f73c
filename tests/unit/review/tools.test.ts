import { describe, expect, it } from "vitest";
import { cancel, DEFAULT_TOOL_OPTIONS, idle, placedPoints, press, type ToolOptions } from "@/lib/review/tools";

const options: ToolOptions = { role: "face", ...DEFAULT_TOOL_OPTIONS };

describe("tool state machines", () => {
  it("a line waits for its second point, then yields a draft and returns to idle", () => {
    const first = press(idle("line"), [10, 20], 5, options);
    expect(first.draft).toBeNull();
    expect(first.state).toEqual({ tool: "line", phase: "placing", frame: 5, points: [[10, 20]] });
    const second = press(first.state, [110.123, 20.456], 5, options);
    expect(second.draft).toEqual({ frame: 5, kind: "line", role: "face", points: [[10, 20], [110.12, 20.46]] });
    expect(second.state).toEqual(idle("line"));
    expect(second.advanceFrame).toBe(false);
  });

  it("a point is done in one click", () => {
    const step = press(idle("point"), [3, 4], 0, { ...options, role: "clubhead" });
    expect(step.draft).toEqual({ frame: 0, kind: "point", role: "clubhead", points: [[3, 4]] });
  });

  it("an angle takes three points: arm, vertex, arm", () => {
    let s = idle("angle");
    const clicks: [number, number][] = [[0, 0], [10, 0], [10, 10]];
    let draft = null;
    for (const c of clicks) ({ state: s, draft } = press(s, c, 2, options));
    expect(draft).toMatchObject({ kind: "angle", points: clicks });
  });

  it("ball track makes a ball point whatever role is picked, and asks to step a frame", () => {
    const step = press(idle("ballTrack"), [50, 60], 7, options);
    expect(step.draft).toEqual({ frame: 7, kind: "point", role: "ball", points: [[50, 60]] });
    expect(step.advanceFrame).toBe(true);
  });

  it("scale carries its known length (the ball's 42.67 mm by default)", () => {
    let step = press(idle("scale"), [0, 0], 1, { ...options, role: "ball" });
    step = press(step.state, [40, 0], 1, { ...options, role: "ball" });
    expect(step.draft).toMatchObject({ kind: "scale", role: "ball", lengthMm: 42.67 });
  });

  it("plane takes four points and the rectangle's size", () => {
    let s = idle("plane");
    let draft = null;
    for (const p of [[0, 0], [100, 0], [100, 50], [0, 50]] as [number, number][]) {
      ({ state: s, draft } = press(s, p, 0, { ...options, role: "ground", widthMm: 800, heightMm: 400 }));
    }
    expect(draft).toMatchObject({ kind: "plane", role: "ground", widthMm: 800, heightMm: 400 });
    expect(draft!.points).toHaveLength(4);
  });

  it("select places nothing", () => {
    const step = press(idle("select"), [1, 1], 0, options);
    expect(step).toEqual({ state: idle("select"), draft: null, advanceFrame: false });
  });

  it("a second click on the same spot is ignored (no zero-length line)", () => {
    const first = press(idle("line"), [10, 10], 0, options);
    const again = press(first.state, [10.2, 10.1], 0, options);
    expect(again.draft).toBeNull();
    expect(placedPoints(again.state)).toEqual([[10, 10]]);
  });

  it("changing frame mid-gesture starts the mark over on the new frame", () => {
    const first = press(idle("line"), [10, 10], 0, options);
    const moved = press(first.state, [50, 50], 1, options);
    expect(moved.draft).toBeNull();
    expect(moved.state).toEqual({ tool: "line", phase: "placing", frame: 1, points: [[50, 50]] });
  });

  it("Escape drops the placed points", () => {
    const first = press(idle("plane"), [10, 10], 0, options);
    expect(cancel(first.state)).toEqual(idle("plane"));
  });
});
