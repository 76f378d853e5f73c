import { describe, expect, it } from "vitest";
import { frameAtOffset, offsetSpan, offsetStep } from "@/lib/strokes/sync";

const overhead = { impactFrame: 300, captureFps: 240, frameCount: 480 };
const faceOn = { impactFrame: 150, captureFps: 120, frameCount: 240 };

describe("views lined up at impact", () => {
  it("shows each view's impact frame at offset 0", () => {
    expect(frameAtOffset(overhead, 0)).toBe(300);
    expect(frameAtOffset(faceOn, 0)).toBe(150);
  });

  it("counts time at each camera's own rate (1/240 s = one overhead frame, half a face-on frame)", () => {
    expect(frameAtOffset(overhead, 0.1)).toBe(324);
    expect(frameAtOffset(faceOn, 0.1)).toBe(162);
    expect(frameAtOffset(overhead, -1 / 240)).toBe(299);
  });

  it("has no frame where a clip does not reach", () => {
    expect(frameAtOffset(faceOn, -1.3)).toBeNull();
    expect(frameAtOffset(overhead, 0.75)).toBeNull();
    expect(frameAtOffset(overhead, 179 / 240)).toBe(479);
  });

  it("spans what any view covers, stepping by the fastest camera's frame", () => {
    expect(offsetSpan([overhead, faceOn])).toEqual({ fromS: -1.25, toS: 179 / 240 });
    expect(offsetStep([overhead, faceOn])).toBeCloseTo(1 / 240, 12);
    expect(offsetSpan([])).toEqual({ fromS: 0, toS: 0 });
  });
});
