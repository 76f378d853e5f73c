import { describe, expect, it } from "vitest";
import { compareBuilds } from "@/lib/compare/compare";
import { makeChances } from "@/lib/compare/probability";
import type { CompareClip, CompareMeasurement } from "@/lib/compare/types";

const builds = [
  { id: "b2", label: "Mallet", position: 2, isBaseline: false },
  { id: "b1", label: "Own putter", position: 1, isBaseline: true },
];

function putts(buildId: string, faces: number[], starts: number[]) {
  const clips: CompareClip[] = faces.map((_, i) => ({ id: `${buildId}-c${i}`, buildId, view: "overhead", createdAt: new Date(Date.UTC(2026, 0, 1, 10, 0, i)) }));
  const ms: CompareMeasurement[] = clips.flatMap((c, i) => [
    { clipId: c.id, key: "face_angle_impact", value: faces[i]!, unit: "deg" },
    { clipId: c.id, key: "start_direction", value: starts[i]!, unit: "deg" },
    { clipId: c.id, key: "path", value: null, unit: "deg" },
  ]);
  return { clips, ms };
}

describe("compareBuilds (values worked by hand)", () => {
  const own = putts("b1", [2, -1, 0.5, 1.5], [1.5, -0.5, 0.5, 1.5]);
  const mallet = putts("b2", [0.2, -0.2, 0.4, -0.4, 0], [0.1, -0.1, 0.2, -0.2, 0]);
  const result = compareBuilds(builds, [...own.clips, ...mallet.clips], [...own.ms, ...mallet.ms], { face_angle_impact: { min: -1, max: 1 } });

  it("orders builds by position and counts their clips", () => {
    expect(result.builds.map((b) => [b.label, b.clipCount])).toEqual([["Own putter", 4], ["Mallet", 5]]);
  });

  it("face angle of the first build: n 4, mean 0.75, median 1, range 3, sd √(5.25/3), 2 of 4 inside ±1°", () => {
    const s = result.builds[0]!.stats.find((x) => x.key === "face_angle_impact")!.summary;
    // by hand: deviations 1.25, −1.75, −0.25, 0.75 → squares sum 1.5625+3.0625+0.0625+0.5625 = 5.25
    expect(s).toMatchObject({ n: 4, mean: 0.75, median: 1, min: -1, max: 2, range: 3, shareInWindow: 0.5 });
    expect(s.sd).toBeCloseTo(Math.sqrt(5.25 / 3), 12);
  });

  it("skips measurements that could not be computed (null) and keys without a window get no share", () => {
    expect(result.builds[0]!.stats.find((x) => x.key === "path")).toBeUndefined();
    expect(result.builds[0]!.stats.find((x) => x.key === "start_direction")!.summary.shareInWindow).toBeNull();
  });

  it("lists the overhead putts in recording order for the plots", () => {
    expect(result.builds[1]!.putts.map((p) => [p.putt, p.face, p.start, p.path])).toEqual([
      [1, 0.2, 0.1, null], [2, -0.2, -0.1, null], [3, 0.4, 0.2, null], [4, -0.4, -0.2, null], [5, 0, 0, null],
    ]);
  });

  it("suggests the build that starts the ball on line, with its reasons, in plain words", () => {
    expect(result.recommendation?.label).toBe("Mallet");
    expect(result.recommendation?.basis).toBe("start_direction");
    expect(result.recommendation?.reasons.join(" ")).toMatch(/spread \(sd\) 0\.2° over 5 putts/);
    expect(result.recommendation?.reasons.join(" ")).not.toMatch(/perfect|grade|score/i);
  });

  it("no suggestion without three measured putts on some build", () => {
    const few = putts("b1", [1, 2], [1, 2]);
    expect(compareBuilds(builds, few.clips, few.ms, {}).recommendation).toBeNull();
  });
});

describe("make probability per build (docs/references.md, holing window derived from the Rules of Golf hole)", () => {
  it("hand-worked: μ = 0, σ = 1.0145° at 10 ft → 0.6827 (the ±1σ share of a normal)", () => {
    const summary = { n: 10, mean: 0, sd: 1.0145, median: 0, min: -2, max: 2, range: 4, shareInWindow: null };
    const chance = makeChances(summary, [10])[0]!;
    expect(chance.windowDeg).toBeCloseTo(1.0145, 4);
    expect(chance.probability).toBeCloseTo(0.6827, 4);
  });
  it("no probability without a spread", () => {
    const one = { n: 1, mean: 0, sd: null, median: 0, min: 0, max: 0, range: 0, shareInWindow: null };
    expect(makeChances(one).map((m) => m.probability)).toEqual([null, null, null, null]);
  });
});
