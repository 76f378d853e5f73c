// In Chromium: a visitor books a fitting on the public page, creates its golfer account,
// pays on the payments fake's page, the fitter confirms in the studio calendar, and the
// golfer then sees the confirmed, paid visit (on /book/{slug}/bookings, which shows the
// GolferBookings component, and as a booked fitting on its home /me).
import type { Browser, Page } from "playwright-core";
import { eq } from "drizzle-orm";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { db, schema } from "@/db";
import { freeSlots, PAYMENTS_URL, withBooking, type BookingWorld } from "../integration/booking/booking-world";
import { launchBrowser, submitSignIn } from "../support/browser";
import { BASE } from "../support/http";
import { makeWorld, PASSWORD } from "../support/world";

let browser: Browser;
let w: BookingWorld;

beforeAll(async () => {
  [browser, w] = await Promise.all([launchBrowser(), makeWorld().then(withBooking)]);
});
afterAll(async () => {
  await browser?.close();
});

async function signInThroughForm(page: Page, email: string) {
  await submitSignIn(page, email, PASSWORD);
  await page.waitForURL(/\/(studio|me)$/);
}

describe("booking and paying a fitting", () => {
  it("a golfer books and pays, the fitter confirms, the golfer sees the visit", async () => {
    // Three days ahead, so that the golfer may still move it under the 48-hour notice rule.
    const slot = (await freeSlots(w.studioA.slug, w.types.A.id)).find((s) => Date.parse(s.start) > Date.now() + 3 * 86_400_000)!;
    const email = `booker.${w.tag}@test.fitframe`;
    const golfer = await (await browser.newContext()).newPage();
    await golfer.goto(`${BASE}/book/${w.studioA.slug}`);
    await golfer.getByRole("heading", { name: `Book a putter fitting at ${w.studioA.name}` }).waitFor();
    await golfer.locator(`[data-slot="${slot.start}"]`).first().click();
    await golfer.getByLabel("Name").fill("Booker Test");
    await golfer.getByLabel("E-mail").fill(email);
    await golfer.getByLabel(/^Password/).fill(PASSWORD);
    await golfer.getByRole("button", { name: "Create account and continue" }).click();
    await golfer.getByLabel("Usual miss").fill("leaves it short");
    await golfer.getByRole("button", { name: /^Request / }).click();
    await golfer.getByRole("heading", { name: "Request sent" }).waitFor();

    await golfer.getByRole("button", { name: /^Pay .* now$/ }).click();
    await golfer.waitForURL(`${PAYMENTS_URL}/pay/**`);
    expect(await golfer.locator("#amount").textContent()).toBe("95.00 GBP");
    await golfer.getByRole("button", { name: "Pay" }).click();
    await golfer.waitForURL(`${BASE}/book/${w.studioA.slug}/bookings?paid=*`);
    const card = golfer.locator("[data-booking]");
    await card.locator('[data-payment="paid"]').waitFor();
    expect(await card.locator("[data-status]").getAttribute("data-status")).toBe("requested");

    const fitter = await (await browser.newContext()).newPage();
    await signInThroughForm(fitter, w.fitter.email);
    await fitter.goto(`${BASE}/studio/calendar?week=${slot.day}`);
    const visit = fitter.locator("[data-booking]", { hasText: "Booker Test" });
    expect(await visit.locator("[data-payment]").getAttribute("data-payment")).toBe("paid");
    await visit.getByRole("button", { name: "Confirm" }).click();
    await visit.locator('[data-status="confirmed"]').waitFor();

    await golfer.goto(`${BASE}/book/${w.studioA.slug}/bookings`);
    await golfer.locator('[data-booking] [data-status="confirmed"]').waitFor();
    expect(await golfer.locator("[data-booking] [data-payment]").getAttribute("data-payment")).toBe("paid");
    await golfer.goto(`${BASE}/me`);
    const fittings = golfer.getByRole("region", { name: "Your fittings" });
    expect(await fittings.locator("li").count()).toBe(1);
    expect(await fittings.locator("li").textContent()).toContain("booked");

    // Moving the visit from the golfer's home: another free time of the same fitting type.
    const booked = golfer.locator("[data-booking]");
    const shownBefore = await booked.locator(".num").first().textContent();
    await booked.getByRole("button", { name: "Move visit" }).click();
    const times = booked.getByLabel("New time");
    await times.locator("option").nth(2).waitFor({ state: "attached" });
    const target = (await times.locator("option").nth(2).getAttribute("value"))!;
    await times.selectOption(target);
    await booked.getByRole("button", { name: "Move to this time" }).click();
    await booked.getByRole("button", { name: "Move visit" }).waitFor();
    await expect.poll(() => booked.locator(".num").first().textContent()).not.toBe(shownBefore);
    const [moved] = await db.select().from(schema.bookings).where(eq(schema.bookings.startsAt, new Date(target.split("|")[0]!)));
    expect(moved).toBeDefined();
  });
});

describe("opening hours", () => {
  it("the admin gives a fitter a split Monday, and an overlap is refused with the reason", async () => {
    const admin = await (await browser.newContext()).newPage();
    await signInThroughForm(admin, w.admin.email);
    await admin.goto(`${BASE}/studio/availability`);
    const hours = admin.getByRole("region", { name: `Opening hours of ${w.fitter2.name}` });
    await hours.getByRole("button", { name: "Add hours on Monday" }).click();
    await hours.getByLabel("Monday window 1 closes").fill("12:00");
    await hours.getByRole("button", { name: "Add hours on Monday" }).click();
    expect(await hours.getByLabel("Monday window 2 opens").inputValue()).toBe("13:00");
    await hours.getByLabel("Monday window 2 closes").fill("18:00");
    await hours.getByRole("button", { name: "Save hours" }).click();
    await hours.getByRole("button", { name: "Saved" }).waitFor();
    const rules = await db.select().from(schema.availabilityRules).where(eq(schema.availabilityRules.fitterUserId, w.fitter2.id));
    expect(rules.map((r) => [r.weekday, r.startMinute, r.endMinute]).sort((a, b) => a[1]! - b[1]!)).toEqual([[1, 540, 720], [1, 780, 1080]]);

    await admin.reload();
    expect(await hours.getByLabel("Monday window 2 opens").inputValue()).toBe("13:00");
    await hours.getByLabel("Monday window 2 opens").fill("11:00");
    await hours.getByRole("button", { name: "Save hours" }).click();
    expect(await hours.getByRole("alert").textContent()).toMatch(/overlap/);
  });
});
