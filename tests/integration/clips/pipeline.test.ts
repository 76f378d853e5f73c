// Clip pipeline end to end through the real API, the S3 fake, pg-boss and Debian's ffmpeg.
import { mkdtemp, writeFile } from "node:fs/promises";
import { tmpdir } from "node:os";
import path from "node:path";
import { eq, sql } from "drizzle-orm";
import { beforeAll, describe, expect, it } from "vitest";
import { db, schema } from "@/db";
import { clipPrefix, listKeys } from "@/lib/server/storage";
import { generateBadFile, generateClip, type ClipOptions } from "../../fixtures/generate-clips";
import { ffprobeDuration, ffprobeFrameCount, uploadClip, waitForClip } from "../../support/clips";
import { BASE, call, signIn, type Auth } from "../../support/http";
import { makeWorld, PASSWORD, tokenFor, type World } from "../../support/world";

const small: ClipOptions = {
  width: 320, height: 180, fps: 240, frameCount: 300, impactFrame: 190,
  faceAngleAddressDeg: 0, faceAngleImpactDeg: 2, ballSpeedPxPerFrame: 3, startDirectionDeg: 1.5,
};

let w: World;
let fitter: Auth;
let dir: string;

beforeAll(async () => {
  w = await makeWorld();
  fitter = { token: (await tokenFor(w.fitter.id)).value };
  dir = await mkdtemp(path.join(tmpdir(), "fitframe-pipeline-"));
});

const target = () => ({ fittingId: w.own.fitting.id, buildId: w.own.build.id });

describe("a generated clip becomes ready", () => {
  let clipId: string;
  let file: string;

  beforeAll(async () => {
    file = path.join(dir, "stroke.mp4");
    await generateClip(file, small);
    const up = await uploadClip(fitter, file, { ...target(), captureFps: 240 });
    clipId = up.clipId;
    expect(up.complete.body).toMatchObject({ state: "queued", queued: true });
  });

  it("queues one job only, however often completion is called", async () => {
    const again = await call(fitter, "POST", `/api/clips/${clipId}/complete`);
    expect(again.status).toBe(200);
    expect(again.body.queued).toBe(false);
    const jobs = await db.execute<{ n: number }>(sql`select count(*)::int as n from pgboss.job where name = 'clip-process' and data->>'clipId' = ${clipId}`);
    expect(jobs.rows[0]!.n).toBe(1);
  });

  it("reaches ready through queued/processing with rising progress", async () => {
    const { clip, seen } = await waitForClip(fitter, w.own.fitting.id, clipId);
    expect(clip.state).toBe("ready");
    const progress = seen.filter((s) => s.state === "processing").map((s) => s.progress);
    expect(progress).toEqual([...progress].sort((a, b) => a - b));
    expect(seen.at(-1)).toEqual({ state: "ready", progress: 100 });
  });

  it("counts the frames Debian's ffprobe counts (reference: ffprobe -count_frames)", async () => {
    const [row] = await db.select().from(schema.clips).where(eq(schema.clips.id, clipId));
    expect(row!.frameCount).toBe(await ffprobeFrameCount(file));
    const keys = await listKeys(clipPrefix(w.studioA.id, clipId));
    expect(keys.filter((k) => k.includes("/frames/")).length).toBe(row!.frameCount);
    expect(keys.filter((k) => !k.includes("/frames/")).sort().map((k) => k.split("/").at(-1))).toEqual(["poster.jpg", "proxy.mp4", "source", "strip.jpg"]);
  });

  it("suggests the impact frame within one frame of the truth", async () => {
    const [row] = await db.select().from(schema.clips).where(eq(schema.clips.id, clipId));
    expect(Math.abs(row!.suggestedImpactFrame! - small.impactFrame)).toBeLessThanOrEqual(1);
    expect(row!.motionSignal!.length).toBe(small.frameCount);
  });

  it("times the phone proxy at capture rate ÷ slow-motion factor (reference: ffprobe duration)", async () => {
    const [row] = await db.select().from(schema.clips).where(eq(schema.clips.id, clipId));
    const res = await call(fitter, "GET", `/api/clips/${clipId}/media/proxy`);
    expect(res.status).toBe(302);
    const proxy = path.join(dir, "proxy.mp4");
    await writeFile(proxy, Buffer.from(await (await fetch(res.headers.get("location")!)).arrayBuffer()));
    const playbackFps = row!.captureFps / row!.slowMotionFactor;
    expect(Math.abs((await ffprobeDuration(proxy)) - row!.frameCount! / playbackFps)).toBeLessThanOrEqual(1 / playbackFps + 1e-6);
  });

  it("serves frames only to people who may see the clip", async () => {
    const ownGolfer = (await signIn(w.own.account.email, PASSWORD)).cookie!;
    const otherGolfer = (await signIn(w.other.account.email, PASSWORD)).cookie!;
    const mine = await call({ cookie: ownGolfer }, "GET", `/api/clips/${clipId}/frames/10`);
    expect(mine.status).toBe(302);
    expect(mine.headers.get("cache-control")).toContain("private");
    const jpeg = await fetch(mine.headers.get("location")!);
    expect(jpeg.headers.get("content-type")).toBe("image/jpeg");
    for (const path of [`/api/clips/${clipId}/frames/10`, `/api/clips/${clipId}/media/poster`, `/api/clips/${clipId}/media/strip`, `/api/clips/${clipId}/media/proxy`]) {
      expect((await call({ cookie: otherGolfer }, "GET", path)).status).toBe(404);
    }
    expect((await call(fitter, "GET", `/api/clips/${clipId}/frames/300`)).status).toBe(404);
    expect((await fetch(`${BASE}/api/clips/${clipId}/frames/10`, { redirect: "manual" })).status).toBe(401);
  });
});

describe("unusable files end failed with a reason and leave nothing behind", () => {
  const cases: [Parameters<typeof generateBadFile>[1], RegExp][] = [
    ["text", /not a video|no video|could not be read|not recogni/i],
    ["empty", /empty/i],
    ["truncated", /incomplete|truncated|cut short/i],
    ["audio-only", /sound but no picture|no video/i],
    ["still-image", /still picture/i],
  ];
  for (const [kind, reason] of cases) {
    it(`${kind} file`, async () => {
      const good = path.join(dir, "good-for-truncation.mp4");
      if (kind === "truncated") await generateClip(good, small);
      const file = path.join(dir, `bad-${kind}.mp4`);
      await generateBadFile(file, kind, good);
      const { clipId } = await uploadClip(fitter, file, target());
      const { clip } = await waitForClip(fitter, w.own.fitting.id, clipId);
      expect(clip.state).toBe("failed");
      expect(clip.failureReason).toMatch(reason);
      expect(await listKeys(clipPrefix(w.studioA.id, clipId))).toEqual([]);
    });
  }
});

describe("upload checks", () => {
  it("refuses completion before the file arrived, and a size that differs from the declared one", async () => {
    const created = await call(fitter, "POST", "/api/clips", { ...target(), view: "overhead", fileName: "a.mp4", contentType: "video/mp4", sizeBytes: 1000, consentConfirmed: true });
    expect(created.status).toBe(201);
    expect(created.body.clip.objectKey).not.toContain("a.mp4");
    const early = await call(fitter, "POST", `/api/clips/${created.body.clip.id}/complete`);
    expect(early.status).toBe(409);
    await fetch(created.body.upload.url, { method: "PUT", headers: created.body.upload.headers, body: Buffer.alloc(10) });
    const wrong = await call(fitter, "POST", `/api/clips/${created.body.clip.id}/complete`);
    expect(wrong.status).toBe(422);
    expect(wrong.body.error.message).toContain("declared");
  });

  it("refuses a file over the size limit (413) and an upload without consent (422)", async () => {
    const big = await call(fitter, "POST", "/api/clips", { ...target(), view: "overhead", fileName: "big.mp4", contentType: "video/mp4", sizeBytes: 2 * 1024 ** 3, consentConfirmed: true });
    expect(big.status).toBe(413);
    const noConsent = await call(fitter, "POST", "/api/clips", { fittingId: w.sibling.fitting.id, buildId: w.sibling.build.id, view: "overhead", fileName: "x.mp4", contentType: "video/mp4", sizeBytes: 10 });
    expect(noConsent.status).toBe(422);
    expect(noConsent.body.error.message).toMatch(/consent/);
  });
});
