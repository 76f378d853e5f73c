// Regression tests of issue 11 (measurement integrity): each failed on the engine before it.
import { describe, expect, it } from "vitest";
import type { StoredMark } from "@/lib/marks/types";
import { computeMeasurements } from "@/lib/metrics/compute";
import { ADDRESS, IMPACT, overheadClip, overheadMarks, valuesByKey } from "./scene";

const rad = (d: number) => (d * Math.PI) / 180;
const byKey = (list: ReturnType<typeof computeMeasurements>) => Object.fromEntries(list.map((m) => [m.key, m]));

describe("angles that make no sense are wrapped or refused", () => {
  it("face 5° with path −177°: the head runs backwards along the target line, so no path and no face to path (never 182°)", () => {
    const list = byKey(computeMeasurements(overheadClip(), overheadMarks({ aimDeg: 0, faceDeg: 5, pathDeg: -177, startDeg: 0, rotationPerFrameDeg: 0, twistDeg: 0, ballStepPx: 8 })));
    expect(list.path).toMatchObject({ value: null });
    expect(list.face_to_path).toMatchObject({ value: null });
  });
  it("a target line drawn backwards (from the hole toward the ball) gives needs, not a number near 180°", () => {
    const marks = overheadMarks({ aimDeg: 0, faceDeg: 1, pathDeg: 2, startDeg: 1, rotationPerFrameDeg: 0, twistDeg: 0, ballStepPx: 8 });
    const reversed = marks.map((m) => (m.role === "target" ? { ...m, points: [m.points[1]!, m.points[0]!] } : m));
    const list = byKey(computeMeasurements(overheadClip(), reversed));
    expect(list.start_direction).toMatchObject({ value: null, needs: [expect.stringMatching(/target line .* wrong way round/)] });
    expect(list.path).toMatchObject({ value: null, needs: [expect.stringMatching(/wrong way round/)] });
  });
  it("twist when impact is the clip's last frame says so instead of asking for a frame that does not exist", () => {
    const list = byKey(computeMeasurements(overheadClip({ frameCount: IMPACT + 1 }), overheadMarks({ aimDeg: 0, faceDeg: 1, pathDeg: 2, startDeg: 1, rotationPerFrameDeg: 0, twistDeg: 0, ballStepPx: 8 }).filter((m) => m.frame <= IMPACT)));
    expect(list.twist).toMatchObject({ value: null, needs: [`a frame after impact: impact is frame ${IMPACT}, the clip's last — set impact earlier if the ball has already moved there`] });
  });
  it("needs lists every missing input at once", () => {
    const list = byKey(computeMeasurements(overheadClip({ moments: { address: ADDRESS, impact: null } }), []));
    expect(list.start_direction).toMatchObject({ needs: ["the impact frame moment", "a target line (from the ball toward the hole)"] });
    expect(list.aim).toMatchObject({ needs: ["a target line (from the ball toward the hole)", `a face line on frame ${ADDRESS} (address)`] });
  });
});

describe("face to path wraps into (−180°, 180°]", () => {
  it("the difference itself, hand-worked", async () => {
    const { wrapDegrees } = await import("@/lib/geometry/angle");
    // Hand-worked: 5 − (−177) = 182 ≡ 182 − 360 = −178.
    expect(wrapDegrees(5 - -177)).toBeCloseTo(-178, 12);
    expect(wrapDegrees(-180)).toBe(180);
    expect(wrapDegrees(180)).toBe(180);
    expect(wrapDegrees(540.5)).toBeCloseTo(-179.5, 12);
  });
});

describe("a hand mark wins over a proposal; measurements say which marks they used", () => {
  const scene = { aimDeg: 0, faceDeg: 1, pathDeg: 2, startDeg: 1.5, rotationPerFrameDeg: 0, twistDeg: 0, ballStepPx: 8 };
  it("a tracked face line at impact is overruled by a hand one on the same frame, whichever was stored last", () => {
    const marks = overheadMarks(scene);
    const hand = marks.find((m) => m.role === "face" && m.frame === IMPACT)!;
    // A proposal 3° off, stored after the hand mark.
    const off = (d: number): [number, number] => [Math.cos(rad(d)), Math.sin(rad(d))];
    const proposal: StoredMark = { ...hand, id: "p1", source: "tracked", precisionPx: 0.2, points: [[-40 * off(4)[0], 25 - 40 * off(4)[1]], [40 * off(4)[0], 25 + 40 * off(4)[1]]] };
    const list = byKey(computeMeasurements(overheadClip(), [...marks, proposal]));
    expect((list.face_angle_impact as { value: number }).value).toBeCloseTo(1, 10);
    expect(list.face_angle_impact).toMatchObject({ method: "marked" });
    const onlyProposal = byKey(computeMeasurements(overheadClip(), [...marks.filter((m) => m.id !== hand.id), proposal]));
    expect((onlyProposal.face_angle_impact as { value: number }).value).toBeCloseTo(4, 10);
    expect(onlyProposal.face_angle_impact).toMatchObject({ method: "mixed" }); // the target line is a hand mark
  });
});

describe("a handedness flip changes every overhead sign at once", () => {
  it("the same marks read with the opposite sign for a left-handed golfer", () => {
    const marks = overheadMarks({ aimDeg: -1.5, faceDeg: 1, pathDeg: 3, startDeg: 1.5, rotationPerFrameDeg: 0.05, twistDeg: 0.25, ballStepPx: 8 });
    const right = valuesByKey(computeMeasurements(overheadClip(), marks));
    const left = valuesByKey(computeMeasurements(overheadClip({ handedness: "left" }), marks));
    expect(right.face_angle_impact).toBeCloseTo(1, 10);
    expect(left.face_angle_impact).toBeCloseTo(-1, 10);
    expect(left.path).toBeCloseTo(-3, 10);
    expect(left.start_direction).toBeCloseTo(-1.5, 10);
    expect(left.ball_speed).toBeCloseTo(1.92, 10);
  });
});


// Many Monte Carlo runs, so that the figure is within a few per cent of the analytic one.
describe("uncertainty, against a hand propagation", { timeout: 30_000 }, () => {
  it("start direction from six hand-clicked ball points 8 px apart and a 500 px target line, 1 px per click", () => {
    // Slope of a least-squares line with perpendicular noise σ: σ_θ = σ / √Σ(dᵢ − d̄)² (J. R. Taylor,
    // An Introduction to Error Analysis, 2nd ed., §8.4). Points at 8…48 px: Σ(dᵢ − d̄)² = 64 × 17.5 = 1120,
    // σ_θ = 1/√1120 = 0.029881 rad = 1.7121°. Target line, two clicks 500 px apart: √2 / 500 rad = 0.16206°.
    // Together √(1.7121² + 0.16206²) = 1.7197°.
    const marks = overheadMarks({ aimDeg: 0, faceDeg: 0, pathDeg: 0, startDeg: 0, rotationPerFrameDeg: 0, twistDeg: 0, ballStepPx: 8 })
      .map((m) => (m.role === "target" ? { ...m, points: [[0, 0], [0, -500]] as [number, number][] } : m));
    const start = computeMeasurements(overheadClip(), marks, { monteCarloRuns: 2000 }).find((m) => m.key === "start_direction") as { uncertainty: number };
    expect(start.uncertainty).toBeGreaterThan(1.7197 * 0.95);
    expect(start.uncertainty).toBeLessThan(1.7197 * 1.05);
  });
  it("tracked points with a tighter stated precision give a proportionally smaller uncertainty", () => {
    const marks = overheadMarks({ aimDeg: 0, faceDeg: 0, pathDeg: 0, startDeg: 0, rotationPerFrameDeg: 0, twistDeg: 0, ballStepPx: 8 })
      .map((m) => (m.role === "ball" ? { ...m, source: "tracked" as const, precisionPx: 0.1 } : m.role === "target" ? { ...m, points: [[0, 0], [0, -500]] as [number, number][] } : m));
    const start = computeMeasurements(overheadClip(), marks, { monteCarloRuns: 2000 }).find((m) => m.key === "start_direction") as { uncertainty: number; method: string };
    // √(0.17121² + 0.16206²) = 0.2357°.
    expect(start.uncertainty).toBeGreaterThan(0.2357 * 0.95);
    expect(start.uncertainty).toBeLessThan(0.2357 * 1.05);
    expect(start.method).toBe("mixed");
  });
});
