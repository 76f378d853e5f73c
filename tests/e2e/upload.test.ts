// A fitter drops two generated clips on the fitting page and watches them become ready.
import { mkdtemp } from "node:fs/promises";
import { tmpdir } from "node:os";
import path from "node:path";
import type { Browser } from "playwright-core";
import { afterAll, beforeAll, expect, it } from "vitest";
import { generateClip } from "../fixtures/generate-clips";
import { launchBrowser, submitSignIn } from "../support/browser";
import { BASE } from "../support/http";
import { makeWorld, PASSWORD, type World } from "../support/world";

let browser: Browser;
let w: World;
let files: string[];

beforeAll(async () => {
  [browser, w] = await Promise.all([launchBrowser(), makeWorld()]);
  const dir = await mkdtemp(path.join(tmpdir(), "fitframe-e2e-upload-"));
  files = [path.join(dir, "putt-a.mp4"), path.join(dir, "putt-b.mp4")];
  for (const [i, file] of files.entries()) {
    await generateClip(file, {
      width: 320, height: 180, fps: 240, frameCount: 150, impactFrame: 90 + i,
      faceAngleAddressDeg: 0.5, faceAngleImpactDeg: -0.5, ballSpeedPxPerFrame: 2, startDirectionDeg: 0,
    });
  }
});
afterAll(async () => {
  await browser?.close();
});

it("drops two clips, sees progress and both ready", async () => {
  const page = await browser.newPage();
  await submitSignIn(page, w.fitter.email, PASSWORD);
  await page.waitForURL(`${BASE}/studio`);

  await page.goto(`${BASE}/studio/fittings/${w.own.fitting.id}`);
  await page.getByRole("checkbox", { name: /agreed to be filmed/ }).check();
  await page.getByLabel("Clip files").setInputFiles(files);

  for (const name of ["putt-a.mp4", "putt-b.mp4"]) {
    await page.locator(`[data-clip-name="${name}"][data-clip-state="ready"]`).waitFor({ timeout: 90_000 });
  }
  const posters = page.locator('[data-clip-state="ready"] img');
  expect(await posters.count()).toBe(2);
  await page.close();
});
