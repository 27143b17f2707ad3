import { chromium, type Browser, type Page } from "playwright-core";
import { inject } from "vitest";

export const CHROMIUM_PATH = process.env.CHROMIUM_PATH ?? "/usr/bin/chromium";

/** Debian's Chromium, headless (playwright gives it a fresh profile in the temp folder), with the flags that keep it off the (closed) network. */
export function launchBrowser(): Promise<Browser> {
  return chromium.launch({
    executablePath: CHROMIUM_PATH,
    headless: true,
    args: [
      "--no-sandbox",
      "--disable-gpu",
      "--disable-quic",
      "--no-first-run",
      "--disable-background-networking",
      "--disable-component-update",
      "--disable-sync",
    ],
  });
}

export function baseUrl(): string {
  return inject("baseUrl");
}

/** A fresh page whose console errors (other than refused 4xx requests the test provokes) and failed requests to other hosts fail the test. */
export async function newPage(browser: Browser): Promise<Page> {
  const context = await browser.newContext({ baseURL: baseUrl() });
  const page = await context.newPage();
  const origin = new URL(baseUrl()).origin;
  page.on("console", (msg) => {
    if (msg.type() === "error" && !/status of 4\d\d/.test(msg.text())) console.error(`browser console: ${msg.text()}`);
  });
  page.on("request", (req) => {
    const url = new URL(req.url());
    if (url.protocol.startsWith("http") && url.origin !== origin) console.error(`request left the app: ${req.url()}`);
  });
  return page;
}

export async function signIn(page: Page, email: string, password: string): Promise<void> {
  await page.goto("/sign-in");
  await page.getByLabel("E-mail").fill(email);
  await page.getByLabel("Password").fill(password);
  await Promise.all([page.waitForURL((u) => !u.pathname.startsWith("/sign-in")), page.getByRole("button", { name: "Sign in" }).click()]);
}

export async function signOut(page: Page): Promise<void> {
  await Promise.all([page.waitForURL("**/sign-in"), page.getByRole("button", { name: "Sign out" }).click()]);
}
