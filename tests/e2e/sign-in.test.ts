// Each role signs in through the real page in Chromium and lands on its own home.
import type { Browser } from "playwright-core";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
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

async function signInThroughForm(email: string, password: string) {
  const page = await browser.newPage();
  await submitSignIn(page, email, password);
  return page;
}

describe("sign-in page", () => {
  const homes = [
    { who: "admin", email: (x: World) => x.admin.email, path: "/studio", heading: "Today in the studio" },
    { who: "fitter", email: (x: World) => x.fitter.email, path: "/studio", heading: "Today in the studio" },
    { who: "coach", email: (x: World) => x.coach.email, path: "/studio", heading: "Golfers shared with you" },
    { who: "golfer", email: (x: World) => x.own.account.email, path: "/me", heading: "Hello, golfer" },
  ];
  for (const home of homes) {
    it(`the ${home.who} lands on its home`, async () => {
      const page = await signInThroughForm(home.email(w), PASSWORD);
      await page.waitForURL(`${BASE}${home.path}`);
      await expect(page.getByRole("heading", { level: 1 }).textContent()).resolves.toBe(home.heading);
      await page.close();
    });
  }

  it("a wrong password shows a clear message and stays on the page", async () => {
    const page = await signInThroughForm(w.fitter.email, "wrong password");
    // Next.js keeps a route announcer with role=alert too: take the form's own.
    const alert = page.locator("form [role=alert]");
    await alert.waitFor();
    expect(await alert.textContent()).toBe("That e-mail and password do not match an account.");
    expect(new URL(page.url()).pathname).toBe("/sign-in");
    await page.close();
  });

  it("the coach sees only the golfer shared with it", async () => {
    const page = await signInThroughForm(w.coach.email, PASSWORD);
    await page.waitForURL(`${BASE}/studio`);
    const text = await page.locator("main").textContent();
    expect(text).toContain(w.own.golfer.name);
    expect(text).not.toContain(w.sibling.golfer.name);
    await page.close();
  });
});
