// The golfer's clip page on a phone: first-load JavaScript and Largest Contentful Paint.
// - JS: every script the page loads in Chromium on a cold cache, measured two ways — bytes
//   transferred as served (next start compresses with gzip) and each body gzipped here (zlib,
//   level 9) — goal ≤ 170 kB gzipped; also whether any canvas-editor (Konva) code was loaded.
// - LCP: Chromium with 4× CPU slowdown (CDP Emulation.setCPUThrottlingRate) on loopback, a
//   375×812 phone viewport; median of 5 cold loads. Goal ≤ 2.5 s.
//
//   BENCH_BASE_URL=http://127.0.0.1:3000 DATABASE_URL=… S3_…=… \
//     node --conditions=react-server --import tsx scripts/bench/golfer-page.ts
// It makes its own studio, golfer (with a password) and a clip processed by the running worker.
import { mkdtemp } from "node:fs/promises";
import { tmpdir } from "node:os";
import path from "node:path";
import { gzipSync } from "node:zlib";
import { chromium, type Browser, type BrowserContext } from "playwright-core";
import { baseUrl } from "./support";

const RUNS = 5;
const BASE = baseUrl();

async function ownData() {
  process.env.TEST_BASE_URL ??= BASE;
  const { makeWorld, PASSWORD } = await import("../../tests/support/world");
  const { signIn } = await import("../../tests/support/http");
  const { uploadClip, waitForClip } = await import("../../tests/support/clips");
  const { generateClip } = await import("../../tests/fixtures/generate-clips");
  const { db, schema } = await import("../../db");
  const w = await makeWorld();
  const fitter = { cookie: (await signIn(w.fitter.email, PASSWORD)).cookie! };
  const file = path.join(await mkdtemp(path.join(process.env.TMPDIR ?? tmpdir(), "bench-golfer-")), "stroke.mp4");
  await generateClip(file, { width: 1280, height: 720, fps: 240, frameCount: 240, impactFrame: 150, faceAngleAddressDeg: 1, faceAngleImpactDeg: -0.5, ballSpeedPxPerFrame: 6, startDirectionDeg: 0 });
  const { clipId } = await uploadClip(fitter, file, { fittingId: w.own.fitting.id, buildId: w.own.build.id, captureFps: 240 });
  await waitForClip(fitter, w.own.fitting.id, clipId, 180_000);
  await db.insert(schema.marks).values({ studioId: w.studioA.id, clipId, frame: 150, kind: "line", role: "face", points: [[400, 360], [880, 360]] });
  await db.insert(schema.comments).values({ studioId: w.studioA.id, clipId, authorUserId: w.coach.id, frame: 140, body: "Face is square here." });
  return { clipId, email: w.own.account.email, password: PASSWORD };
}

async function phoneContext(browser: Browser, email: string, password: string): Promise<BrowserContext> {
  const context = await browser.newContext({ viewport: { width: 375, height: 812 }, isMobile: true, hasTouch: true, deviceScaleFactor: 2 });
  const page = await context.newPage();
  await page.goto(`${BASE}/sign-in`);
  await page.getByLabel("E-mail").fill(email);
  await page.getByLabel("Password").fill(password);
  await page.getByRole("button", { name: "Sign in" }).click();
  await page.waitForURL(`${BASE}/me`);
  await page.close();
  return context;
}

async function measureJs(context: BrowserContext, url: string) {
  const page = await context.newPage();
  const cdp = await context.newCDPSession(page);
  await cdp.send("Network.enable");
  await cdp.send("Network.setCacheDisabled", { cacheDisabled: true });
  const transferred = new Map<string, number>();
  const scriptIds = new Map<string, string>();
  cdp.on("Network.responseReceived", (e) => { if (e.type === "Script") scriptIds.set(e.requestId, e.response.url); });
  cdp.on("Network.loadingFinished", (e) => { if (scriptIds.has(e.requestId)) transferred.set(e.requestId, e.encodedDataLength); });
  const bodies: { url: string; gz: number; konva: boolean }[] = [];
  page.on("response", async (res) => {
    if (res.request().resourceType() !== "script") return;
    const body = await res.body().catch(() => null);
    if (body) bodies.push({ url: res.url(), gz: gzipSync(body, { level: 9 }).length, konva: /Konva|konva/.test(body.toString("latin1")) });
  });
  await page.goto(url, { waitUntil: "networkidle" });
  await page.waitForTimeout(500);
  await page.close();
  const served = [...transferred.values()].reduce((a, b) => a + b, 0);
  const gz = bodies.reduce((a, b) => a + b.gz, 0);
  return { scripts: bodies.length, servedKb: served / 1024, gzipKb: gz / 1024, konva: bodies.filter((b) => b.konva).map((b) => b.url) };
}

async function measureLcp(context: BrowserContext, url: string): Promise<{ ms: number; element: string }> {
  const page = await context.newPage();
  const cdp = await context.newCDPSession(page);
  await cdp.send("Network.enable");
  await cdp.send("Network.setCacheDisabled", { cacheDisabled: true });
  await cdp.send("Emulation.setCPUThrottlingRate", { rate: 4 });
  await page.goto(url, { waitUntil: "load" });
  await page.waitForTimeout(1500);
  const result = await page.evaluate(() => new Promise<{ ms: number; element: string }>((resolve) => {
    new PerformanceObserver((list) => {
      const last = list.getEntries().at(-1) as (PerformanceEntry & { element?: Element }) | undefined;
      resolve({ ms: last?.startTime ?? NaN, element: last?.element ? `${last.element.tagName.toLowerCase()}${last.element.id ? `#${last.element.id}` : ""}` : "?" });
    }).observe({ type: "largest-contentful-paint", buffered: true });
  }));
  await page.close();
  return result;
}

async function main() {
  const { clipId, email, password } = await ownData();
  const url = `${BASE}/me/clips/${clipId}`;
  const browser = await chromium.launch({
    executablePath: process.env.CHROMIUM_PATH ?? "/usr/bin/chromium",
    args: ["--headless", "--no-sandbox", "--disable-gpu", "--disable-quic", "--no-first-run", "--disable-background-networking", "--disable-component-update", "--disable-sync"],
  });
  try {
    const context = await phoneContext(browser, email, password);
    const js = await measureJs(context, url);
    const lcps: { ms: number; element: string }[] = [];
    for (let i = 0; i < RUNS; i++) lcps.push(await measureLcp(context, url));
    const sorted = lcps.map((l) => l.ms).sort((a, b) => a - b);
    const median = sorted[Math.floor(sorted.length / 2)]!;
    console.log("golfer clip page (/me/clips/[id]), Chromium, 375×812 phone viewport, loopback");
    console.log(`  first-load JS, measured in Chromium on a cold cache: ${js.scripts} scripts`);
    console.log(`    as served (Content-Encoding of next start): ${js.servedKb.toFixed(1)} kB`);
    console.log(`    each body gzipped (level 9):                ${js.gzipKb.toFixed(1)} kB   goal ≤ 170 kB  ${js.gzipKb <= 170 ? "met" : "NOT met"}`);
    console.log(`    canvas editor (Konva) code loaded: ${js.konva.length === 0 ? "no" : `YES — ${js.konva.join(", ")}`}`);
    console.log(`  Largest Contentful Paint, CPU 4× slower, ${RUNS} cold loads: median ${median.toFixed(0)} ms (min ${sorted[0]!.toFixed(0)}, max ${sorted.at(-1)!.toFixed(0)}; element ${lcps[0]!.element})   goal ≤ 2500 ms  ${median <= 2500 ? "met" : "NOT met"}`);
  } finally {
    await browser.close();
  }
  process.exit(0);
}

await main();
