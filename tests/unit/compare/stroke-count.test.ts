// Issue 11: a stroke filmed from two views counts its ball speed once.
import { describe, expect, it } from "vitest";
import { compareBuilds } from "@/lib/compare/compare";

describe("a two-view stroke in the comparison", () => {
  it("counts one ball speed per putt: the overhead and face-on readings of one stroke are averaged", () => {
    const build = { id: "b1", label: "Blade", position: 1, isBaseline: false };
    const at = (min: number) => new Date(Date.UTC(2026, 0, 1, 10, min));
    const clips = [
      { id: "o1", buildId: "b1", view: "overhead" as const, createdAt: at(0), strokeId: "s1" },
      { id: "f1", buildId: "b1", view: "face-on" as const, createdAt: at(0), strokeId: "s1" },
      { id: "o2", buildId: "b1", view: "overhead" as const, createdAt: at(1), strokeId: null },
    ];
    const measurements = [
      { clipId: "o1", key: "ball_speed", value: 1.9, unit: "m/s", uncertainty: 0.02 },
      { clipId: "f1", key: "ball_speed", value: 2.1, unit: "m/s", uncertainty: 0.02 },
      { clipId: "o2", key: "ball_speed", value: 1.6, unit: "m/s", uncertainty: 0.02 },
    ];
    const speed = compareBuilds([build], clips, measurements, {}).builds[0]!.stats.find((s) => s.key === "ball_speed")!;
    // Two putts: (1.9 + 2.1)/2 = 2.0 and 1.6; mean 1.8, sample sd |2.0 − 1.6|/√2 = 0.28284.
    expect(speed.summary.n).toBe(2);
    expect(speed.summary.mean).toBeCloseTo(1.8, 12);
    expect(speed.summary.sd).toBeCloseTo(0.28284, 5);
    // The averaged putt's uncertainty: √(0.02² + 0.02²)/2 = 0.014142; noise = √((0.014142² + 0.02²)/2) = 0.017321.
    expect(speed.noise).toBeCloseTo(0.017321, 5);
  });
  it("never credits a spread below the measurement noise", () => {
    const build = { id: "b1", label: "Mallet", position: 1, isBaseline: false };
    const clips = [0, 1, 2].map((i) => ({ id: `c${i}`, buildId: "b1", view: "overhead" as const, createdAt: new Date(Date.UTC(2026, 0, 1, 10, i)) }));
    // Face angles 0.0, 0.1, 0.2 (sd 0.1°), each measured to ±0.5°: judged on 0.5°, not 0.1°.
    const measurements = clips.map((c, i) => ({ clipId: c.id, key: "face_angle_impact", value: i / 10, unit: "deg", uncertainty: 0.5 }));
    const face = compareBuilds([build], clips, measurements, {}).builds[0]!.stats[0]!;
    expect(face.summary.sd).toBeCloseTo(0.1, 12);
    expect(face.spread).toBeCloseTo(0.5, 12);
    expect(face.meanUncertainty).toBeCloseTo(0.5 / Math.sqrt(3), 12);
    // The plots draw each putt with its own ±.
    const putts = compareBuilds([build], clips, measurements, {}).builds[0]!.putts;
    expect(putts.map((p) => [p.face, p.faceUncertainty, p.path, p.pathUncertainty])).toEqual([[0, 0.5, null, null], [0.1, 0.5, null, null], [0.2, 0.5, null, null]]);
  });
});
