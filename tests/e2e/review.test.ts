// The clip review screen in Chromium on a ready clip with real frames: draw the target line and
// the face at address and impact, read the true angles with their ±, undo/redo through the API,
// a stale edit from a second tab gets the conflict message, a ground plane clicked in Z order is
// refused with the server's words, and T accepts the tracker's proposals.
import type { Browser, BrowserContext, Page } from "playwright-core";
import { eq } from "drizzle-orm";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { db, schema } from "@/db";
import type { Vec2 } from "@/lib/geometry/vector";
import { imageToScreen, type Viewport } from "@/lib/review/viewport";
import { launchBrowser, submitSignIn } from "../support/browser";
import { BASE, call, signIn, type Auth } from "../support/http";
import { makeReadyClip } from "../support/ready-clip";
import { makeWorld, PASSWORD, type World } from "../support/world";

const CONFLICT = "This clip was changed in another window — reloaded the latest marks";
type Mark = { id: string; frame: number; kind: string; role: string; points: [number, number][]; version: number };

let browser: Browser;
let context: BrowserContext;
let w: World;
let clipId: string;
let api: Auth;

beforeAll(async () => {
  [browser, w] = await Promise.all([launchBrowser(), makeWorld()]);
  const clip = await makeReadyClip({ studioId: w.studioA.id, fittingId: w.own.fitting.id, buildId: w.own.build.id, createdBy: w.fitter.id });
  clipId = clip.id;
  api = { cookie: (await signIn(w.fitter.email, PASSWORD)).cookie! };
  context = await browser.newContext({ viewport: { width: 1400, height: 900 } });
  const page = await context.newPage();
  await submitSignIn(page, w.fitter.email, PASSWORD);
  await page.waitForURL(`${BASE}/studio`);
  await page.close();
});
afterAll(async () => {
  await browser?.close();
});

async function openClip(): Promise<Page> {
  const page = await context.newPage();
  await page.goto(`${BASE}/studio/clips/${clipId}`);
  await page.locator("[data-painted-frame]").waitFor();
  return page;
}

/** Screen position of an image point, through the page's own viewport transform. */
async function screenOf(page: Page, p: Vec2): Promise<Vec2> {
  const stage = page.getByTestId("stage");
  const box = (await stage.boundingBox())!;
  const vp = JSON.parse((await stage.getAttribute("data-viewport"))!) as Viewport;
  const s = imageToScreen(vp, p);
  return [box.x + s[0], box.y + s[1]];
}
async function clickImage(page: Page, p: Vec2) {
  const [x, y] = await screenOf(page, p);
  await page.mouse.click(x, y);
}
async function dragImage(page: Page, from: Vec2, to: Vec2) {
  const a = await screenOf(page, from);
  const b = await screenOf(page, to);
  await page.mouse.move(a[0], a[1]);
  await page.mouse.down();
  await page.mouse.move(b[0], b[1], { steps: 8 });
  await page.mouse.up();
}

const marksNow = async (): Promise<Mark[]> => (await call(api, "GET", `/api/clips/${clipId}/marks`)).body.marks;
const readout = (page: Page, key: string) => page.getByTestId(`readout-${key}`);

/** METRICS.md, overhead: t along the target line, r = (−t_y, t_x), face normal n with n·t > 0, angle = atan2(n·r, n·t). */
function faceAngleByHand(target: Mark, face: Mark): number {
  const [[tx1, ty1], [tx2, ty2]] = [target.points[0]!, target.points[1]!];
  const tl = Math.hypot(tx2 - tx1, ty2 - ty1);
  const t = [(tx2 - tx1) / tl, (ty2 - ty1) / tl] as const;
  const r = [-t[1], t[0]] as const;
  const [[fx1, fy1], [fx2, fy2]] = [face.points[0]!, face.points[1]!];
  let n = [fy2 - fy1, -(fx2 - fx1)] as const;
  if (n[0] * t[0] + n[1] * t[1] < 0) n = [-n[0], -n[1]] as const;
  return (Math.atan2(n[0] * r[0] + n[1] * r[1], n[0] * t[0] + n[1] * t[1]) * 180) / Math.PI;
}
const shown = (deg: number) => {
  const text = deg.toFixed(1);
  return `${Number(text) > 0 ? "+" : ""}${text.replace("-", "\u2212")}°`;
};

describe("clip review", () => {
  let page: Page;

  it("draws the target line and the face at address and at impact, and reads the true angles", async () => {
    page = await openClip();
    // The readouts come from each save's answer: after the first load, no further measurement requests.
    await expect.poll(() => readout(page, "aim").textContent()).toContain("Needs");
    let measurementReads = 0;
    page.on("request", (r) => {
      if (r.url().endsWith("/measurements")) measurementReads += 1;
    });
    expect(await page.getByTestId("frame-number").textContent()).toBe("0");
    await page.keyboard.press("Shift+A");
    // With address set and no impact yet the screen goes to the suggested impact (frame 20); back to 0 to draw.
    await expect.poll(() => page.getByTestId("frame-number").textContent()).toBe("20");
    await page.getByRole("button", { name: "Dismiss" }).click();
    await page.keyboard.press("Home");
    await page.locator('[data-painted-frame="0"]').waitFor();
    await page.keyboard.press("2");
    await page.getByLabel("Role").selectOption("target");
    await clickImage(page, [320, 340]);
    await clickImage(page, [320, 40]);
    await page.getByLabel("Role").selectOption("face");
    await clickImage(page, [260, 200]);
    await clickImage(page, [380, 204]);
    await expect.poll(async () => (await marksNow()).length).toBe(2);

    await page.keyboard.press("Shift+ArrowRight");
    await page.keyboard.press("Shift+ArrowRight");
    await page.locator('[data-painted-frame="20"]').waitFor();
    expect(await page.getByTestId("frame-number").textContent()).toBe("20");
    await page.keyboard.press("Shift+I");
    await clickImage(page, [260, 206]);
    await clickImage(page, [380, 199]);
    await expect.poll(async () => (await marksNow()).length).toBe(3);

    const marks = await marksNow();
    const target = marks.find((m) => m.role === "target")!;
    const faceAtAddress = marks.find((m) => m.role === "face" && m.frame === 0)!;
    const faceAtImpact = marks.find((m) => m.role === "face" && m.frame === 20)!;
    // Clicks land within a fraction of a pixel of where they were aimed.
    expect(Math.abs(target.points[1]![1] - 40)).toBeLessThan(1);
    const aim = faceAngleByHand(target, faceAtAddress);
    const impact = faceAngleByHand(target, faceAtImpact);
    // The intended scene: aim atan(4/120) = +1.9° open, impact −atan(7/120) = −3.3° closed.
    expect(Math.abs(aim - 1.909)).toBeLessThan(0.5);
    expect(Math.abs(impact + 3.338)).toBeLessThan(0.5);

    await expect.poll(() => readout(page, "aim").getByTestId("value").textContent(), { timeout: 15_000 }).toBe(shown(aim));
    await expect.poll(() => readout(page, "face_angle_impact").getByTestId("value").textContent(), { timeout: 15_000 }).toBe(shown(impact));
    expect(await readout(page, "aim").textContent()).toContain("open");
    expect(await readout(page, "face_angle_impact").textContent()).toContain("closed");
    expect(measurementReads).toBe(0);
  });

  it("each value carries its ± (the value's decimals, lighter) and how it was measured", async () => {
    const aim = readout(page, "aim");
    await expect.poll(() => aim.getByTestId("uncertainty").textContent(), { timeout: 15_000 }).toMatch(/^±(\d+\.\d|<0\.1)°$/);
    expect(await aim.getByTestId("method").textContent()).toBe("marked");
    // The value, then the ±, then the side: "+1.9° ±0.4° open".
    expect(await aim.locator("dd").textContent()).toMatch(/^\+\d+\.\d°±(\d+\.\d|<0\.1)°open/);
  });

  it("undo removes the last mark and redo brings it back, through the API", async () => {
    const before = await marksNow();
    const last = before.find((m) => m.role === "face" && m.frame === 20)!;
    await page.keyboard.press("Control+z");
    await expect.poll(async () => (await marksNow()).length).toBe(2);
    expect((await marksNow()).some((m) => m.frame === 20)).toBe(false);
    await expect.poll(() => readout(page, "face_angle_impact").getByTestId("value").count()).toBe(0);

    await page.keyboard.press("Control+Shift+Z");
    await expect.poll(async () => (await marksNow()).length).toBe(3);
    const back = (await marksNow()).find((m) => m.role === "face" && m.frame === 20)!;
    expect(back.points).toEqual(last.points);
    await expect.poll(() => readout(page, "face_angle_impact").getByTestId("value").count()).toBe(1);
  });

  it("a second tab edits a mark; the first tab's stale edit gets the conflict message and the latest marks", async () => {
    const other = await openClip();
    await other.keyboard.press("1");
    await clickImage(other, [320, 40]);
    await dragImage(other, [320, 40], [330, 40]);
    await expect.poll(async () => (await marksNow()).find((m) => m.role === "target")!.version).toBe(2);

    await page.bringToFront();
    await page.keyboard.press("a");
    await page.locator('[data-painted-frame="0"]').waitFor();
    await page.keyboard.press("1");
    await clickImage(page, [320, 40]);
    await dragImage(page, [320, 40], [300, 40]);
    await expect.poll(() => page.getByTestId("notice").textContent()).toBe(CONFLICT);

    const target = (await marksNow()).find((m) => m.role === "target")!;
    expect(target.version).toBe(2);
    expect(Math.abs(target.points[1]![0] - 330)).toBeLessThan(1);
    await other.close();
  });

  it("zooming with + and the wheel keeps marks on the image: the target's handle is still under its image point", async () => {
    await page.keyboard.press("Escape");
    const scaleNow = async () => (JSON.parse((await page.getByTestId("stage").getAttribute("data-viewport"))!) as Viewport).scale;
    const fitted = await scaleNow();
    await page.keyboard.press("+");
    await expect.poll(scaleNow).toBeCloseTo(fitted * 1.25, 6);
    const [x, y] = await screenOf(page, [320, 340]);
    await page.mouse.move(x, y);
    await page.mouse.wheel(0, -200);
    await expect.poll(scaleNow).toBeGreaterThan(fitted * 1.3);
    const [x2, y2] = await screenOf(page, [320, 340]);
    expect(Math.hypot(x2 - x, y2 - y)).toBeLessThan(1);
    await page.mouse.click(x2, y2);
    await page.getByRole("button", { name: "Delete mark" }).waitFor();
    await page.keyboard.press("Escape");
    await page.keyboard.press("0");
    await expect.poll(scaleNow).toBe(fitted);
  });

  it("ball track: each click puts a ball point on the current frame and steps one frame", async () => {
    const start = Number(await page.getByTestId("frame-number").textContent());
    await page.keyboard.press("5");
    for (const x of [400, 410, 420]) await clickImage(page, [x, 180]);
    await expect.poll(() => page.getByTestId("frame-number").textContent()).toBe(String(start + 3));
    await expect.poll(async () => (await marksNow()).filter((m) => m.role === "ball").length).toBe(3);
    const balls = (await marksNow()).filter((m) => m.role === "ball").sort((a, b) => a.frame - b.frame);
    expect(balls.map((m) => [m.kind, m.frame])).toEqual([["point", start], ["point", start + 1], ["point", start + 2]]);
    expect(balls.map((m) => Math.round(m.points[0]![0]))).toEqual([400, 410, 420]);
  });

  it("a ground plane clicked in Z order (not around the rectangle) is refused with the server's words on screen", async () => {
    const before = (await marksNow()).length;
    await page.keyboard.press("7");
    for (const p of [[100, 60], [540, 60], [100, 300], [540, 300]] as Vec2[]) await clickImage(page, p);
    await expect.poll(() => page.getByTestId("notice").textContent(), { timeout: 10_000 }).toMatch(/^The mark was refused: .*(order|convex|cross)/i);
    expect((await marksNow()).length).toBe(before);
    await page.getByRole("button", { name: "Dismiss" }).click();
    await page.keyboard.press("1");
  });

  it("the help overlay lists the keys as a dialog", async () => {
    await page.keyboard.press("?");
    const dialog = page.getByRole("dialog", { name: "Keyboard" });
    await dialog.waitFor();
    expect(await dialog.textContent()).toContain("Set address / impact to this frame");
    expect(await dialog.textContent()).toContain("Accept the tracked marks");
    await page.keyboard.press("Escape");
    await dialog.waitFor({ state: "hidden" });
  });

  it("tracked marks are proposals until T accepts them: the tracker's impact becomes the clip's", async () => {
    const tracked = await makeReadyClip({ studioId: w.studioA.id, fittingId: w.own.fitting.id, buildId: w.own.build.id, createdBy: w.fitter.id });
    const summary = { version: 1, ballFound: true, ball: { x: 320, y: 180, diameterPx: 20 }, addressFrame: 2, impactFrame: 18, impactSource: "ball", ballTrackFrames: 0, clubheadFrames: 0, markerFrames: 0, seconds: 0.1, notes: [] };
    await db.update(schema.clips).set({ tracking: summary, suggestedImpactFrame: 18 }).where(eq(schema.clips.id, tracked.id));
    // A proposed face line at the tracker's address frame, and the fitter's own target line.
    await db.insert(schema.marks).values([
      { studioId: w.studioA.id, clipId: tracked.id, frame: 2, kind: "line", role: "face", points: [[260, 200], [380, 204]], source: "tracked", precisionPx: 0.3 },
      { studioId: w.studioA.id, clipId: tracked.id, frame: 2, kind: "line", role: "target", points: [[320, 340], [320, 40]], authorUserId: w.fitter.id },
    ]);
    const p = await context.newPage();
    await p.goto(`${BASE}/studio/clips/${tracked.id}`);
    await p.locator("[data-painted-frame]").waitFor();
    await expect.poll(() => p.getByTestId("tracking-line").textContent()).toBe("Ball found · impact from the ball at frame 18 · 1 proposed mark");
    // The clip opens on frame 0 (no address yet); the proposal is on frame 2, listed as "(proposed)".
    await p.keyboard.press("ArrowRight");
    await p.keyboard.press("ArrowRight");
    await p.locator('[data-painted-frame="2"]').waitFor();
    expect(await p.getByRole("button", { name: /Face line/ }).textContent()).toContain("(proposed)");
    await p.keyboard.press("t");
    await expect.poll(() => p.getByTestId("tracking-line").textContent(), { timeout: 10_000 }).toBe("Ball found · impact from the ball at frame 18 · accepted");
    const clip = (await call(api, "GET", `/api/clips/${tracked.id}`)).body;
    expect(clip.moments).toMatchObject({ address: 2, impact: 18 });
    expect(typeof clip.tracking.acceptedAt).toBe("string");
    expect(await p.getByRole("button", { name: /Accept tracked marks/ }).isDisabled()).toBe(true);
    expect(await p.getByRole("button", { name: /Face line/ }).textContent()).not.toContain("proposed");
    // Aim from the accepted face line and the hand-drawn target line: a number with its ±, made from both kinds of mark.
    const aim = p.getByTestId("readout-aim");
    await expect.poll(() => aim.getByTestId("uncertainty").textContent(), { timeout: 15_000 }).toMatch(/^±(\d+\.\d|<0\.1)°$/);
    expect(await aim.getByTestId("method").textContent()).toBe("mixed");
    // The per-clip switch: off, the clip is measured from hand marks only.
    await p.getByRole("switch", { name: "Tracking on this clip" }).click();
    await expect.poll(() => p.getByTestId("tracking-line").textContent()).toBe("Tracking is off: only hand marks are measured.");
    expect((await call(api, "GET", `/api/clips/${tracked.id}`)).body.trackingEnabled).toBe(false);
    await p.close();
  });

  it("another studio's fitter gets the not-found page", async () => {
    const res = await call({ cookie: (await signIn(w.otherAdmin.email, PASSWORD)).cookie! }, "GET", `/studio/clips/${clipId}`);
    expect(res.status).toBe(404);
  });
});
