// Comparison of builds through the API, on values worked by hand; make probability against the
// hand-worked case of docs/references.md (derived from the Rules of Golf hole radius).
import { beforeAll, describe, expect, it } from "vitest";
import { call, signIn } from "../../support/http";
import { makeWorld, PASSWORD, type World } from "../../support/world";
import { db, schema } from "@/db";
import { eq } from "drizzle-orm";
import { addBuild, addMeasuredClips } from "./helpers";

let w: World;
let fitter: { cookie: string };
// x such that ±x has sample sd 1.0145° (n = 2: sd = x·√2)
const x = 1.0145 / Math.SQRT2;
// Five start directions ±s, ±s, 0: Σd² = 4s², sd = √(4s²/4) = s = 1.0145°.
const s = 1.0145;

beforeAll(async () => {
  w = await makeWorld();
  fitter = { cookie: (await signIn(w.fitter.email, PASSWORD)).cookie! };
  await db.update(schema.studios).set({ settings: { ...w.studioA.settings, windows: { face_angle_impact: { min: -1, max: 1 } } } }).where(eq(schema.studios.id, w.studioA.id));
  const mallet = await addBuild(w, "Mallet");
  await addMeasuredClips(w, w.own.build, [
    { face_angle_impact: 2, path: 1, start_direction: x },
    { face_angle_impact: -1, path: 0, start_direction: -x },
    { face_angle_impact: 0.5, path: null },
    { face_angle_impact: 1.5, path: 2 },
  ]);
  await addMeasuredClips(w, mallet, [0.2, -0.2, 0.4, -0.4, 0].map((v) => ({ face_angle_impact: v, start_direction: v / 2, path: 0.5 })));
  const handWorked = await addBuild(w, "Hand-worked", {}, 3);
  await addMeasuredClips(w, handWorked, [s, -s, s, -s, 0].map((v) => ({ start_direction: v })));
  // a clip not yet processed does not count
  const [pending] = await addMeasuredClips(w, mallet, [{ face_angle_impact: 9 }]);
  await db.update(schema.clips).set({ state: "processing" }).where(eq(schema.clips.id, pending!.id));
});

describe("GET /api/fittings/{id}/comparison", () => {
  it("per build: n, mean, sd, median, range and share inside the studio's window (by hand)", async () => {
    const res = await call(fitter, "GET", `/api/fittings/${w.own.fitting.id}/comparison`);
    expect(res.status).toBe(200);
    const [own, mallet] = res.body.builds;
    expect(own.label).toBe("Baseline");
    const face = own.stats.find((s: { key: string }) => s.key === "face_angle_impact").summary;
    // 2, −1, 0.5, 1.5: mean 0.75; median (0.5+1.5)/2 = 1; range 3; Σ(d²) = 5.25 → sd √1.75; inside [−1, 1]: −1 and 0.5
    expect(face).toMatchObject({ n: 4, mean: 0.75, median: 1, range: 3, shareInWindow: 0.5 });
    expect(face.sd).toBeCloseTo(Math.sqrt(1.75), 12);
    const path = own.stats.find((s: { key: string }) => s.key === "path").summary;
    expect(path).toMatchObject({ n: 3, mean: 1, median: 1, range: 2 }); // the null path is left out
    const malletFace = mallet.stats.find((s: { key: string }) => s.key === "face_angle_impact").summary;
    expect(malletFace).toMatchObject({ n: 5, mean: 0, median: 0, range: 0.8, shareInWindow: 1 });
    expect(malletFace.sd).toBeCloseTo(Math.sqrt(0.4 / 4), 12); // 0.04+0.04+0.16+0.16 = 0.4
    expect(mallet.clipCount).toBe(5);
  });

  it("no make probability below 5 putts (Wilson 1927 score interval: fewer cannot tell mostly holed from mostly missed)", async () => {
    const res = await call(fitter, "GET", `/api/fittings/${w.own.fitting.id}/comparison`);
    const make = res.body.builds[0].make as { probability: number | null }[];
    expect(make.map((m) => m.probability)).toEqual([null, null, null, null]);
  });

  it("make probability: μ = 0, σ = 1.0145° at 10 ft → 0.6827 (docs/references.md, hand-worked)", async () => {
    const res = await call(fitter, "GET", `/api/fittings/${w.own.fitting.id}/comparison`);
    const make = res.body.builds[2].make as { distanceFt: number; probability: number; windowDeg: number }[];
    expect(make.map((m) => m.distanceFt)).toEqual([3, 6, 10, 20]);
    const ten = make.find((m) => m.distanceFt === 10)!;
    expect(ten.windowDeg).toBeCloseTo(1.0145, 4);
    expect(ten.probability).toBeCloseTo(0.6827, 4);
  });

  it("suggests a build with reasons in plain words; two start directions are too few to rank", async () => {
    const res = await call(fitter, "GET", `/api/fittings/${w.own.fitting.id}/comparison`);
    expect(res.body.recommendation.label).toBe("Mallet");
    expect(res.body.recommendation.reasons.length).toBeGreaterThan(1);
    expect(res.body.recommendation.reasons.join(" ")).toContain("over 5 putts");
  });

  it("plots' data: the overhead putts in recording order", async () => {
    const res = await call(fitter, "GET", `/api/fittings/${w.own.fitting.id}/comparison`);
    expect(res.body.builds[0].putts.map((p: { face: number }) => p.face)).toEqual([2, -1, 0.5, 1.5]);
  });
});
