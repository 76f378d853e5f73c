// Ground-plane input (issue 11): four corners in drawing order round a rectangle, never crossed.
import { describe, expect, it } from "vitest";
import { checkMarkAgainstClip, isConvexRing } from "@/lib/marks/check";
import type { MarkInput } from "@/lib/marks/types";

const clip = { width: 1920, height: 1080, frameCount: 100, view: "overhead" as const };
const plane = (points: [number, number][]): MarkInput => ({ frame: 0, kind: "plane", role: "ground", points, widthMm: 600, heightMm: 900 });
// A rectangle seen by a tilted camera, corners in order (1 top-left, 2 top-right, 3 bottom-right, 4 bottom-left).
const ring: [number, number][] = [[700, 180], [1220, 200], [1380, 900], [560, 870]];

describe("plane corners", () => {
  it("accepts the corners in order, either way round", () => {
    expect(checkMarkAgainstClip(plane(ring), clip)).toEqual([]);
    expect(checkMarkAgainstClip(plane([...ring].reverse()), clip)).toEqual([]);
  });
  it("refuses corners clicked in Z order (1, 2, 4, 3) with a message that says how to draw them", () => {
    const z = [ring[0]!, ring[1]!, ring[3]!, ring[2]!];
    expect(isConvexRing(z)).toBe(false);
    const problems = checkMarkAgainstClip(plane(z), clip);
    expect(problems).toHaveLength(1);
    expect(problems[0]).toMatch(/in order \(1 → 2 → 3 → 4/);
    expect(problems[0]).toMatch(/Z order/);
  });
  it("refuses a dented (non-convex) four-sided shape", () => {
    // The third corner pushed inside the triangle of the other three: consecutive edge turns change sign.
    expect(checkMarkAgainstClip(plane([[700, 180], [1220, 200], [900, 400], [560, 870]]), clip)[0]).toMatch(/in order/);
  });
});
