// The comparison that decides, in Chromium: no make percentage for a build below the minimum of
// putts (5, from the Wilson score interval — Wilson 1927), the steadiest build per measurement
// marked, plots drawn on first paint with the hole inside the fan, and a putt-by-putt table whose
// rows open the clip.
import type { Browser, Page } from "playwright-core";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { launchBrowser, submitSignIn } from "../support/browser";
import { BASE } from "../support/http";
import { makeWorld, PASSWORD, type World } from "../support/world";
import { addBuild, addMeasuredClips } from "../integration/fitting/helpers";

let browser: Browser;
let w: World;
let page: Page;
let firstBladeClip: string;

beforeAll(async () => {
  [browser, w] = await Promise.all([launchBrowser(), makeWorld()]);
  // Baseline: 3 putts (too few for a share); Blade: 5 tighter putts.
  await addMeasuredClips(w, w.own.build, [1.5, -0.6, 2.2].map((v) => ({ face_angle_impact: v, path: v / 2, start_direction: v * 0.8 })));
  const blade = await addBuild(w, "Blade 34");
  const clips = await addMeasuredClips(w, blade, [0.3, -0.2, 0.1, -0.1, 0.2].map((v) => ({ face_angle_impact: v, path: 0.4, start_direction: v })), "overhead", Date.UTC(2026, 0, 1, 11));
  firstBladeClip = clips[0]!.id;
  page = await browser.newPage({ viewport: { width: 1280, height: 900 } });
  await submitSignIn(page, w.fitter.email, PASSWORD);
  await page.waitForURL(`${BASE}/studio`);
});
afterAll(async () => {
  await browser?.close();
});

describe("comparison", () => {
  it("gives no make percentage for a build below 5 putts, and says why", async () => {
    await page.goto(`${BASE}/studio/fittings/${w.own.fitting.id}`);
    await page.getByTestId("make-table").waitFor();
    const rows = page.getByTestId("make-row");
    expect(await rows.count()).toBe(1);
    expect(await rows.first().textContent()).toContain("Blade 34");
    const why = await page.getByTestId("make-too-few").textContent();
    expect(why).toContain("Baseline (3 of 5 putts)");
    expect(why).toContain("Wilson");
  });

  it("draws every plot on first paint, the hole inside the fan", async () => {
    for (const id of ["plot-face", "plot-face-path", "plot-fan"]) {
      expect(await page.getByTestId(id).locator("svg.recharts-surface").count()).toBeGreaterThan(0);
    }
    // The hole's band sits inside the fan's drawing area.
    const fan = page.getByTestId("plot-fan");
    const area = (await fan.locator(".recharts-cartesian-grid").boundingBox())!;
    const hole = (await fan.locator(".recharts-reference-area").first().boundingBox())!;
    expect(hole.y).toBeGreaterThanOrEqual(area.y - 1);
    expect(hole.x).toBeGreaterThan(area.x);
    expect(hole.x + hole.width).toBeLessThan(area.x + area.width);
  });

  it("marks the steadiest build per measurement and writes signed means with their side", async () => {
    const marked = page.getByTestId("steadiest");
    expect(await marked.count()).toBeGreaterThan(0);
    const row = page.locator("tr[data-best]").first();
    expect(await row.textContent()).toContain("Blade 34");
  });

  it("lists putt by putt with words, and a row opens the clip", async () => {
    const rows = page.getByTestId("putt-row");
    expect(await rows.count()).toBe(8);
    // Baseline putt 2: face −0.6 → "−0.6° closed" (true minus, side in words).
    expect(await rows.nth(1).textContent()).toContain("\u22120.6° closed");
    await rows.nth(3).locator("td").first().click();
    await page.waitForURL(`${BASE}/studio/clips/${firstBladeClip}`);
  });
});
