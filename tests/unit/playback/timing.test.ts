// Proxy media time ↔ source frame. The proxy's timing (playback fps = captureFps ÷ slow-motion
// factor, thinned above 60 fps by an integer step) is the pipeline's; ffprobe-checked in
// tests/integration/video. Here: the mapping itself, checked by hand-worked cases.
import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { formatCaptureTime, mediaTimeOf, playbackOf, sourceFrameAt, stepSize } from "@/lib/playback/timing";

const clip240x8 = { captureFps: 240, slowMotionFactor: 8, frameCount: 480 }; // 30 fps playback, k = 1
const clip1000x4 = { captureFps: 1000, slowMotionFactor: 4, frameCount: 2000 }; // 250 fps → k = 5, 50 fps proxy

describe("playbackOf", () => {
  it("keeps every frame at or below 60 fps and thins by ceil(playback / 60) above", () => {
    expect(playbackOf(clip240x8)).toEqual({ playbackFps: 30, keepEvery: 1, proxyFps: 30 });
    expect(playbackOf(clip1000x4)).toEqual({ playbackFps: 250, keepEvery: 5, proxyFps: 50 });
    expect(playbackOf({ captureFps: 480, slowMotionFactor: 8 }).keepEvery).toBe(1); // exactly 60 fps
    expect(playbackOf({ captureFps: 488, slowMotionFactor: 8 }).keepEvery).toBe(2);
  });
  it("refuses a zero or negative rate", () => {
    expect(() => playbackOf({ captureFps: 0, slowMotionFactor: 8 })).toThrow();
  });
});

describe("sourceFrameAt", () => {
  it("maps n = round(t · captureFps / slowMotionFactor) without thinning", () => {
    expect(sourceFrameAt(0, clip240x8)).toBe(0);
    expect(sourceFrameAt(10 / 30, clip240x8)).toBe(10);
    expect(sourceFrameAt(9.9 / 30, clip240x8)).toBe(10);
    expect(sourceFrameAt(299 / 30, clip240x8)).toBe(299);
  });
  it("maps proxy frame j to source frame j·k with thinning", () => {
    expect(sourceFrameAt(3 / 50, clip1000x4)).toBe(15);
  });
  it("clamps to the clip's frames", () => {
    expect(sourceFrameAt(1000, clip240x8)).toBe(479);
    expect(sourceFrameAt(-1, clip240x8)).toBe(0);
  });
  it("a seek to a frame's media time reads back as that frame (property)", () => {
    fc.assert(fc.property(fc.integer({ min: 0, max: 479 }), (n) => sourceFrameAt(mediaTimeOf(n, clip240x8), clip240x8) === n));
    fc.assert(fc.property(fc.integer({ min: 0, max: 399 }), (j) => sourceFrameAt(mediaTimeOf(j * 5, clip1000x4), clip1000x4) === j * 5));
  });
  it("a seek lands inside the frame's display interval [j/fps, (j+1)/fps)", () => {
    const t = mediaTimeOf(42, clip240x8);
    expect(t).toBeGreaterThanOrEqual(42 / 30);
    expect(t).toBeLessThan(43 / 30);
  });
});

describe("steps and times", () => {
  it("one step is one proxy frame", () => {
    expect(stepSize(clip240x8)).toBe(1);
    expect(stepSize(clip1000x4)).toBe(5);
  });
  it("shows a frame's capture time: frame 299 at 240 fps is 1.246 s", () => {
    expect(formatCaptureTime(299, 240)).toBe("1.246 s");
  });
});
