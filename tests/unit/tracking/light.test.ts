// The light correction and the head-track guard on drawn scenes (truth: the drawing).
import { describe, expect, it } from "vitest";
import { trackFollowsLaunch, type ClubheadPoint } from "@/lib/tracking/head-track";
import { relit } from "@/lib/tracking/light";
import { Canvas } from "./render";

const W = 200, H = 160;
const BOX = { x0: 0, y0: 0, x1: W, y1: H };

describe("light matched to the background", () => {
  // Turf at 120, a dark head (40) 20 px deep; the shadow darkens the right half by 45 % with a
  // 30 px soft edge, as a person's shadow drifting over the mat would.
  const background = new Canvas(W, H, 120).toImage();
  const shaded = new Canvas(W, H, 120).box(70, 80, [1, 0], 60, 20, 40);
  for (let y = 0; y < H; y++) {
    for (let x = 0; x < W; x++) {
      const t = Math.min(1, Math.max(0, (x - 85) / 30));
      shaded.values[y * W + x]! *= 1 - 0.45 * t * t * (3 - 2 * t);
    }
  }
  const frame = shaded.toImage();

  it("brings shaded turf back to the background's level and leaves the head dark", () => {
    const out = relit(frame, background, BOX, 30);
    const at = (x: number, y: number) => out.data[y * W + x]!;
    for (const x of [10, 60, 150, 190]) expect(Math.abs(at(x, 20) - 120)).toBeLessThanOrEqual(8);
    expect(at(70, 80)).toBeLessThan(60);
    // Untouched: the same frame when the light is even.
    const even = new Canvas(W, H, 118).toImage();
    expect(relit(even, background, BOX, 30)).toBe(even);
  });
});

describe("a head track that follows the ball's start", () => {
  const along = (frames: number[], lateral: (f: number) => number): ClubheadPoint[] =>
    frames.map((f) => ({ frame: f, point: [100 + lateral(f), 200 - 2 * f], precisionPx: 0.05, registered: true }));

  it("passes a straight track a few degrees off the launch and refuses one point 30 px aside", () => {
    const up: [number, number] = [0, -1];
    expect(trackFollowsLaunch(along([4, 5, 6, 7], (f) => 0.1 * f), up, 20)).toBe(true);
    expect(trackFollowsLaunch(along([4, 5, 6, 7], (f) => (f === 6 ? 30 : 0)), up, 20)).toBe(false);
    expect(trackFollowsLaunch(along([4, 5, 6, 7], () => 0), [1, 0], 20)).toBe(false);
  });
});
