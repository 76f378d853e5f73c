/**
 * Issue 11, stale values: a change to an input of the measurements (the golfer's handedness, the
 * build's static loft, the studio's friction) recomputes every value built on it, and the clip's
 * measurements, the comparison and the CSV all show the new numbers at once. Expected values are
 * hand-worked from the marks drawn here (docs/measurements.md).
 */
import { beforeAll, describe, expect, it } from "vitest";
import { call, type Auth } from "../../support/http";
import { insertClip } from "../../support/clip-rows";
import { makeWorld, tokenFor, type World } from "../../support/world";

let w: World;
let fitter: Auth;
let admin: Auth;
let overheadId = "";
let faceOnId = "";
const rad = (d: number) => (d * Math.PI) / 180;
type Entry = { key: string; value: number | null; uncertainty?: number | null; needs?: string[] };
const byKey = (list: Entry[]) => Object.fromEntries(list.map((m) => [m.key, m]));
const measured = async (clipId: string) => byKey((await call(fitter, "GET", `/api/clips/${clipId}/measurements`)).body.measurements);

async function draw(clipId: string, mark: object) {
  const res = await call(fitter, "POST", `/api/clips/${clipId}/marks`, mark);
  expect(res.status, JSON.stringify(res.body)).toBe(201);
}

beforeAll(async () => {
  w = await makeWorld();
  fitter = { token: (await tokenFor(w.fitter.id)).value };
  admin = { token: (await tokenFor(w.admin.id)).value };
  expect((await call(fitter, "PATCH", `/api/builds/${w.own.build.id}`, { loftDeg: 3 })).status).toBe(200);
  overheadId = (await insertClip(w.own, { view: "overhead", addressFrame: 40, impactFrame: 300 })).id;
  faceOnId = (await insertClip(w.own, { view: "face-on", addressFrame: 40, impactFrame: 300 })).id;
  // Overhead: target straight up the image; at impact the face normal points 2° to the image's right.
  await draw(overheadId, { frame: 0, kind: "line", role: "target", points: [[640, 600], [640, 100]] });
  const f = [Math.cos(rad(2)), Math.sin(rad(2))];
  await draw(overheadId, { frame: 300, kind: "line", role: "face", points: [[640 - 40 * f[0]!, 500 - 40 * f[1]!], [640 + 40 * f[0]!, 500 + 40 * f[1]!]] });
  // Face-on: the shaft leans 4° toward the target (+x) at impact.
  await draw(faceOnId, { frame: 300, kind: "line", role: "shaft", points: [[600, 600], [600 + 400 * Math.sin(rad(4)), 600 - 400 * Math.cos(rad(4))]] });
});

describe("a changed input recomputes every value built on it", () => {
  it("handedness: the overhead face angle reads with the opposite sign, on the clip, the comparison and the CSV", async () => {
    expect((await measured(overheadId)).face_angle_impact!.value).toBeCloseTo(2, 6);
    const res = await call(fitter, "PATCH", `/api/golfers/${w.own.golfer.id}`, { handedness: "left" });
    expect(res.status, JSON.stringify(res.body)).toBe(200);
    expect((await measured(overheadId)).face_angle_impact!.value).toBeCloseTo(-2, 6);
    const clip = await call(fitter, "GET", `/api/clips/${overheadId}`);
    expect(clip.body.handedness).toBe("left");
    const comparison = await call(fitter, "GET", `/api/fittings/${w.own.fitting.id}/comparison`);
    const face = comparison.body.builds.flatMap((b: { stats: { key: string; summary: { mean: number } }[] }) => b.stats).find((s: { key: string }) => s.key === "face_angle_impact");
    expect(face.summary.mean).toBeCloseTo(-2, 6);
    const csv = await call(fitter, "GET", `/api/fittings/${w.own.fitting.id}/csv`);
    const line = String(csv.body).split("\r\n").find((l: string) => l.includes(overheadId) && l.includes("face_angle_impact"))!;
    expect(Number(line.split(",")[7])).toBeCloseTo(-2, 6);
    expect((await call(fitter, "PATCH", `/api/golfers/${w.own.golfer.id}`, { handedness: "right" })).status).toBe(200);
    expect((await measured(overheadId)).face_angle_impact!.value).toBeCloseTo(2, 6);
  });

  it("static loft: dynamic loft = loft − shaft lean follows the build's loft (3 − 4 = −1, then 5 − 4 = +1)", async () => {
    expect((await measured(faceOnId)).dynamic_loft!.value).toBeCloseTo(-1, 6);
    expect((await call(fitter, "PATCH", `/api/builds/${w.own.build.id}`, { loftDeg: 5 })).status).toBe(200);
    expect((await measured(faceOnId)).dynamic_loft!.value).toBeCloseTo(1, 6);
  });

  it("friction: the skid is recomputed with the studio's new μ (a higher μ stops the slide sooner)", async () => {
    // A ball 5 px (= 5 mm through the 42.67 px scale) per frame, its marker dot not turning: sliding, no spin.
    await draw(faceOnId, { frame: 40, kind: "scale", role: "ball", points: [[100, 100], [142.67, 100]] });
    for (let k = 1; k <= 8; k++) {
      await draw(faceOnId, { frame: 300 + k, kind: "point", role: "ball", points: [[700 + 5 * k, 580]] });
      await draw(faceOnId, { frame: 300 + k, kind: "point", role: "marker", points: [[700 + 5 * k, 565]] });
    }
    const settings = (await call(admin, "GET", "/api/studio/settings")).body;
    expect((await call(admin, "PUT", "/api/studio/settings", { ...settings, frictionMu: 0.2 })).status).toBe(200);
    const low = (await measured(faceOnId)).skid_distance!.value!;
    expect(low).toBeGreaterThan(0);
    expect((await call(admin, "PUT", "/api/studio/settings", { ...settings, frictionMu: 0.4 })).status).toBe(200);
    const high = (await measured(faceOnId)).skid_distance!.value!;
    // Penner 2002: the skid scales about as 1/μ (12v₀²/(49μg) with no spin); doubling μ about halves it.
    expect(high / low).toBeGreaterThan(0.4);
    expect(high / low).toBeLessThan(0.6);
  });
});
