import { describe, expect, it } from "vitest";
import { summarize } from "@/lib/stats/summary";

describe("summarize", () => {
  it("gives median, range and the share inside a window (hand-worked)", () => {
    const s = summarize([-1.2, 0.4, 0.9, -0.3, 2.5], { lo: -1, hi: 1 })!;
    expect(s.median).toBeCloseTo(0.4, 12);
    expect(s.min).toBe(-1.2);
    expect(s.max).toBe(2.5);
    expect(s.range).toBeCloseTo(3.7, 12);
    expect(s.shareInWindow).toBeCloseTo(3 / 5, 12);
  });
  it("counts window edges as inside and leaves sd empty for a single putt", () => {
    const s = summarize([1], { lo: -1, hi: 1 })!;
    expect(s.shareInWindow).toBe(1);
    expect(s.sd).toBeNull();
  });
  it("returns null for no values and no share without a window", () => {
    expect(summarize([])).toBeNull();
    expect(summarize([1, 2])!.shareInWindow).toBeNull();
  });
});
