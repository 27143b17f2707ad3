import { afterAll, beforeAll, expect, test } from "vitest";
import type { Browser } from "playwright-core";
import { launchBrowser, newPage, signIn, signOut } from "./support/browser";

// Each demo role signs in, lands on its own home, is refused a page of another role, and signs out.
const JOURNEYS = [
  { email: "admin@demo.test", home: "/admin/users", heading: "People", refused: "/projects/new", needs: "Planner" },
  { email: "planner@demo.test", home: "/projects", heading: "Projects", refused: "/admin/users", needs: "Administrator" },
  { email: "manager@demo.test", home: "/projects", heading: "Projects", refused: "/projects/new", needs: "Planner" },
  { email: "agent@demo.test", home: "/work", heading: "My parcels", refused: "/projects", needs: "Administrator or Planner or Manager or Analyst" },
  { email: "agent2@demo.test", home: "/work", heading: "My parcels", refused: "/admin/users", needs: "Administrator" },
  { email: "analyst@demo.test", home: "/projects", heading: "Projects", refused: "/projects/new", needs: "Planner" },
];

let browser: Browser;
beforeAll(async () => {
  browser = await launchBrowser();
});
afterAll(async () => {
  await browser?.close();
});

for (const j of JOURNEYS) {
  test(`${j.email} signs in to ${j.home}, is refused ${j.refused}, and signs out`, async () => {
    const page = await newPage(browser);
    await signIn(page, j.email, "takeline-demo");
    expect(new URL(page.url()).pathname).toBe(j.home);
    await expect(page.getByRole("heading", { level: 1 }).textContent()).resolves.toBe(j.heading);

    const refused = await page.goto(j.refused);
    expect(refused?.status()).toBe(403);
    await expect(page.getByTestId("forbidden").textContent()).resolves.toContain(j.needs);

    await page.goto(j.home);
    await signOut(page);
    const after = await page.goto(j.home);
    expect(new URL(page.url()).pathname).toBe("/sign-in");
    expect(after?.status()).toBe(200);
    await page.context().close();
  });
}

test("the demo sign-in page lists the demo accounts and a wrong password is refused on the form", async () => {
  const page = await newPage(browser);
  await page.goto("/sign-in");
  await expect(page.getByText("agent2@demo.test").count()).resolves.toBe(1);
  await page.getByLabel("E-mail").fill("planner@demo.test");
  await page.getByLabel("Password").fill("not the password");
  await page.getByRole("button", { name: "Sign in" }).click();
  await page.getByRole("alert").waitFor();
  await expect(page.getByRole("alert").textContent()).resolves.toContain("do not match");
  expect(new URL(page.url()).pathname).toBe("/sign-in");
  await page.context().close();
});
