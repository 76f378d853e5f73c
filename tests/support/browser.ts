// Debian's Chromium driven by playwright-core (never a downloaded browser).
import { chromium, type Browser, type Page } from "playwright-core";
import { BASE } from "./http";

export async function launchBrowser(): Promise<Browser> {
  return chromium.launch({
    executablePath: process.env.CHROMIUM_PATH ?? "/usr/bin/chromium",
    args: ["--headless", "--no-sandbox", "--disable-gpu", "--disable-quic", "--no-first-run", "--disable-background-networking", "--disable-component-update", "--disable-sync"],
  });
}

/** Fills and sends the sign-in form; the caller waits for where it should land. */
export async function submitSignIn(page: Page, email: string, password: string): Promise<void> {
  await page.goto(`${BASE}/sign-in`);
  await page.getByLabel("E-mail").fill(email);
  await page.getByLabel("Password").fill(password);
  await page.getByRole("button", { name: "Sign in" }).click();
}
