// The fitting workflow in Chromium: a fitter adds a golfer with intake (a failed submit keeps what
// was typed), books a fitting, adds two builds, drops generated clips into each on the fitting
// page, marks them (through the marks API with the page's session; drawing the same marks in the
// review screen is tests/e2e/review.test.ts), compares, issues the spec, and the golfer reads it.
import bcrypt from "bcryptjs";
import { mkdtemp } from "node:fs/promises";
import { tmpdir } from "node:os";
import path from "node:path";
import { and, asc, eq } from "drizzle-orm";
import type { Browser, Page } from "playwright-core";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { db, schema } from "@/db";
import { marksFromTruth } from "@/scripts/demo-clips";
import { generateClip, type ClipTruth } from "../fixtures/generate-clips";
import { launchBrowser, submitSignIn } from "../support/browser";
import { BASE } from "../support/http";
import { makeWorld, PASSWORD, type World } from "../support/world";

let browser: Browser;
let w: World;

beforeAll(async () => {
  [browser, w] = await Promise.all([launchBrowser(), makeWorld()]);
});
afterAll(async () => {
  await browser?.close();
});

async function signInAs(email: string) {
  const page = await browser.newPage();
  await submitSignIn(page, email, PASSWORD);
  await page.waitForURL((u) => u.pathname !== "/sign-in");
  return page;
}

async function addBuild(page: Page, label: string, fields: Record<string, string>) {
  await page.locator("#build-label").fill(label);
  for (const [key, value] of Object.entries(fields)) await page.locator(`#build-${key}`).fill(value);
  await page.getByRole("button", { name: "Add build" }).click();
  await page.getByRole("status").filter({ hasText: `Added ${label}` }).waitFor();
}

const small = { width: 320, height: 180, fps: 240, frameCount: 160, impactFrame: 100, ballSpeedPxPerFrame: 2, pathDeg: 0.5 } as const;

/** Drops one generated clip per face angle into a build, waits for them, then marks each from its truth. */
async function uploadAndMark(page: Page, fittingId: string, buildLabel: string, faces: number[]) {
  const dir = await mkdtemp(path.join(tmpdir(), "fitframe-e2e-fitting-"));
  const truths = new Map<string, ClipTruth>();
  for (const [i, face] of faces.entries()) {
    const name = `${buildLabel.replace(/\W+/g, "-")}-${i}.mp4`;
    truths.set(name, await generateClip(path.join(dir, name), { ...small, faceAngleAddressDeg: face / 2, faceAngleImpactDeg: face, startDirectionDeg: face * 0.8 }));
  }
  const uploader = page.getByRole("region", { name: "Upload clips" });
  await uploader.getByLabel("Build").selectOption({ label: buildLabel });
  const consent = uploader.getByRole("checkbox", { name: /agreed to be filmed/ });
  if (await consent.count()) await consent.check();
  await uploader.getByLabel("Clip files").setInputFiles([...truths.keys()].map((name) => path.join(dir, name)));
  for (const name of truths.keys()) await page.locator(`[data-clip-name="${name}"][data-clip-state="ready"]`).waitFor({ timeout: 90_000 });
  const rows = await db.select().from(schema.clips).where(eq(schema.clips.fittingId, fittingId));
  for (const [name, truth] of truths) {
    const clip = rows.find((r) => r.originalName === name)!;
    const send = (method: "post" | "put", url: string, data: unknown) => page.request[method](`${BASE}${url}`, { data, headers: { origin: BASE } });
    expect((await send("put", `/api/clips/${clip.id}/moments`, { address: 10, impact: truth.options.impactFrame })).status()).toBe(200);
    for (const mark of marksFromTruth(truth)) expect((await send("post", `/api/clips/${clip.id}/marks`, mark)).status()).toBe(201);
  }
}

describe("fitting workflow", () => {
  const golferName = `Nora Quill ${Date.now()}`;
  const golferEmail = `nora.${Date.now()}@test.fitframe`;
  let specPath = "";

  it("a fitter adds a golfer, a fitting, two builds; compares; issues the spec", async () => {
    const page = await signInAs(w.fitter.email);
    await page.goto(`${BASE}/studio/golfers/new`);
    await page.getByLabel("Name", { exact: true }).fill(golferName);
    await page.getByLabel("E-mail (for the spec and sign-in)").fill(golferEmail);
    await page.getByLabel("Putting style").fill("claw");
    await page.getByLabel("Green speed at home (ft)").fill("40");
    await page.getByLabel("Consent to record video has been given").check();
    await page.getByRole("button", { name: "Add golfer" }).click();
    // the error is tied to its field and nothing typed is lost
    const speed = page.getByLabel("Green speed at home (ft)");
    await expect.poll(() => speed.getAttribute("aria-invalid")).toBe("true");
    const describedBy = (await speed.getAttribute("aria-describedby"))!.split(" ");
    expect(await page.locator(`#${describedBy.at(-1)}`).textContent()).toContain("at most 16");
    expect(await page.getByLabel("Name", { exact: true }).inputValue()).toBe(golferName);
    expect(await page.getByLabel("Putting style").inputValue()).toBe("claw");
    await speed.fill("10.5");
    await page.getByRole("button", { name: "Add golfer" }).click();
    await page.waitForURL(/\/studio\/golfers\/[0-9a-f-]{36}$/);
    expect(await page.getByRole("heading", { level: 1 }).textContent()).toBe(golferName);
    expect(await page.locator("main").textContent()).toContain("video consent given");

    await page.getByRole("button", { name: "New fitting" }).click();
    await page.waitForURL(/\/studio\/fittings\/[0-9a-f-]{36}$/);
    const fittingId = page.url().split("/").pop()!;
    await addBuild(page, "Own putter", { lengthIn: "35", lieDeg: "70", loftDeg: "3", headMassG: "340" });
    await addBuild(page, "Mallet 34", { headModel: "Mallet M2", lengthIn: "34", lieDeg: "71", loftDeg: "2.5", headMassG: "360", gripName: "Pistol 60", gripMassG: "60", shaftMassG: "110" });
    await page.getByRole("listitem").filter({ hasText: "Mallet 34" }).waitFor();

    const [fitting] = await db.select().from(schema.fittings).where(eq(schema.fittings.id, fittingId));
    const builds = await db.select().from(schema.builds).where(eq(schema.builds.fittingId, fittingId)).orderBy(asc(schema.builds.position));
    expect(builds.map((b) => b.label)).toEqual(["Own putter", "Mallet 34"]);
    expect(fitting!.golferId).toBeTruthy();
    await uploadAndMark(page, fittingId, "Own putter", [1.8, -1.2, 0.9]);
    await uploadAndMark(page, fittingId, "Mallet 34", [0.2, -0.1, 0.3]);
    const stored = await db.select().from(schema.measurements).innerJoin(schema.clips, eq(schema.clips.id, schema.measurements.clipId))
      .where(and(eq(schema.clips.fittingId, fittingId), eq(schema.measurements.key, "face_angle_impact")));
    // The generator's truth (tests/fixtures/generate-clips.ts) comes back from the marks within 0.1°.
    expect(stored.map((r) => r.measurements.value!).sort((a, b) => a - b).map((v) => Number(v.toFixed(1)))).toEqual([-1.2, -0.1, 0.2, 0.3, 0.9, 1.8]);

    await page.reload();
    const suggestion = page.getByRole("region", { name: /Suggested from the numbers/ });
    await suggestion.waitFor();
    expect(await suggestion.textContent()).toContain("Mallet 34");
    const stats = page.getByRole("region", { name: "Consistency per measurement" });
    expect(await stats.textContent()).toContain("Face angle at impact");
    expect(await page.getByText("Face angle at impact, putt by putt").count()).toBe(1);
    await page.locator(".recharts-surface").first().waitFor();

    await page.getByLabel("Build", { exact: true }).selectOption({ label: "Mallet 34" });
    await page.getByLabel("Grip orientation").fill("flat side up");
    await page.getByRole("button", { name: "Issue spec" }).click();
    const done = page.getByRole("status").filter({ hasText: "Spec issued" });
    await done.waitFor();
    expect(await done.textContent()).toContain(`e-mailed to ${golferEmail}`);
    specPath = (await done.getByRole("link", { name: "Printable page" }).getAttribute("href"))!;
    await page.goto(`${BASE}${specPath}`);
    expect(await page.locator("article").textContent()).toContain("flat side up");
    await page.close();
  });

  it("the golfer signs in and reads the spec", async () => {
    const [golfer] = await db.select().from(schema.golfers).where(eq(schema.golfers.email, golferEmail));
    const [account] = await db
      .insert(schema.users)
      .values({ studioId: golfer!.studioId, role: "golfer", email: golferEmail, name: golferName, passwordHash: bcrypt.hashSync(PASSWORD, 4) })
      .returning();
    await db.update(schema.golfers).set({ userId: account!.id }).where(eq(schema.golfers.id, golfer!.id));
    const page = await signInAs(golferEmail);
    await page.waitForURL(`${BASE}/me`);
    const card = page.getByRole("region", { name: "Your putter spec" });
    expect(await card.textContent()).toContain("Mallet M2");
    await card.getByRole("link", { name: "Read the spec" }).click();
    await page.waitForURL(/\/me\/specs\//);
    const sheet = await page.locator("article").textContent();
    expect(sheet).toContain(golferName);
    expect(sheet).toContain("34 in");
    expect(sheet).toContain("flat side up");
    await page.close();
  });
});
