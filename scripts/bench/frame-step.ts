// Frame-step latency of the clip review screen in Chromium: 200 presses of → on a ready clip,
// each timed inside the page from the keydown to the new frame drawn on the stage (the stage
// sets data-painted-frame and window.__lastFramePaintedAt after Konva draws the frame).
// Goal: median ≤ 16 ms.
//
//   BENCH_BASE_URL=http://127.0.0.1:3000 BENCH_CLIP_ID=… BENCH_EMAIL=… BENCH_PASSWORD=… \
//     node --conditions=react-server --import tsx scripts/bench/frame-step.ts
// Without BENCH_CLIP_ID it makes its own studio, fitter and a 1280×720 ready clip of 240
// frames (needs DATABASE_URL and the S3_* variables of that server).
// BENCH_STEP_GAP_MS (default 35, about a held key's repeat rate) is the pause between presses.
import { chromium, type Page } from "playwright-core";

const BASE = process.env.BENCH_BASE_URL ?? "http://127.0.0.1:3000";
const STEPS = 200;
const GAP_MS = Number(process.env.BENCH_STEP_GAP_MS ?? 35);

type Target = { clipId: string; email: string; password: string };

async function ownData(): Promise<Target> {
  const { makeWorld, PASSWORD } = await import("../../tests/support/world");
  const { makeReadyClip } = await import("../../tests/support/ready-clip");
  const w = await makeWorld();
  const clip = await makeReadyClip({
    studioId: w.studioA.id, fittingId: w.own.fitting.id, buildId: w.own.build.id, createdBy: w.fitter.id,
    width: 1280, height: 720, frameCount: STEPS + 40,
  });
  return { clipId: clip.id, email: w.fitter.email, password: PASSWORD };
}

async function target(): Promise<Target> {
  const { BENCH_CLIP_ID: clipId, BENCH_EMAIL: email, BENCH_PASSWORD: password } = process.env;
  if (clipId && email && password) return { clipId, email, password };
  return ownData();
}

const percentile = (sorted: number[], p: number) => sorted[Math.min(sorted.length - 1, Math.ceil((p / 100) * sorted.length) - 1)]!;

type Marks = { __lastFramePaintedAt: number; __benchKeyAt: number; __benchNextFrameAt: number };

/** One press; answers [key → frame drawn, key → the browser's next rendering opportunity after it]. */
async function stepOnce(page: Page, expected: number): Promise<[number, number]> {
  await page.keyboard.press("ArrowRight");
  await page.waitForFunction((n) => document.querySelector("[data-painted-frame]")?.getAttribute("data-painted-frame") === String(n), expected, { polling: "raf" });
  await page.waitForFunction(() => (window as unknown as Marks).__benchNextFrameAt >= (window as unknown as Marks).__benchKeyAt);
  return page.evaluate(() => {
    const w = window as unknown as Marks;
    return [w.__lastFramePaintedAt - w.__benchKeyAt, w.__benchNextFrameAt - w.__benchKeyAt] as [number, number];
  });
}

function summary(name: string, times: number[]) {
  const sorted = [...times].sort((a, b) => a - b);
  const mean = times.reduce((s, v) => s + v, 0) / times.length;
  return `  ${name}: median ${percentile(sorted, 50).toFixed(1)} ms   p95 ${percentile(sorted, 95).toFixed(1)} ms   mean ${mean.toFixed(1)} ms   max ${sorted.at(-1)!.toFixed(1)} ms`;
}

async function main() {
  const t = await target();
  const browser = await chromium.launch({
    executablePath: process.env.CHROMIUM_PATH ?? "/usr/bin/chromium",
    args: ["--headless", "--no-sandbox", "--disable-gpu", "--disable-quic", "--no-first-run", "--disable-background-networking", "--disable-component-update", "--disable-sync"],
  });
  try {
    const page = await browser.newPage({ viewport: { width: 1400, height: 900 } });
    await page.goto(`${BASE}/sign-in`);
    await page.getByLabel("E-mail").fill(t.email);
    await page.getByLabel("Password").fill(t.password);
    await page.getByRole("button", { name: "Sign in" }).click();
    await page.waitForURL((u) => !u.pathname.startsWith("/sign-in"));
    await page.goto(`${BASE}/studio/clips/${t.clipId}`);
    await page.locator("[data-painted-frame]").waitFor();
    const start = Number(await page.locator("[data-painted-frame]").getAttribute("data-painted-frame"));
    // Timed from the first listener to see the key (window, capture phase) to the paint, and to
    // the first animation frame after it (when the browser composites the new canvas).
    await page.evaluate(() => {
      const w = window as unknown as Marks;
      w.__benchNextFrameAt = -1;
      window.addEventListener("keydown", () => {
        w.__benchKeyAt = performance.now();
        requestAnimationFrame(() => (w.__benchNextFrameAt = performance.now()));
      }, { capture: true });
    });
    await page.waitForTimeout(1000); // the first frames around the cursor load

    const drawn: number[] = [];
    const shown: number[] = [];
    for (let i = 1; i <= STEPS; i++) {
      const [d, s] = await stepOnce(page, start + i);
      drawn.push(d);
      shown.push(s);
      await page.waitForTimeout(GAP_MS);
    }
    console.log(`frame-step latency in Chromium, ${STEPS} steps with →, ${GAP_MS} ms between presses (in-page performance.now; goal: median ≤ 16 ms)`);
    console.log(summary("key press → frame drawn on the stage", drawn));
    console.log(summary("key press → next animation frame   ", shown));
  } finally {
    await browser.close();
  }
  process.exit(0);
}

main().catch((err) => {
  console.error(err);
  process.exit(1);
});
