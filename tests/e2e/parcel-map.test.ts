import { afterAll, beforeAll, expect, test } from "vitest";
import type { Browser, Page } from "playwright-core";
import { launchBrowser, newPage, signIn } from "./support/browser";
import { countDifferentPixels } from "./support/pixels";

let browser: Browser;
beforeAll(async () => {
  browser = await launchBrowser();
});
afterAll(async () => {
  await browser?.close();
});

async function waitForMap(page: Page) {
  await page.waitForFunction(() => (window as unknown as { __takelineMapReady?: boolean }).__takelineMapReady === true, null, { timeout: 30_000 });
  // Tiles arrive after the style: give them a moment to draw.
  await page.waitForTimeout(2500);
}

test("the demo project's map draws its parcels: turning the layer off changes many pixels", async () => {
  const page = await newPage(browser);
  await signIn(page, "manager@demo.test", "takeline-demo");
  await page.getByRole("link", { name: "Quillmere Eastern Bypass" }).click();
  await waitForMap(page);
  const map = page.getByTestId("project-map");
  const withParcels = await map.screenshot();
  await page.getByLabel("Ostrand County parcels").uncheck();
  await page.getByLabel("Building footprints").uncheck();
  await page.waitForTimeout(800);
  const without = await map.screenshot();
  expect(countDifferentPixels(withParcels, without)).toBeGreaterThan(20_000);
  await page.context().close();
});

test("a planner uploads the demo Shapefile to a new project, checks the guessed fields, loads it and sees it mapped", async () => {
  const page = await newPage(browser);
  await signIn(page, "planner@demo.test", "takeline-demo");
  await page.goto("/projects/new");
  await page.getByLabel("Name").fill("Upload journey");
  await Promise.all([page.waitForURL(/\/projects\/\d+$/), page.getByRole("button", { name: "Create project" }).click()]);
  await page.getByLabel("Parcel file").setInputFiles("data/demo/quillmere-parcels.zip");
  await page.getByRole("button", { name: "Read the file" }).click();
  await page.getByTestId("sample-table").waitFor({ timeout: 60_000 });
  await expect(page.getByLabel("Field for Parcel ID").inputValue()).resolves.toBe("APN");
  await expect(page.getByLabel("Field for Owner").inputValue()).resolves.toBe("OWNER_NM");
  await page.getByRole("button", { name: /^Load 3,015 parcels$/ }).click();
  await page.getByRole("status").filter({ hasText: "Loaded 3,015 parcels" }).waitFor({ timeout: 60_000 });
  await page.getByRole("cell", { name: "EPSG:32617" }).waitFor();
  await waitForMap(page);
  // The first layer fixed the project's working CRS: the UTM zone of the fabric's centre (EPSG:32617).
  await expect(page.getByText("Working CRS", { exact: true }).locator("..").textContent()).resolves.toContain("EPSG:32617");
  await page.context().close();
});
