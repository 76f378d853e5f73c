// Lucas–Kanade registration (Lucas & Kanade 1981; Baker & Matthews 2004) on scenes drawn with a
// known shift and turn: the truth is the drawing's own geometry, not the code under test.
import { describe, expect, it } from "vitest";
import type { Vec2 } from "@/lib/geometry/vector";
import { blurredInBox, sampleBilinear, type GreyImage } from "@/lib/tracking/image";
import { movedPoint, registerPatch, type Template } from "@/lib/tracking/register";
import { Canvas } from "./render";

const W = 160, H = 120;
const BOX = { x0: 0, y0: 0, x1: W, y1: H };

/** A putter-like head: a dark box with a light sight line, turned by `turnDeg` about its middle. */
function head(cx: number, cy: number, turnDeg: number, noise?: { seed: number; sd: number }): GreyImage {
  const a = (turnDeg * Math.PI) / 180;
  const u: [number, number] = [Math.cos(a), Math.sin(a)];
  const n: [number, number] = [-u[1], u[0]];
  const c = new Canvas(W, H, 120).box(cx, cy, u, 60, 20, 40);
  c.box(cx + n[0] * 4, cy + n[1] * 4, n, 8, 1, 220);
  return blurredInBox(c.toImage(noise), BOX, 1);
}

const sampler = (image: GreyImage) => (x: number, y: number) => sampleBilinear(image, x, y);

function patch(image: GreyImage, cx: number, cy: number): Template {
  const points: Vec2[] = [];
  const values: number[] = [];
  for (let y = Math.floor(cy - 16); y <= cy + 16; y++) {
    for (let x = Math.floor(cx - 36); x <= cx + 36; x++) {
      points.push([x + 0.5, y + 0.5]);
      values.push(sampleBilinear(image, x + 0.5, y + 0.5));
    }
  }
  return { points, values };
}

describe("registration of a rigid patch", () => {
  const reference = head(80, 60, 0);
  const template = patch(reference, 80, 60);

  it.each([
    [0.3, -0.2],
    [1.7, 0.45],
    [-3.25, 2.6],
    [6.1, -4.9],
  ])("recovers a shift of (%f, %f) px to 0.02 px (the floor stated for interpolation)", (dx, dy) => {
    const r = registerPatch(template, sampler(reference), sampler(head(80 + dx, 60 + dy, 0)), [Math.round(dx), Math.round(dy)]);
    expect(r).not.toBeNull();
    expect(Math.abs(r!.shift[0] - dx)).toBeLessThan(0.02);
    expect(Math.abs(r!.shift[1] - dy)).toBeLessThan(0.02);
    expect(Math.abs(r!.turnRad)).toBeLessThan(0.0005);
  });

  it("recovers a turn with the shift, and carries any point of the patch with them (property: the scene turned and moved)", () => {
    const turnDeg = 1.2, dx = 2.4, dy = -1.3;
    const r = registerPatch(template, sampler(reference), sampler(head(80 + dx, 60 + dy, turnDeg)), [2, -1])!;
    expect(Math.abs((r.turnRad * 180) / Math.PI - turnDeg)).toBeLessThan(0.02);
    // The head's toe end (30 px from its middle along the face) goes where the drawing put it.
    const a = (turnDeg * Math.PI) / 180;
    const toe = movedPoint(r, [110, 60]);
    expect(Math.hypot(toe[0] - (80 + dx + 30 * Math.cos(a)), toe[1] - (60 + dy + 30 * Math.sin(a)))).toBeLessThan(0.03);
  });

  it("takes a brightness change (flicker) as an offset, not as motion", () => {
    const brighter = head(81.5, 60.5, 0);
    const lifted = { ...brighter, data: brighter.data.map((v) => Math.min(255, v + 9)) };
    const r = registerPatch(template, sampler(reference), sampler(lifted), [1, 0])!;
    expect(Math.abs(r.offset - 9)).toBeLessThan(0.5);
    expect(Math.hypot(r.shift[0] - 1.5, r.shift[1] - 0.5)).toBeLessThan(0.02);
  });

  it("states a precision that covers its error on noisy pictures (20 seeded draws, σ = 6 grey levels)", () => {
    const errors: number[] = [];
    const stated: number[] = [];
    for (let seed = 1; seed <= 20; seed++) {
      const ref = head(80, 60, 0, { seed, sd: 6 });
      const moved = head(80.6, 59.7, 0, { seed: seed + 100, sd: 6 });
      const r = registerPatch(patch(ref, 80, 60), sampler(ref), sampler(moved), [1, 0], 4 * Math.PI)!;
      errors.push(Math.hypot(r.shift[0] - 0.6, r.shift[1] + 0.3));
      stated.push(r.precisionPx);
    }
    const rms = Math.sqrt(errors.reduce((a, e) => a + e * e, 0) / errors.length);
    const typical = stated.sort((a, b) => a - b)[10]!;
    // A 2-D error's RMS is √2 × the per-axis standard error; stated is the worse axis's.
    expect(rms).toBeLessThan(2 * Math.SQRT2 * typical);
    expect(rms).toBeGreaterThan(0.25 * typical);
  });

  it("answers null for a patch with nothing to register on", () => {
    const flat = new Canvas(W, H, 120).toImage();
    expect(registerPatch(patch(flat, 80, 60), sampler(flat), sampler(flat), [0, 0])).toBeNull();
  });
});
