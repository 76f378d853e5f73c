// The review screen inside a fitting, in Chromium at 1280×720: the header says whose putt it is,
// ] and [ go to the next and previous putt across builds, back leads to the fitting, time reads
// relative to impact, playback advances frames and Space pauses it, the target line carries over
// to the next putt of an unmoved camera and can be moved, the readout panel scrolls, and the fitter
// reads and answers a golfer's comment from the review screen.
import type { Browser, BrowserContext, Page } from "playwright-core";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { db, schema } from "@/db";
import type { Vec2 } from "@/lib/geometry/vector";
import { imageToScreen, type Viewport } from "@/lib/review/viewport";
import { launchBrowser, submitSignIn } from "../support/browser";
import { BASE, call, signIn, type Auth } from "../support/http";
import { makeReadyClip } from "../support/ready-clip";
import { makeWorld, PASSWORD, type World } from "../support/world";

type Mark = { id: string; frame: number; kind: string; role: string; points: [number, number][]; version: number };

let browser: Browser;
let context: BrowserContext;
let w: World;
let api: Auth;
const clipIds: { a1: string; a2: string; b1: string } = { a1: "", a2: "", b1: "" };

beforeAll(async () => {
  [browser, w] = await Promise.all([launchBrowser(), makeWorld()]);
  const [blade] = await db.insert(schema.builds).values({ studioId: w.studioA.id, fittingId: w.own.fitting.id, position: 2, label: "Blade 34" }).returning();
  const base = { studioId: w.studioA.id, fittingId: w.own.fitting.id, createdBy: w.fitter.id };
  clipIds.a1 = (await makeReadyClip({ ...base, buildId: w.own.build.id })).id;
  clipIds.a2 = (await makeReadyClip({ ...base, buildId: w.own.build.id })).id;
  clipIds.b1 = (await makeReadyClip({ ...base, buildId: blade!.id })).id;
  api = { cookie: (await signIn(w.fitter.email, PASSWORD)).cookie! };
  // The fitter's target line on the first putt, as drawn by hand.
  const drawn = await call(api, "POST", `/api/clips/${clipIds.a1}/marks`, { frame: 0, kind: "line", role: "target", points: [[320, 340], [320, 40]] });
  expect(drawn.status).toBe(201);
  context = await browser.newContext({ viewport: { width: 1280, height: 720 } });
  const page = await context.newPage();
  await submitSignIn(page, w.fitter.email, PASSWORD);
  await page.waitForURL(`${BASE}/studio`);
  await page.close();
});
afterAll(async () => {
  await browser?.close();
});

async function screenOf(page: Page, p: Vec2): Promise<Vec2> {
  const stage = page.getByTestId("stage");
  const box = (await stage.boundingBox())!;
  const vp = JSON.parse((await stage.getAttribute("data-viewport"))!) as Viewport;
  const s = imageToScreen(vp, p);
  return [box.x + s[0], box.y + s[1]];
}
const marksOf = async (id: string): Promise<Mark[]> => (await call(api, "GET", `/api/clips/${id}/marks`)).body.marks;
const frameNumber = async (page: Page) => Number(await page.getByTestId("frame-number").textContent());
const painted = (page: Page) => page.locator("[data-painted-frame]").waitFor();

describe("review inside a fitting", () => {
  let page: Page;

  it("the header names golfer, build, putt and view; ] goes to putt 2, where putt 1's target line is carried (camera unmoved) and can be moved", async () => {
    page = await context.newPage();
    await page.goto(`${BASE}/studio/clips/${clipIds.a1}`);
    await painted(page);
    const title = page.getByTestId("review-title");
    expect(await title.textContent()).toBe(`${w.own.golfer.name} · Baseline · putt 1 · Overhead`);
    await page.keyboard.press("]");
    await page.waitForURL(`${BASE}/studio/clips/${clipIds.a2}`);
    await expect.poll(() => title.textContent()).toBe(`${w.own.golfer.name} · Baseline · putt 2 · Overhead`);
    await painted(page);

    await expect.poll(() => page.getByTestId("notice").textContent(), { timeout: 15_000 }).toContain("Carried the target line from putt 1 of Baseline");
    await expect.poll(async () => (await marksOf(clipIds.a2)).filter((m) => m.role === "target").length).toBe(1);
    const carried = (await marksOf(clipIds.a2)).find((m) => m.role === "target")!;
    expect(carried.points).toEqual([[320, 340], [320, 40]]);
    await page.getByRole("button", { name: "Dismiss" }).click();
    // Select it and drag its far end 30 px right.
    await page.keyboard.press("1");
    const [x, y] = await screenOf(page, [320, 200]);
    await page.mouse.click(x, y);
    await page.getByRole("button", { name: "Delete mark" }).waitFor();
    const a = await screenOf(page, [320, 40]);
    const b = await screenOf(page, [350, 40]);
    await page.mouse.move(a[0], a[1]);
    await page.mouse.down();
    await page.mouse.move(b[0], b[1], { steps: 8 });
    await page.mouse.up();
    await expect.poll(async () => (await marksOf(clipIds.a2)).find((m) => m.role === "target")!.points[1]![0]).toBeGreaterThan(345);
    // Putt 1 keeps its own line.
    expect((await marksOf(clipIds.a1)).find((m) => m.role === "target")!.points[1]).toEqual([320, 40]);
    await page.keyboard.press("Escape");
  });

  it("next goes across builds; [ comes back", async () => {
    const title = page.getByTestId("review-title");
    await page.getByRole("button", { name: "Next putt ›" }).click();
    await page.waitForURL(`${BASE}/studio/clips/${clipIds.b1}`);
    await expect.poll(() => title.textContent()).toBe(`${w.own.golfer.name} · Blade 34 · putt 1 · Overhead`);
    expect(await page.getByRole("button", { name: "Next putt ›" }).isDisabled()).toBe(true);
    await painted(page);
    await page.keyboard.press("[");
    await page.waitForURL(`${BASE}/studio/clips/${clipIds.a2}`);
    await expect.poll(() => title.textContent()).toBe(`${w.own.golfer.name} · Baseline · putt 2 · Overhead`);
    await painted(page);
  });

  it("setting address jumps to the suggested impact; time then reads relative to impact", async () => {
    await page.keyboard.press("Home");
    await page.keyboard.press("Shift+A");
    // The test clip's suggested impact is frame 20 (support/ready-clip.ts: round(30 × 0.66)).
    await expect.poll(() => frameNumber(page)).toBe(20);
    expect(await page.getByTestId("notice").textContent()).toContain("suggested impact");
    await page.keyboard.press("Shift+I");
    await expect.poll(() => page.getByTestId("frame-time").textContent()).toBe("0.0 ms from impact");
    for (let i = 0; i < 3; i++) await page.getByRole("button", { name: "Previous frame" }).click();
    // 3 frames before impact at 240 fps: −3 / 240 s = −12.5 ms.
    await expect.poll(() => page.getByTestId("frame-time").textContent()).toBe("\u221212.5 ms from impact");
  });

  it("play advances the frames; Space pauses and the frame stays", async () => {
    await page.getByLabel("Speed").selectOption({ label: "1/32" });
    await page.getByLabel("Play from frame").fill("0");
    await page.getByLabel("Play to frame").fill("29");
    await page.getByLabel("Play to frame").blur();
    await page.keyboard.press("Home");
    await expect.poll(() => frameNumber(page)).toBe(0);
    await page.keyboard.press("Space");
    await expect.poll(() => page.locator("[data-playing]").getAttribute("data-playing")).toBe("1");
    await expect.poll(() => frameNumber(page), { timeout: 10_000 }).toBeGreaterThan(2);
    await page.keyboard.press("Space");
    await expect.poll(() => page.locator("[data-playing]").getAttribute("data-playing")).toBe("0");
    const stopped = await frameNumber(page);
    // Twenty animation frames later it has not moved.
    await page.evaluate(() => new Promise<void>((done) => {
      let n = 0;
      const tick = () => (++n >= 20 ? done() : requestAnimationFrame(tick));
      requestAnimationFrame(tick);
    }));
    expect(await frameNumber(page)).toBe(stopped);
    // The Play button does the same.
    await page.getByTestId("play").click();
    await expect.poll(() => page.locator("[data-playing]").getAttribute("data-playing")).toBe("1");
    await page.getByTestId("play").click();
    await expect.poll(() => page.locator("[data-playing]").getAttribute("data-playing")).toBe("0");
  });

  it("a point tool shows the loupe and the zoom level; an angle shows its value; the checklist picks the tool", async () => {
    expect(await page.getByTestId("zoom-level").textContent()).toMatch(/^Zoom \d+% \(fit\)$/);
    await page.keyboard.press("3");
    const [x, y] = await screenOf(page, [100, 100]);
    await page.mouse.move(x, y);
    await page.mouse.move(x + 5, y + 5);
    await page.getByTestId("loupe").waitFor();
    await page.keyboard.press("4");
    for (const p of [[400, 100], [300, 100], [300, 0]] as Vec2[]) {
      const [sx, sy] = await screenOf(page, p);
      await page.mouse.click(sx, sy + 1);
    }
    await expect.poll(() => page.getByTestId("angle-value").first().textContent()).toMatch(/^(89|90)\.\d°$/);
    const checklist = page.getByTestId("checklist");
    await checklist.getByRole("button", { name: /Click the ball on frames after impact/ }).click();
    await expect.poll(() => page.getByRole("button", { name: "Ball track" }).getAttribute("aria-pressed")).toBe("true");
    expect(await frameNumber(page)).toBe(21);
  });

  it("at 1280×720 the readout panel scrolls to its last measurement", async () => {
    const panel = page.getByTestId("readout-panel");
    const sizes = await panel.evaluate((el) => ({ scroll: el.scrollHeight, client: el.clientHeight }));
    const last = page.getByTestId("readout-ball_speed");
    await last.scrollIntoViewIfNeeded();
    const box = (await last.boundingBox())!;
    expect(box.y + box.height).toBeLessThanOrEqual(720);
    expect(sizes.client).toBeLessThanOrEqual(720);
  });

  it("the fitter sees a golfer's comment on the home page, jumps to it on the review screen's timeline and answers it", async () => {
    const golfer = { cookie: (await signIn(w.own.account.email, PASSWORD)).cookie! };
    const posted = await call(golfer, "POST", `/api/clips/${clipIds.b1}/comments`, { frame: 7, body: "Why does the face open here?" });
    expect(posted.status).toBe(201);
    await page.goto(`${BASE}/studio`);
    await expect.poll(() => page.getByTestId("unread-summary").getAttribute("data-unread")).toBe("1");
    await page.getByTestId("unread-summary").getByRole("link").first().click();
    await page.waitForURL(`${BASE}/studio/clips/${clipIds.b1}`);
    await painted(page);
    const comments = page.getByTestId("review-comments");
    await comments.getByTestId("comment-thread").waitFor();
    expect(await page.getByTestId("comment-marker").count()).toBe(1);
    await page.getByTestId("comment-marker").click();
    await expect.poll(() => frameNumber(page)).toBe(7);
    await comments.locator("summary", { hasText: "Reply" }).click();
    await comments.getByLabel("Your reply").fill("The toe releases early on this build");
    await comments.getByRole("button", { name: "Send" }).first().click();
    await expect.poll(async () => {
      const list = (await call(api, "GET", `/api/clips/${clipIds.b1}/comments`)).body.threads as { replies: { body: string }[] }[];
      return list[0]?.replies.map((r) => r.body);
    }).toEqual(["The toe releases early on this build"]);
    await comments.getByRole("button", { name: "Resolve" }).click();
    await expect.poll(async () => (await call(api, "GET", `/api/clips/${clipIds.b1}/comments`)).body.threads[0].resolvedAt).not.toBeNull();
  });

  it("back goes to the fitting", async () => {
    await page.getByRole("link", { name: "← Fitting" }).click();
    await page.waitForURL(`${BASE}/studio/fittings/${w.own.fitting.id}`);
  });
});
