// The golfer's phone in Chromium (375×812, touch): signs in from the e-mailed invitation, opens
// a clip processed by the real pipeline, sees a mark drawn on its own frame during playback,
// steps frames by swipe, reads a coach's comment and jumps to it; then a coach comments at a
// frame in the browser and the golfer receives the e-mail.
import { mkdtemp } from "node:fs/promises";
import path from "node:path";
import { eq } from "drizzle-orm";
import type { Browser, BrowserContext, Page } from "playwright-core";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { db, schema } from "@/db";
import { generateClip } from "../fixtures/generate-clips";
import { launchBrowser, submitSignIn } from "../support/browser";
import { uploadClip, waitForClip } from "../support/clips";
import { BASE, call, signIn, type Auth } from "../support/http";
import { makeWorld, PASSWORD, type World } from "../support/world";
import { inviteTokenIn, waitForMail } from "../integration/invitations/mail";

const MARK_FRAME = 150;
const COMMENT_FRAME = 140;
const FACE_COLOUR = [0xf5, 0xa5, 0x24];
const NEW_PASSWORD = "phone password 2026";

let browser: Browser;
let phone: BrowserContext;
let page: Page;
let w: World;
let fitter: Auth;
let clipId: string;
let markId: string;
let golferEmail: string;
let fittingId: string;
let chosenClipId: string;
const CHOSEN_IMPACT = 120;

const frameNow = async (p: Page) => Number(await p.getByTestId("current-frame").textContent());
const waitFrame = (p: Page, test: string) => p.waitForFunction(`(() => { const n = Number(document.querySelector('[data-testid=current-frame]')?.textContent); return ${test}; })()`, undefined, { timeout: 20_000 });
const noSideScroll = (p: Page) => p.evaluate(() => document.documentElement.scrollWidth <= window.innerWidth);

beforeAll(async () => {
  [browser, w] = await Promise.all([launchBrowser(), makeWorld()]);
  fitter = { cookie: (await signIn(w.fitter.email, PASSWORD)).cookie! };
  // A golfer without an account yet, with one fitting and two builds.
  golferEmail = `phone.${w.tag}@test.fitframe`;
  const [golfer] = await db.insert(schema.golfers).values({ studioId: w.studioA.id, name: `Nell Phone ${w.tag}`, email: golferEmail, videoConsentAt: new Date(), videoConsentBy: "golfer" }).returning();
  const [fitting] = await db.insert(schema.fittings).values({ studioId: w.studioA.id, golferId: golfer!.id, fitterUserId: w.fitter.id, scheduledAt: new Date(), consentConfirmedAt: new Date() }).returning();
  fittingId = fitting!.id;
  const [build] = await db.insert(schema.builds).values({ studioId: w.studioA.id, fittingId, position: 1, label: "Own blade", isBaseline: true }).returning();
  await db.insert(schema.coachGolfers).values({ coachUserId: w.coach.id, golferId: golfer!.id });

  const dir = await mkdtemp(path.join(process.env.TMPDIR ?? "/tmp", "phone-e2e-"));
  const file = path.join(dir, "stroke.mp4");
  await generateClip(file, { width: 320, height: 180, fps: 240, frameCount: 240, impactFrame: MARK_FRAME, faceAngleAddressDeg: 1, faceAngleImpactDeg: 0, ballSpeedPxPerFrame: 2.5, startDirectionDeg: 0 });
  const { clipId: id } = await uploadClip(fitter, file, { fittingId, buildId: build!.id, captureFps: 240 });
  clipId = id;
  expect((await waitForClip(fitter, fittingId, clipId)).clip.state).toBe("ready");
  expect((await call(fitter, "PUT", `/api/clips/${clipId}/moments`, { address: 30, impact: MARK_FRAME })).status).toBe(200);
  // A face line across the frame on the impact frame, in source pixels.
  const [mark] = await db.insert(schema.marks).values({ studioId: w.studioA.id, clipId, frame: MARK_FRAME, kind: "line", role: "face", points: [[40, 90], [280, 90]], authorUserId: w.fitter.id }).returning();
  markId = mark!.id;
  // A second build with a clip whose impact comes earlier, for the side-by-side view.
  const [chosen] = await db.insert(schema.builds).values({ studioId: w.studioA.id, fittingId, position: 2, label: "Chosen mallet" }).returning();
  const file2 = path.join(dir, "stroke-2.mp4");
  await generateClip(file2, { width: 320, height: 180, fps: 240, frameCount: 240, impactFrame: CHOSEN_IMPACT, faceAngleAddressDeg: 0, faceAngleImpactDeg: 0.5, ballSpeedPxPerFrame: 2.5, startDirectionDeg: 0.5 });
  chosenClipId = (await uploadClip(fitter, file2, { fittingId, buildId: chosen!.id, captureFps: 240 })).clipId;
  expect((await waitForClip(fitter, fittingId, chosenClipId)).clip.state).toBe("ready");
  expect((await call(fitter, "PUT", `/api/clips/${chosenClipId}/moments`, { impact: CHOSEN_IMPACT })).status).toBe(200);
  await db.insert(schema.comments).values({ studioId: w.studioA.id, clipId, authorUserId: w.coach.id, frame: COMMENT_FRAME, body: "Watch the face just before impact" });

  const invited = await call({ cookie: (await signIn(w.admin.email, PASSWORD)).cookie! }, "POST", "/api/invitations", { role: "golfer", golferId: golfer!.id, email: golferEmail });
  expect(invited.status).toBe(201);
  const [mail] = await waitForMail(golferEmail);
  phone = await browser.newContext({ viewport: { width: 375, height: 812 }, hasTouch: true, isMobile: true, deviceScaleFactor: 3 });
  page = await phone.newPage();
  await page.goto(`${BASE}/invite/${inviteTokenIn(mail!)}`);
}, 180_000);

afterAll(async () => {
  await browser?.close();
});

describe("the golfer's phone", () => {
  it("signs in from the invitation and lands on its home with the unread comment", async () => {
    await page.getByLabel("New password").fill(NEW_PASSWORD);
    await page.getByLabel("Repeat the password").fill(NEW_PASSWORD);
    await page.getByRole("button", { name: "Set password and sign in" }).click();
    await page.waitForURL(`${BASE}/me`);
    expect(await page.getByTestId("unread-summary").getAttribute("data-unread")).toBe("1");
    expect(await noSideScroll(page)).toBe(true);
  });

  it("opens the clip from its fitting; no sideways scroll; the overlay canvas stays within 2× pixels", async () => {
    await page.locator(`a[href="/me/fittings/${fittingId}"]`).click();
    await page.waitForURL(`${BASE}/me/fittings/${fittingId}`);
    expect(await noSideScroll(page)).toBe(true);
    await page.locator(`a[href="/me/clips/${clipId}"]`).click();
    await page.waitForURL(`${BASE}/me/clips/${clipId}`);
    await page.waitForFunction(() => (document.querySelector("video")?.readyState ?? 0) >= 2, undefined, { timeout: 20_000 });
    expect(await noSideScroll(page)).toBe(true);
    const size = await page.getByTestId("mark-layer").evaluate((c: HTMLCanvasElement) => ({ w: c.width, css: c.clientWidth }));
    expect(size.css).toBeGreaterThan(300);
    expect(size.w).toBeLessThanOrEqual(size.css * 2);
    const small = await page.evaluate(() => [...document.querySelectorAll("main button, main a, main select")].filter((e) => (e as HTMLElement).offsetParent && e.getBoundingClientRect().height < 44).map((e) => e.textContent));
    expect(small).toEqual([]);
  });

  it("reads the coach's comment and jumps to its frame", async () => {
    await expect.poll(() => page.getByTestId("comment-body").first().textContent()).toBe("Watch the face just before impact");
    await page.getByRole("button", { name: `Go to 0.583 s, frame ${COMMENT_FRAME}` }).tap();
    await waitFrame(page, `n === ${COMMENT_FRAME}`);
    expect(await page.getByTestId("mark-layer").getAttribute("data-marks")).toBe("");
  });

  it("draws the mark on the frame it belongs to during playback", async () => {
    await page.getByLabel("Speed").selectOption("0.5");
    await page.getByRole("button", { name: "Play" }).tap();
    await waitFrame(page, `n >= ${MARK_FRAME + 45}`);
    await page.getByRole("button", { name: "Pause" }).tap();
    const drawn = ((await page.getByTestId("mark-layer").getAttribute("data-drawn")) ?? "").split(" ").filter((e) => e.startsWith(`${markId}@`));
    const frames = drawn.map((e) => Number(e.split("@")[1]));
    expect(frames.length).toBeGreaterThan(0);
    // Never before its frame; first seen on it (or the next presented frame); gone after 0.15 s = 36 frames.
    expect(Math.min(...frames)).toBeGreaterThanOrEqual(MARK_FRAME);
    expect(Math.min(...frames)).toBeLessThanOrEqual(MARK_FRAME + 2);
    expect(Math.max(...frames)).toBeLessThan(MARK_FRAME + 36);
  });

  it("shows the mark's pixels on its frame and not on the frame before", async () => {
    const pixelOnLine = () => page.getByTestId("mark-layer").evaluate((c: HTMLCanvasElement) => {
      const scale = c.width / 320; // the line runs at y = 90 of a 320 × 180 source
      return [...c.getContext("2d")!.getImageData(Math.round(160 * scale), Math.round(90 * scale), 1, 1).data];
    });
    await page.getByRole("button", { name: "Impact" }).tap();
    await waitFrame(page, `n === ${MARK_FRAME}`);
    const on = await pixelOnLine();
    expect(on.slice(0, 3)).toEqual(FACE_COLOUR);
    expect(on[3]).toBe(255);
    await page.getByRole("button", { name: "Previous frame" }).tap();
    await waitFrame(page, `n === ${MARK_FRAME - 1}`);
    expect((await pixelOnLine())[3]).toBe(0);
  });

  it("steps frames by a horizontal swipe while paused", async () => {
    const start = await frameNow(page);
    const box = (await page.getByTestId("player-stage").boundingBox())!;
    const cdp = await phone.newCDPSession(page);
    const y = box.y + box.height / 2;
    const x0 = box.x + 60;
    await cdp.send("Input.dispatchTouchEvent", { type: "touchStart", touchPoints: [{ x: x0, y }] });
    for (let dx = 10; dx <= 100; dx += 10) await cdp.send("Input.dispatchTouchEvent", { type: "touchMove", touchPoints: [{ x: x0 + dx, y }] });
    await cdp.send("Input.dispatchTouchEvent", { type: "touchEnd", touchPoints: [] });
    // 100 px at 24 px a step = 4 frames forward (one proxy frame = one source frame here).
    await waitFrame(page, `n === ${start + 4}`);
    for (let dx = 10; dx <= 50; dx += 10) {
      await cdp.send("Input.dispatchTouchEvent", { type: dx === 10 ? "touchStart" : "touchMove", touchPoints: [{ x: x0 + 100 - dx, y }] });
    }
    await cdp.send("Input.dispatchTouchEvent", { type: "touchEnd", touchPoints: [] });
    await waitFrame(page, `n === ${start + 3}`);
    expect(await page.locator("video").evaluate((v: HTMLVideoElement) => v.paused)).toBe(true);
  });
});

describe("side by side", () => {
  it("plays the baseline and the other build in step at impact", async () => {
    await page.goto(`${BASE}/me/fittings/${fittingId}/compare`);
    const left = page.getByTestId("compare-left");
    const right = page.getByTestId("compare-right");
    await page.waitForFunction(() => [...document.querySelectorAll("video")].every((v) => v.readyState >= 2), undefined, { timeout: 20_000 });
    expect(await noSideScroll(page)).toBe(true);
    const frames = async () => [Number(await left.getByTestId("current-frame").textContent()), Number(await right.getByTestId("current-frame").textContent())];
    await page.getByRole("button", { name: "Impact" }).tap();
    await expect.poll(frames, { timeout: 10_000 }).toEqual([MARK_FRAME, CHOSEN_IMPACT]);
    await page.getByRole("button", { name: "Next frame" }).tap();
    await expect.poll(frames, { timeout: 10_000 }).toEqual([MARK_FRAME + 1, CHOSEN_IMPACT + 1]);
    await page.getByRole("button", { name: "Play" }).tap();
    await page.waitForTimeout(1500);
    await page.getByRole("button", { name: "Pause" }).tap();
    // Paused, the right clip is put exactly in step with the left one.
    await expect.poll(async () => { const [a, b] = await frames(); return b! - a!; }, { timeout: 10_000 }).toBe(CHOSEN_IMPACT - MARK_FRAME);
    expect((await frames())[0]).toBeGreaterThan(MARK_FRAME + 5);
  });
});

describe("the coach comments at a frame; the golfer gets the e-mail", () => {
  it("writes at the impact frame and the golfer's e-mail names the moment", async () => {
    const coach = await browser.newContext({ viewport: { width: 390, height: 844 }, hasTouch: true, isMobile: true });
    const cp = await coach.newPage();
    await submitSignIn(cp, w.coach.email, PASSWORD);
    await cp.waitForURL(`${BASE}/studio`);
    await cp.goto(`${BASE}/studio/coach/clips/${clipId}`);
    await cp.waitForFunction(() => (document.querySelector("video")?.readyState ?? 0) >= 2, undefined, { timeout: 20_000 });
    await cp.getByRole("button", { name: "Impact" }).tap();
    await waitFrame(cp, `n === ${MARK_FRAME}`);
    await cp.getByLabel(`Comment at 0.625 s (frame ${MARK_FRAME})`).fill("Square at impact <good>");
    await cp.getByRole("button", { name: "Send" }).last().tap();
    await expect.poll(() => cp.getByTestId("comment-body").allTextContents()).toContain("Square at impact <good>");
    const mails = await waitForMail(golferEmail, 1, 30_000, "Square at impact");
    expect(mails[0]!.text).toContain(`0.625 s (frame ${MARK_FRAME})`);
    expect(mails[0]!.text).toContain(`/me/clips/${clipId}`);
    const [row] = await db.select().from(schema.comments).where(eq(schema.comments.body, "Square at impact <good>"));
    expect(row!.frame).toBe(MARK_FRAME);
    await coach.close();
  });
});
