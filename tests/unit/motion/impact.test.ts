import { describe, expect, it } from "vitest";
import { persistentRise, suggestImpactFrame } from "@/lib/motion";

/** Deterministic noise (mulberry32) so each synthetic signal is the same on every run. */
function noise(seed: number, amplitude: number): () => number {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = Math.imul(a ^ (a >>> 15), a | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((((t ^ (t >>> 14)) >>> 0) / 4294967296) - 0.5) * 2 * amplitude;
  };
}

/**
 * A stroke's signal: a noise floor, the head's share (a smooth swing back and a faster
 * swing through, peaking at impact k and losing some speed to the ball), and the ball's
 * share, a lasting step from k + 1 on.
 */
function strokeSignal(opts: { length: number; k: number; head: number; ball: number; floor: number; noiseAmp: number; seed: number; loss?: number }): number[] {
  const rnd = noise(opts.seed, opts.noiseAmp);
  const top = Math.round(opts.k * 0.6);
  const signal = [0];
  for (let f = 1; f < opts.length; f++) {
    let head: number;
    if (f <= top) head = 0.4 * opts.head * Math.sin((Math.PI * f) / top);
    else if (f <= opts.k) head = opts.head * Math.sin(((Math.PI / 2) * (f - top)) / (opts.k - top));
    else head = opts.head * (1 - (opts.loss ?? 0.15)) * Math.cos(((Math.PI / 2) * (f - opts.k)) / (opts.length - opts.k));
    const ball = f > opts.k ? opts.ball : 0;
    signal.push(opts.floor + head + ball + rnd());
  }
  return signal;
}

describe("suggestImpactFrame", () => {
  it.each([
    { k: 190, head: 0.1, ball: 0.15, seed: 1 },
    { k: 331, head: 0.05, ball: 0.05, seed: 2 },
    { k: 60, head: 0.3, ball: 1.2, seed: 3 },
    { k: 420, head: 0.08, ball: 0.4, seed: 4 },
  ])("finds the last still-ball frame k = $k exactly", ({ k, head, ball, seed }) => {
    const signal = strokeSignal({ length: k + 120, k, head, ball, floor: 0.5, noiseAmp: 0.005, seed });
    expect(suggestImpactFrame(signal)?.frame).toBe(k);
  });

  it("ignores a one-frame flicker larger than the ball's step", () => {
    const signal = strokeSignal({ length: 300, k: 200, head: 0.1, ball: 0.2, floor: 0.5, noiseAmp: 0.005, seed: 5 });
    signal[80] = signal[80]! + 3; // a light flicker on one frame
    expect(suggestImpactFrame(signal)?.frame).toBe(200);
  });

  it("withholds a suggestion when nothing steps up above the noise", () => {
    const rnd = noise(6, 0.05);
    const still = Array.from({ length: 300 }, (_, i) => (i === 0 ? 0 : 0.5 + rnd()));
    expect(suggestImpactFrame(still)).toBeNull();
    expect(suggestImpactFrame([])).toBeNull();
    expect(suggestImpactFrame([0, 1, 1])).toBeNull();
  });

  it("reports the strength as the rise over the typical frame-to-frame change", () => {
    const signal = [0, 1, 1.01, 1, 1.01, 1, 2, 2.01, 2, 2.01, 2];
    const suggestion = suggestImpactFrame(signal);
    expect(suggestion?.frame).toBe(5);
    // rise = min(2, 2.01) − max(1, 1.01) = 0.99; typical change = median |Δ| = 0.01
    expect(suggestion?.strength).toBeCloseTo(99, 6);
  });
});

describe("persistentRise", () => {
  it("counts a lasting step in full and a spike not at all", () => {
    expect(persistentRise([0, 1, 1, 3, 3], 2)).toBe(2);
    expect(persistentRise([0, 1, 1, 3, 1], 2)).toBe(0);
  });
});
