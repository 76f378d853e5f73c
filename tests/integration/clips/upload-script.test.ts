// The capture computer's path: `npm run upload` with a Bearer token, no browser.
import { execFile } from "node:child_process";
import { mkdtemp } from "node:fs/promises";
import { tmpdir } from "node:os";
import path from "node:path";
import { promisify } from "node:util";
import { expect, it } from "vitest";
import { generateClip } from "../../fixtures/generate-clips";
import { BASE } from "../../support/http";
import { makeWorld, tokenFor } from "../../support/world";

const run = promisify(execFile);

it("uploads two files and waits until both are ready", async () => {
  const w = await makeWorld();
  const token = await tokenFor(w.fitter.id);
  const dir = await mkdtemp(path.join(tmpdir(), "fitframe-upload-"));
  const files = [path.join(dir, "putt-1.mp4"), path.join(dir, "putt-2.mov")];
  for (const [i, file] of files.entries()) {
    await generateClip(file, {
      width: 320, height: 180, fps: 240, frameCount: 120, impactFrame: 70 + i, container: i === 0 ? "mp4" : "mov",
      faceAngleAddressDeg: 0, faceAngleImpactDeg: 1, ballSpeedPxPerFrame: 2, startDirectionDeg: 0,
    });
  }
  const { stdout } = await run("npx", ["tsx", "scripts/upload.ts", "--fitting", w.own.fitting.id, "--build", w.own.build.id, "--view", "overhead", "--fps", "240", "--consent", "--wait", ...files], {
    env: { ...process.env, FITFRAME_TOKEN: token.value, FITFRAME_URL: BASE },
    timeout: 90_000,
  });
  const ready = stdout.split("\n").filter((line) => line.endsWith("\tready"));
  expect(ready.map((line) => line.split("\t")[0]).sort()).toEqual(["putt-1.mp4", "putt-2.mov"]);
});

it("refuses without a valid token", async () => {
  const w = await makeWorld();
  const dir = await mkdtemp(path.join(tmpdir(), "fitframe-upload-"));
  const file = path.join(dir, "putt.mp4");
  await generateClip(file, { width: 160, height: 90, fps: 240, frameCount: 40, impactFrame: 20, faceAngleAddressDeg: 0, faceAngleImpactDeg: 0, ballSpeedPxPerFrame: 1, startDirectionDeg: 0 });
  const result = await run("npx", ["tsx", "scripts/upload.ts", "--fitting", w.own.fitting.id, "--build", w.own.build.id, "--consent", file], {
    env: { ...process.env, FITFRAME_TOKEN: "ff_not_a_real_token", FITFRAME_URL: BASE },
  }).catch((err: { code: number; stderr: string }) => err);
  expect((result as { code: number }).code).toBe(1);
  expect((result as { stderr: string }).stderr).toContain("Sign in first");
});
