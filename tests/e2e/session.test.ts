// The live session in Chromium: the number keys switch the recording build and the watcher's next
// putt lands there; the session list and the studio screen follow without a reload; setting a putt
// aside changes the summary; the studio-screen link refuses another fitting and an expired link.
import { copyFile, mkdir, mkdtemp } from "node:fs/promises";
import { tmpdir } from "node:os";
import path from "node:path";
import { eq } from "drizzle-orm";
import type { Browser, Page } from "playwright-core";
import { afterAll, beforeAll, expect, it } from "vitest";
import { db, schema } from "@/db";
import { generateClip } from "../fixtures/generate-clips";
import { addBuild, addMeasuredClips } from "../integration/fitting/helpers";
import { launchBrowser, submitSignIn } from "../support/browser";
import { BASE } from "../support/http";
import { sentLine, startWatcher, stopWatchers } from "../support/watcher";
import { makeWorld, PASSWORD, tokenFor, type World } from "../support/world";

let browser: Browser;
let w: World;

beforeAll(async () => {
  [browser, w] = await Promise.all([launchBrowser(), makeWorld()]);
});
afterAll(async () => {
  stopWatchers();
  await browser?.close();
});

const statN = (page: Page, build: string) => page.locator(`[data-build-label="${build}"] [data-stat="face_angle_impact"] [data-testid="stat-n"]`);

it("runs a session: recording by number key, putts and summaries live, mishit, studio screen", { timeout: 180_000 }, async () => {
  const mallet = await addBuild(w, "Mallet");
  await db.update(schema.fittings).set({ consentConfirmedAt: new Date() }).where(eq(schema.fittings.id, w.own.fitting.id));
  // Three measured putts of the baseline (0.5, −0.5, 3: n 3).
  await addMeasuredClips(w, w.own.build, [{ face_angle_impact: 0.5 }, { face_angle_impact: -0.5 }, { face_angle_impact: 3 }]);

  const page = await browser.newPage();
  await submitSignIn(page, w.fitter.email, PASSWORD);
  await page.waitForURL((u) => u.pathname !== "/sign-in");
  await page.goto(`${BASE}/studio/fittings/${w.own.fitting.id}`);
  await expect.poll(() => statN(page, "Baseline").textContent()).toBe("3");

  // Key 2: Mallet records; the server knows it.
  await page.keyboard.press("2");
  await page.locator('[data-build-label="Mallet"][data-recording="true"]').waitFor();
  await expect.poll(async () => (await db.select().from(schema.fittings).where(eq(schema.fittings.id, w.own.fitting.id)))[0]!.recordingBuildId).toBe(mallet.id);

  // The studio screen, opened by its link in a browser with no sign-in.
  await page.getByRole("button", { name: "Studio-screen link" }).click();
  const href = await page.getByTestId("studio-screen-link").getAttribute("href");
  const screenContext = await browser.newContext();
  const screen = await screenContext.newPage();
  await screen.goto(href!);
  await screen.getByTestId("studio-screen").waitFor();
  await expect.poll(() => screen.locator('[data-build-label="Baseline"] [data-testid="screen-n"]').textContent()).toBe("3");

  // The capture computer's next putt goes to the recording build and shows on both screens by itself.
  const dir = await mkdtemp(path.join(tmpdir(), "fitframe-e2e-session-"));
  await mkdir(path.join(dir, "overhead"));
  const staged = path.join(await mkdtemp(path.join(tmpdir(), "fitframe-e2e-src-")), "putt.mp4");
  await generateClip(staged, { width: 320, height: 180, fps: 240, frameCount: 60, impactFrame: 35, ballSpeedPxPerFrame: 2, faceAngleAddressDeg: 0, faceAngleImpactDeg: 1, startDirectionDeg: 0.8, seed: 11 });
  const token = await tokenFor(w.fitter.id);
  const watcher = await startWatcher(dir, w.own.fitting.id, token.value);
  await copyFile(staged, path.join(dir, "overhead", "putt-4.mp4"));
  await sentLine(watcher, path.join("overhead", "putt-4.mp4"));
  await page.locator('[data-build-label="Mallet"] [data-putt]').first().waitFor();
  await page.locator('[data-build-label="Mallet"] [data-putt-state="ready"]').waitFor({ timeout: 60_000 });
  await expect.poll(() => screen.getByTestId("current-putt").textContent()).toContain("Mallet · putt 1");

  // Another baseline putt measured elsewhere: both screens count it without a reload.
  await addMeasuredClips(w, w.own.build, [{ face_angle_impact: 0 }], "overhead", Date.UTC(2026, 0, 1, 11));
  await expect.poll(() => statN(page, "Baseline").textContent()).toBe("4");
  await expect.poll(() => screen.locator('[data-build-label="Baseline"] [data-testid="screen-n"]').textContent()).toBe("4");

  // Set the third baseline putt aside: the summary drops to three putts, on the studio screen too.
  const third = page.locator('[data-build-label="Baseline"] [data-putt]').nth(2);
  await third.getByText("Correct this putt").click();
  await third.getByLabel("Why set aside").fill("topped it");
  await third.getByRole("button", { name: "Set aside" }).click();
  await third.getByTestId("mishit-reason").filter({ hasText: "topped it" }).waitFor();
  await expect.poll(() => statN(page, "Baseline").textContent()).toBe("3");
  await expect.poll(() => screen.locator('[data-build-label="Baseline"] [data-testid="screen-n"]').textContent()).toBe("3");

  // The link shows nothing for another fitting, nor once it has expired.
  const url = new URL(href!);
  const [, , , token2] = url.pathname.split("/");
  await screen.goto(`${BASE}/screen/${w.sibling.fitting.id}/${token2}`);
  await screen.locator('[data-refusal="other-fitting"]').waitFor();
  await db.update(schema.studioScreenLinks).set({ expiresAt: new Date(Date.now() - 1000) }).where(eq(schema.studioScreenLinks.fittingId, w.own.fitting.id));
  await screen.goto(href!);
  await screen.locator('[data-refusal="expired"]').getByText("expired").waitFor();
  await screenContext.close();
});
