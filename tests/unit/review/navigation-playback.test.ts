// Review screen: putt numbering and previous/next, playback timing (hand-calculated), the signed
// formatter, the angle tool's value, the new keys.
import { describe, expect, it } from "vitest";
import { signed, signedMs } from "@/lib/format/signed";
import { commandForKey } from "@/lib/review/keys";
import { angleDegrees } from "@/lib/review/marks";
import { defaultRange, frameAt, startFrame } from "@/lib/review/playback";
import { earlierOfSameView, puttNeighbours, puttNumbers, type PuttClip } from "@/lib/review/putts";

const key = (k: string, shiftKey = false) => ({ key: k, shiftKey, ctrlKey: false, metaKey: false, altKey: false });

describe("signed numbers", () => {
  it("uses a true minus, an explicit plus, and never a signed zero", () => {
    expect(signed(-0.6, 1)).toBe("\u22120.6");
    expect(signed(1.44, 1)).toBe("+1.4");
    expect(signed(-0.04, 1)).toBe("0.0");
    expect(signed(0.04, 1)).toBe("0.0");
    expect(signed(-2, 1, { plus: false })).toBe("\u22122.0");
    expect(signed(2, 1, { plus: false })).toBe("2.0");
    expect(signedMs(-12.5)).toBe("\u221212.5 ms");
  });
});

describe("putts in a fitting", () => {
  const builds = [{ id: "b2", position: 2, label: "Blade 35" }, { id: "b1", position: 1, label: "Baseline" }];
  const c = (id: string, buildId: string, view: PuttClip["view"], minute: number, state = "ready"): PuttClip =>
    ({ id, buildId, view, state, createdAt: `2026-03-01T10:${String(minute).padStart(2, "0")}:00.000Z` });
  const clips = [
    c("o1", "b1", "overhead", 1), c("f1", "b1", "face-on", 1), c("o2", "b1", "overhead", 2), c("o3", "b1", "overhead", 3, "failed"),
    c("o4", "b2", "overhead", 10), c("o5", "b2", "overhead", 11),
  ];

  it("numbers putts by upload order within build and view", () => {
    const n = puttNumbers(clips);
    expect([n.get("o1"), n.get("o2"), n.get("o3"), n.get("o4"), n.get("o5"), n.get("f1")]).toEqual([1, 2, 3, 1, 2, 1]);
  });

  it("goes to the next putt across builds (by build position), skipping clips that are not ready", () => {
    expect(puttNeighbours(clips, builds, "o2")).toEqual({ putt: 2, previous: { id: "o1", buildLabel: "Baseline", putt: 1 }, next: { id: "o4", buildLabel: "Blade 35", putt: 1 } });
    expect(puttNeighbours(clips, builds, "o1").previous).toBeNull();
    expect(puttNeighbours(clips, builds, "o5").next).toBeNull();
    expect(puttNeighbours(clips, builds, "f1")).toEqual({ putt: 1, previous: null, next: null });
  });

  it("looks back for reference marks in earlier ready clips of the same view, latest first", () => {
    expect(earlierOfSameView(clips, "o4").map((x) => x.id)).toEqual(["o2", "o1"]);
  });
});

describe("playback", () => {
  const p = { from: 10, to: 40, captureFps: 240, speed: 1 / 8, loop: false };

  it("advances at capture fps × speed: 240 fps at 1/8 is 30 frames a second", () => {
    // Hand calculation: 0.5 s × 240 × 1/8 = 15 frames after frame 10.
    expect(frameAt(p, 10, 500)).toEqual({ frame: 25, ended: false });
    // Real time: 0.05 s × 240 = 12 frames.
    expect(frameAt({ ...p, speed: 1 }, 10, 50)).toEqual({ frame: 22, ended: false });
  });

  it("stops on the range's end, or loops back to its start", () => {
    // 31 frames in the range; 2 s at 30 frames/s = 60 frames: past the end.
    expect(frameAt(p, 10, 2000)).toEqual({ frame: 40, ended: true });
    // Looping: offset 60 in a 31-frame range is 60 − 31 = 29 → frame 39.
    expect(frameAt({ ...p, loop: true }, 10, 2000)).toEqual({ frame: 39, ended: false });
  });

  it("plays address → finish by default and starts from the cursor when it is inside", () => {
    expect(defaultRange({ address: 12, finish: 80 }, 100)).toEqual({ from: 12, to: 80 });
    expect(defaultRange({ address: 12, finish: null }, 100)).toEqual({ from: 12, to: 99 });
    expect(defaultRange({ address: null, finish: null }, 100)).toEqual({ from: 0, to: 99 });
    expect(startFrame({ from: 12, to: 80 }, 30)).toBe(30);
    expect(startFrame({ from: 12, to: 80 }, 80)).toBe(12);
  });
});

describe("keys and the angle tool", () => {
  it("maps [ ] and P", () => {
    expect(commandForKey(key("["))).toEqual({ type: "putt", by: -1 });
    expect(commandForKey(key("]"))).toEqual({ type: "putt", by: 1 });
    expect(commandForKey(key("p"))).toEqual({ type: "togglePlay" });
  });

  it("an angle mark's opening: a 3-4-5 triangle's angle at the vertex is atan(4/3) = 53.13°", () => {
    expect(angleDegrees([[3, 0], [0, 0], [0, 4]])).toBeCloseTo(90, 9);
    expect(angleDegrees([[3, 0], [0, 0], [3, 4]])).toBeCloseTo(53.1301, 3);
    expect(angleDegrees([[1, 1], [1, 1], [2, 2]])).toBeNull();
  });
});
