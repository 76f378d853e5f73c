import { describe, expect, it } from "vitest";
import { commandForKey, type KeyPress } from "@/lib/review/keys";
import { clampFrame, frameTimeMs, LruCache, preloadOrder } from "@/lib/review/frames";
import { frameAtX, frameToPercent, signalPoints } from "@/lib/review/strip";
import { gaugeScale, sideWords, standing, valueText } from "@/lib/review/readout";

const key = (k: string, mods: Partial<KeyPress> = {}): KeyPress => ({ key: k, shiftKey: false, ctrlKey: false, metaKey: false, altKey: false, ...mods });

describe("keyboard", () => {
  it("steps one frame, or ten with Shift", () => {
    expect(commandForKey(key("ArrowRight"))).toEqual({ type: "step", by: 1 });
    expect(commandForKey(key("ArrowLeft", { shiftKey: true }))).toEqual({ type: "step", by: -10 });
  });
  it("A/I jump; Shift+A/Shift+I set the moment (the browser sends upper case with Shift)", () => {
    expect(commandForKey(key("a"))).toEqual({ type: "jump", moment: "address" });
    expect(commandForKey(key("I", { shiftKey: true }))).toEqual({ type: "setMoment", moment: "impact" });
  });
  it("undo and both redo chords, with Ctrl or Cmd", () => {
    expect(commandForKey(key("z", { ctrlKey: true }))).toEqual({ type: "undo" });
    expect(commandForKey(key("Z", { metaKey: true, shiftKey: true }))).toEqual({ type: "redo" });
    expect(commandForKey(key("y", { ctrlKey: true }))).toEqual({ type: "redo" });
    expect(commandForKey(key("c", { ctrlKey: true }))).toBeNull();
  });
  it("zoom, help, delete, tools and nothing for unknown keys", () => {
    expect(commandForKey(key("+"))).toEqual({ type: "zoom", by: "in" });
    expect(commandForKey(key("-"))).toEqual({ type: "zoom", by: "out" });
    expect(commandForKey(key("0"))).toEqual({ type: "zoom", by: "fit" });
    expect(commandForKey(key("?", { shiftKey: true }))).toEqual({ type: "help" });
    expect(commandForKey(key("Delete"))).toEqual({ type: "delete" });
    expect(commandForKey(key("2"))).toEqual({ type: "tool", tool: "line" });
    expect(commandForKey(key("q"))).toBeNull();
    expect(commandForKey(key("t"))).toEqual({ type: "acceptProposals" });
  });
});

describe("frames", () => {
  it("preloads nearest first, ahead before behind, inside the clip", () => {
    expect(preloadOrder(1, 10, 3)).toEqual([1, 2, 0, 3, 4]);
    expect(preloadOrder(9, 10, 2)).toEqual([9, 8, 7]);
  });
  it("clamps a frame into the clip", () => {
    expect(clampFrame(-3, 30)).toBe(0);
    expect(clampFrame(40, 30)).toBe(29);
  });
  it("time comes from the capture rate: frame 60 at 240 fps is 250 ms", () => {
    expect(frameTimeMs(60, 240)).toBe(250);
  });
  it("the LRU store evicts the least recently used entry", () => {
    const evicted: number[] = [];
    const cache = new LruCache<number, string>(2, (k) => evicted.push(k));
    cache.set(1, "a");
    cache.set(2, "b");
    cache.get(1);
    cache.set(3, "c");
    expect(evicted).toEqual([2]);
    expect(cache.keys()).toEqual([1, 3]);
  });
});

describe("frame strip", () => {
  it("draws the signal with its peak at the top", () => {
    expect(signalPoints([0, 2, 1], 10)).toBe("0,10.00 1,0.00 2,5.00");
    expect(signalPoints([], 10)).toBe("");
  });
  it("maps a pointer to the nearest frame and back", () => {
    expect(frameAtX(50, 100, 11)).toBe(5);
    expect(frameAtX(-5, 100, 11)).toBe(0);
    expect(frameAtX(500, 100, 11)).toBe(10);
    expect(frameToPercent(5, 11)).toBe(50);
  });
});

describe("readouts", () => {
  it("shows an explicit sign and the unit; no plus on zero", () => {
    expect(valueText(1.44, "deg", true)).toBe("+1.4°");
    expect(valueText(-0.04, "deg", true)).toBe("0.0°");
    expect(valueText(-2.25, "deg", true)).toBe("\u22122.3°");
    expect(valueText(1.857, "m/s", false)).toBe("1.86 m/s");
  });
  it("names the side by the shown number", () => {
    const words = { positive: "open", negative: "closed" };
    expect(sideWords(1.4, "deg", words)).toBe("open");
    expect(sideWords(-0.6, "deg", words)).toBe("closed");
    expect(sideWords(0.02, "deg", words)).toBe("");
    expect(sideWords(3, "m/s", null)).toBe("");
  });
  it("stands in window, near (within half the window's width outside it) or outside", () => {
    const w = { min: -1, max: 1 };
    expect(standing(0.5, w)).toBe("in window");
    expect(standing(1, w)).toBe("in window");
    expect(standing(1.9, w)).toBe("near");
    expect(standing(-2, w)).toBe("near");
    expect(standing(2.1, w)).toBe("outside");
  });
  it("the gauge is centred on zero and keeps the value on the scale", () => {
    const at = gaugeScale(5, { min: -1, max: 1 });
    expect(at(0)).toBe(50);
    expect(at(5)).toBeLessThanOrEqual(100);
    expect(at(-1)).toBeLessThan(50);
  });
});
