import { describe, expect, it } from "vitest";
import { alignedFrame, sharedSpan } from "@/lib/playback/align";
import { containTransform, overlayCanvasSize } from "@/lib/playback/canvas-size";
import { markOpacity, visibleMarks } from "@/lib/playback/marks-visible";

describe("marks over playback", () => {
  it("a mark is fully drawn on its own frame and not before it", () => {
    expect(markOpacity(100, 100, 240)).toBe(1);
    expect(markOpacity(100, 99, 240)).toBe(0);
  });
  it("fades over 0.15 s of capture time (36 frames at 240 fps), then is gone", () => {
    // 18 frames = 0.075 s: half way → 0.5; 9 frames = 0.0375 s → 1 − 0.25 = 0.75; 36 frames = 0.15 s → 0
    expect(markOpacity(100, 118, 240)).toBeCloseTo(0.5, 12);
    expect(markOpacity(100, 109, 240)).toBeCloseTo(0.75, 12);
    expect(markOpacity(100, 135, 240)).toBeGreaterThan(0);
    expect(markOpacity(100, 136, 240)).toBe(0);
  });
  it("lists only the marks visible at a frame", () => {
    const marks = [{ id: "a", frame: 10 }, { id: "b", frame: 50 }, { id: "c", frame: 12 }];
    expect(visibleMarks(marks, 12, 240).map((v) => v.mark.id)).toEqual(["a", "c"]);
  });
});

describe("overlay canvas size", () => {
  it("caps the pixel ratio at 2", () => {
    expect(overlayCanvasSize(375, 211, 3)).toEqual({ width: 750, height: 422, ratio: 2 });
    expect(overlayCanvasSize(375, 211, 1)).toEqual({ width: 375, height: 211, ratio: 1 });
  });
  it("caps the area at 1440 × 1440 px (far under mobile Safari's ~16.7 MP canvas limit, from memory) on a large element", () => {
    // 2000 × 1200 at ratio 2 would be 9.6 MP; the cap gives ratio √(2 073 600 / 2 400 000) = 0.929516 → 1859 × 1115 px
    const s = overlayCanvasSize(2000, 1200, 2);
    expect(s.ratio).toBeCloseTo(0.929516, 6);
    expect(s).toMatchObject({ width: 1859, height: 1115 });
    expect(s.width * s.height).toBeLessThanOrEqual(2_073_600);
  });
  it("letterboxes a 16:9 source into a square box", () => {
    expect(containTransform(1280, 720, 400, 400)).toEqual({ scale: 400 / 1280, offsetX: 0, offsetY: (400 - 225) / 2 });
  });
});

describe("side by side at impact", () => {
  const a = { captureFps: 240, impactFrame: 300, frameCount: 480 };
  const b = { captureFps: 480, impactFrame: 500, frameCount: 900 };
  it("impact meets impact", () => {
    expect(alignedFrame(300, a, b)).toBe(500);
  });
  it("the same capture time after impact: 24 frames at 240 fps = 48 frames at 480 fps", () => {
    expect(alignedFrame(324, a, b)).toBe(548);
  });
  it("clamps to the other clip and reports the span both cover", () => {
    expect(alignedFrame(0, a, b)).toBe(0);
    const span = sharedSpan(a, b);
    expect(span.from).toBeCloseTo(-500 / 480, 9);
    expect(span.to).toBeCloseTo(179 / 240, 9);
  });
});
