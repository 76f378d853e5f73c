// A stroke groups the views of one putt (one clip per view), lined up at impact.
import { mkdtemp } from "node:fs/promises";
import { tmpdir } from "node:os";
import path from "node:path";
import { beforeAll, expect, it } from "vitest";
import { generateClip } from "../../fixtures/generate-clips";
import { uploadClip, waitForClip } from "../../support/clips";
import { call, signIn, type Auth } from "../../support/http";
import { makeWorld, PASSWORD, tokenFor, type World } from "../../support/world";

let w: World;
let fitter: Auth;
let file: string;

beforeAll(async () => {
  w = await makeWorld();
  fitter = { token: (await tokenFor(w.fitter.id)).value };
  file = path.join(await mkdtemp(path.join(tmpdir(), "fitframe-stroke-")), "putt.mp4");
  await generateClip(file, { width: 320, height: 180, fps: 240, frameCount: 160, impactFrame: 100, faceAngleAddressDeg: 0, faceAngleImpactDeg: 1, ballSpeedPxPerFrame: 2, startDirectionDeg: 0.5 });
});

it("takes one clip per view and lines them up at their impact frames", async () => {
  const made = await call(fitter, "POST", `/api/builds/${w.own.build.id}/strokes`);
  expect(made.status).toBe(201);
  expect(made.body.position).toBe(1);
  const strokeId = made.body.id as string;
  const target = { fittingId: w.own.fitting.id, buildId: w.own.build.id, strokeId, captureFps: 240 };

  const overhead = await uploadClip(fitter, file, { ...target, view: "overhead" });
  const faceOn = await uploadClip(fitter, file, { ...target, view: "face-on" });
  const twice = await call(fitter, "POST", "/api/clips", { ...target, view: "overhead", fileName: "again.mp4", contentType: "video/mp4", sizeBytes: 10 });
  expect(twice.status).toBe(409);
  expect(twice.body.error.message).toBe("This stroke already has an overhead clip");

  for (const id of [overhead.clipId, faceOn.clipId]) expect((await waitForClip(fitter, w.own.fitting.id, id)).clip.state).toBe("ready");
  const stroke = await call(fitter, "GET", `/api/strokes/${strokeId}`);
  expect(stroke.status).toBe(200);
  expect(stroke.body.clips.map((c: { view: string }) => c.view).sort()).toEqual(["face-on", "overhead"]);
  for (const clip of stroke.body.clips) {
    expect(Math.abs(clip.impactFrame - 100)).toBeLessThanOrEqual(1);
    expect(clip.impactConfirmed).toBe(false);
  }
  const session = { cookie: (await signIn(w.fitter.email, PASSWORD)).cookie! };
  const page = await call(session, "GET", `/studio/strokes/${strokeId}`);
  expect(page.status).toBe(200);
  expect(page.body).toContain('data-view="overhead"');
  expect(page.body).toContain('data-view="face-on"');
  expect((await call(fitter, "GET", `/api/builds/${w.own.build.id}/strokes`)).body.strokes.map((s: { id: string }) => s.id)).toEqual([strokeId]);
});

it("refuses a stroke of another build", async () => {
  const other = await call(fitter, "POST", `/api/builds/${w.sibling.build.id}/strokes`);
  const res = await call(fitter, "POST", "/api/clips", {
    fittingId: w.own.fitting.id, buildId: w.own.build.id, strokeId: other.body.id, view: "overhead", fileName: "x.mp4", contentType: "video/mp4", sizeBytes: 10, consentConfirmed: true,
  });
  expect(res.status).toBe(404);
  expect(res.body.error.message).toBe("No such stroke in this build");
});
