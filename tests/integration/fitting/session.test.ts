// The live session's data and its corrections through the HTTP API: GET …/session, PATCH and
// DELETE /api/clips/{id} (move, mishit, delete), and the studio-screen link. Expected statistics
// are worked by hand beside each check.
import { and, eq } from "drizzle-orm";
import { beforeAll, describe, expect, it } from "vitest";
import { db, schema } from "@/db";
import { clipPrefix, listKeys, putObject } from "@/lib/server/storage";
import { insertClip } from "../../support/clip-rows";
import { call, signIn } from "../../support/http";
import { makeWorld, PASSWORD, type World } from "../../support/world";
import { addBuild, addMeasuredClips } from "./helpers";

let w: World;
let fitter: { cookie: string };
let golfer: { cookie: string };
let mallet: Awaited<ReturnType<typeof addBuild>>;
let putts: Awaited<ReturnType<typeof addMeasuredClips>>;

type Stat = { key: string; summary: { n: number; mean: number; sd: number | null; shareInWindow: number | null }; spread: number | null };
type Build = { id: string; label: string; recording: boolean; putts: { clipId: string; mishit: { reason: string } | null; numbers: { key: string; value: number | null; uncertainty: number | null }[] }[]; summary: Stat[] };
const session = async () => (await call(fitter, "GET", `/api/fittings/${w.own.fitting.id}/session`)).body as { builds: Build[]; leading: { buildId: string } | null; current: { clipId: string } | null };
const face = (b: Build) => b.summary.find((s) => s.key === "face_angle_impact")!;

beforeAll(async () => {
  w = await makeWorld();
  fitter = { cookie: (await signIn(w.fitter.email, PASSWORD)).cookie! };
  golfer = { cookie: (await signIn(w.own.account.email, PASSWORD)).cookie! };
  await db.update(schema.studios).set({ settings: { ...w.studioA.settings, windows: { face_angle_impact: { min: -1, max: 1 } } } }).where(eq(schema.studios.id, w.studioA.id));
  mallet = await addBuild(w, "Mallet");
  putts = await addMeasuredClips(w, w.own.build, [{ face_angle_impact: 0.5 }, { face_angle_impact: -0.5 }, { face_angle_impact: 3 }]);
  await db.update(schema.measurements).set({ uncertainty: 0.2 }).where(eq(schema.measurements.clipId, putts[0]!.id));
});

describe("GET /api/fittings/{id}/session", () => {
  it("lists builds in order with every putt, its numbers with their ± and the running summary", async () => {
    expect((await call(fitter, "PUT", `/api/fittings/${w.own.fitting.id}/recording`, { buildId: mallet.id })).status).toBe(200);
    const s = await session();
    expect(s.builds.map((b) => [b.label, b.recording])).toEqual([["Baseline", false], ["Mallet", true]]);
    const [base] = s.builds;
    expect(base!.putts.map((p) => p.clipId)).toEqual(putts.map((p) => p.id));
    expect(base!.putts[0]!.numbers.find((n) => n.key === "face_angle_impact")).toMatchObject({ value: 0.5, uncertainty: 0.2 });
    // 0.5, −0.5, 3: n 3, mean 1; deviations −0.5, −1.5, 2 → Σd² = 6.5, sd √(6.5/2); inside [−1, 1]: 2 of 3
    expect(face(base!).summary).toMatchObject({ n: 3, mean: 1, shareInWindow: 2 / 3 });
    expect(face(base!).summary.sd).toBeCloseTo(Math.sqrt(3.25), 12);
    expect(s.current?.clipId).toBe(putts[2]!.id);
  });

  it("is refused to another studio and to a golfer's other fitting", async () => {
    const other = { cookie: (await signIn(w.otherAdmin.email, PASSWORD)).cookie! };
    expect((await call(other, "GET", `/api/fittings/${w.own.fitting.id}/session`)).status).toBe(404);
    expect((await call(golfer, "GET", `/api/fittings/${w.sibling.fitting.id}/session`)).status).toBe(404);
  });
});

describe("PATCH /api/clips/{id}: mishit", () => {
  it("sets a putt aside with its reason: left out of the session summary, the comparison and the CSV, and back with null", async () => {
    const id = putts[2]!.id;
    const res = await call(fitter, "PATCH", `/api/clips/${id}`, { mishit: { reason: "caught the heel" } });
    expect(res.status).toBe(200);
    expect(res.body.clip.mishit).toMatchObject({ reason: "caught the heel" });
    expect(res.body.changedClipIds).toEqual([id]);
    const [base] = (await session()).builds;
    expect(base!.putts.find((p) => p.clipId === id)!.mishit).toEqual({ reason: "caught the heel" });
    // 0.5 and −0.5: n 2, mean 0, both inside
    expect(face(base!).summary).toMatchObject({ n: 2, mean: 0, shareInWindow: 1 });
    const comparison = await call(fitter, "GET", `/api/fittings/${w.own.fitting.id}/comparison`);
    expect(comparison.body.builds[0].stats.find((s: Stat) => s.key === "face_angle_impact").summary.n).toBe(2);
    const csv = await call(fitter, "GET", `/api/fittings/${w.own.fitting.id}/csv`);
    expect(String(csv.body)).not.toContain(id);
    expect(String(csv.body)).toContain(putts[0]!.id);

    expect((await call(fitter, "PATCH", `/api/clips/${id}`, { mishit: null })).body.clip.mishit).toBeNull();
    expect(face((await session()).builds[0]!).summary.n).toBe(3);
  });

  it("refuses an empty reason, an unknown field and a golfer", async () => {
    const id = putts[0]!.id;
    const empty = await call(fitter, "PATCH", `/api/clips/${id}`, { mishit: { reason: " " } });
    expect(empty.status).toBe(400);
    expect(empty.body.error.code).toBe("validation_failed");
    expect((await call(fitter, "PATCH", `/api/clips/${id}`, { mishit: true })).status).toBe(400);
    expect((await call(fitter, "PATCH", `/api/clips/${id}`, { build: mallet.id })).status).toBe(400);
    expect((await call(golfer, "PATCH", `/api/clips/${id}`, { mishit: { reason: "no" } })).status).toBe(403);
  });
});

describe("PATCH /api/clips/{id}: buildId", () => {
  it("moves a putt with its stroke and the stroke's other views; its numbers are recomputed and the summaries follow", async () => {
    const [stroke] = await db.insert(schema.strokes).values({ studioId: w.studioA.id, buildId: w.own.build.id, position: 1 }).returning();
    const overhead = await insertClip(w.own, { view: "overhead", impactFrame: 300, strokeId: stroke!.id, createdAt: new Date(Date.UTC(2026, 0, 2)) });
    const faceOn = await insertClip(w.own, { view: "face-on", impactFrame: 300, strokeId: stroke!.id, createdAt: new Date(Date.UTC(2026, 0, 2)) });
    // Target straight up the image; at impact the face's normal 2° to the image's right: face angle +2° (open).
    const rad = (d: number) => (d * Math.PI) / 180;
    const f = [Math.cos(rad(2)), Math.sin(rad(2))];
    for (const mark of [
      { frame: 0, kind: "line", role: "target", points: [[640, 600], [640, 100]] },
      { frame: 300, kind: "line", role: "face", points: [[640 - 40 * f[0]!, 500 - 40 * f[1]!], [640 + 40 * f[0]!, 500 + 40 * f[1]!]] },
    ]) expect((await call(fitter, "POST", `/api/clips/${overhead.id}/marks`, mark)).status).toBe(201);
    const before = (await db.select().from(schema.clips).where(eq(schema.clips.id, overhead.id)))[0]!.measureRevision;

    const res = await call(fitter, "PATCH", `/api/clips/${overhead.id}`, { buildId: mallet.id });
    expect(res.status).toBe(200);
    expect(res.body.clip.buildId).toBe(mallet.id);
    expect([...res.body.changedClipIds].sort()).toEqual([overhead.id, faceOn.id].sort());
    const [movedStroke] = await db.select().from(schema.strokes).where(eq(schema.strokes.id, stroke!.id));
    expect(movedStroke!.buildId).toBe(mallet.id);
    // The build's loft is an input: the move bumps the revision and the numbers are stored anew.
    const [moved] = await db.select().from(schema.clips).where(eq(schema.clips.id, overhead.id));
    expect(moved!.measureRevision).toBe(before + 1);
    const [base, m] = (await session()).builds;
    expect(m!.putts.map((p) => p.clipId).sort()).toEqual([overhead.id, faceOn.id].sort());
    expect(face(m!).summary.n).toBe(1);
    expect(face(m!).summary.mean).toBeCloseTo(2, 6);
    expect(face(base!).summary.n).toBe(3);
  });

  it("refuses a build of another fitting", async () => {
    const res = await call(fitter, "PATCH", `/api/clips/${putts[0]!.id}`, { buildId: w.sibling.build.id });
    expect(res.status).toBe(404);
    expect(res.body.error.message).toContain("No such build in this fitting");
  });
});

describe("DELETE /api/clips/{id}", () => {
  it("deletes the putt, its rows and its files in the store; a stroke left empty goes too", async () => {
    const [doomed] = await addMeasuredClips(w, mallet, [{ face_angle_impact: 9 }], "overhead", Date.UTC(2026, 0, 3));
    const [stroke] = await db.insert(schema.strokes).values({ studioId: w.studioA.id, buildId: mallet.id, position: 9 }).returning();
    await db.update(schema.clips).set({ strokeId: stroke!.id }).where(eq(schema.clips.id, doomed!.id));
    await putObject(`${clipPrefix(w.studioA.id, doomed!.id)}source`, "x", "video/mp4");
    await putObject(`${clipPrefix(w.studioA.id, doomed!.id)}frames/000000.jpg`, "x", "image/jpeg");
    expect((await call(golfer, "DELETE", `/api/clips/${doomed!.id}`)).status).toBe(403);

    const res = await call(fitter, "DELETE", `/api/clips/${doomed!.id}`);
    expect(res.status).toBe(200);
    expect(res.body).toMatchObject({ deleted: true, files: 2 });
    expect(await listKeys(clipPrefix(w.studioA.id, doomed!.id))).toEqual([]);
    expect(await db.select().from(schema.measurements).where(eq(schema.measurements.clipId, doomed!.id))).toEqual([]);
    expect(await db.select().from(schema.strokes).where(eq(schema.strokes.id, stroke!.id))).toEqual([]);
    expect((await call(fitter, "GET", `/api/clips/${doomed!.id}`)).status).toBe(404);
    expect((await call(fitter, "DELETE", `/api/clips/${doomed!.id}`)).status).toBe(404);
  });

  it("drops an unfinished multipart upload with the clip (the local fake store cannot abort; real S3 does)", async () => {
    const registered = await call(fitter, "POST", "/api/clips", {
      fittingId: w.own.fitting.id, buildId: mallet.id, view: "overhead", fileName: "big.mp4", contentType: "video/mp4", sizeBytes: 50_000_000, consentConfirmed: true,
    });
    const id = registered.body.clip.id as string;
    const parts = await call(fitter, "POST", `/api/clips/${id}/parts`, { partNumbers: [1, 2] });
    const [row] = await db.select().from(schema.clips).where(eq(schema.clips.id, id));
    expect(row!.multipartUploadId).toBe(parts.body.uploadId);
    const res = await call(fitter, "DELETE", `/api/clips/${id}`);
    expect(res.status).toBe(200);
    // s3rver answers AbortMultipartUpload with 405: the bucket's lifecycle rule is the backstop there.
    expect(["aborted", "unsupported"]).toContain(res.body.multipartUpload);
  });
});

describe("studio-screen link", () => {
  it("shows only its own fitting, without a sign-in, until it expires or is replaced", async () => {
    expect((await call(golfer, "POST", `/api/fittings/${w.own.fitting.id}/studio-screen`)).status).toBe(403);
    const made = await call(fitter, "POST", `/api/fittings/${w.own.fitting.id}/studio-screen`);
    expect(made.status).toBe(201);
    const [, , fittingId, token] = (made.body.path as string).split("/");
    expect(fittingId).toBe(w.own.fitting.id);
    const hours = (new Date(made.body.expiresAt).getTime() - Date.now()) / 3600_000;
    expect(hours).toBeGreaterThan(11.9);
    expect(hours).toBeLessThanOrEqual(12);

    const shown = await call(null, "GET", `/api/screen/${fittingId}/${token}`);
    expect(shown.status).toBe(200);
    expect(shown.body.builds.map((b: Build) => b.label)).toEqual(["Baseline", "Mallet"]);
    expect(JSON.stringify(shown.body)).not.toContain("putt-1.mp4"); // no file names on the golfer's screen

    const elsewhere = await call(null, "GET", `/api/screen/${w.sibling.fitting.id}/${token}`);
    expect(elsewhere.status).toBe(403);
    expect(elsewhere.body.error.issues).toEqual({ refusal: "other-fitting" });
    expect((await call(null, "GET", `/api/screen/${fittingId}/${"x".repeat(43)}`)).status).toBe(404);
    const page = await fetch(`${process.env.TEST_BASE_URL}/screen/${w.sibling.fitting.id}/${token}`);
    expect(await page.text()).toContain("belongs to another fitting");

    await db.update(schema.studioScreenLinks).set({ expiresAt: new Date(Date.now() - 1000) }).where(and(eq(schema.studioScreenLinks.fittingId, w.own.fitting.id)));
    const expired = await call(null, "GET", `/api/screen/${fittingId}/${token}`);
    expect(expired.status).toBe(403);
    expect(expired.body.error.issues).toEqual({ refusal: "expired" });

    const first = await call(fitter, "POST", `/api/fittings/${w.own.fitting.id}/studio-screen`);
    const second = await call(fitter, "POST", `/api/fittings/${w.own.fitting.id}/studio-screen`);
    expect((await call(null, "GET", first.body.path.replace("/screen/", "/api/screen/"))).status).toBe(403);
    expect((await call(null, "GET", second.body.path.replace("/screen/", "/api/screen/"))).status).toBe(200);
    await db.update(schema.fittings).set({ status: "completed" }).where(eq(schema.fittings.id, w.own.fitting.id));
    const completed = await call(null, "GET", second.body.path.replace("/screen/", "/api/screen/"));
    expect(completed.body.error.issues).toEqual({ refusal: "completed" });
    await db.update(schema.fittings).set({ status: "in_progress" }).where(eq(schema.fittings.id, w.own.fitting.id));
  });
});
