import { describe, expect, it } from "vitest";
import { meanAbsoluteDifference, MotionSignalBuilder, motionSignal } from "@/lib/motion";

describe("meanAbsoluteDifference", () => {
  it("averages the absolute differences of the pixels", () => {
    expect(meanAbsoluteDifference(Uint8Array.from([0, 10, 20, 30]), Uint8Array.from([10, 0, 20, 34]))).toBe(6);
    expect(meanAbsoluteDifference(new Uint8Array(0), new Uint8Array(0))).toBe(0);
  });

  it("refuses frames of different sizes", () => {
    expect(() => meanAbsoluteDifference(new Uint8Array(4), new Uint8Array(5))).toThrow(/same size/);
  });
});

describe("motion signal", () => {
  it("has one value per frame and 0 for the first", () => {
    const frames = [Uint8Array.from([0, 0]), Uint8Array.from([2, 0]), Uint8Array.from([2, 6])];
    expect(motionSignal(frames)).toEqual([0, 1, 3]);
  });

  it("does not depend on the producer keeping its buffer", () => {
    const builder = new MotionSignalBuilder();
    const reused = Uint8Array.from([0, 0]);
    builder.push(reused);
    reused.fill(4); // a streaming producer overwrites its chunk
    builder.push(reused);
    expect(builder.signal()).toEqual([0, 4]);
    expect(builder.length).toBe(2);
  });
});
