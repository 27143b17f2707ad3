import { afterAll, beforeAll, expect, test, vi } from "vitest";
import type { Browser } from "playwright-core";
import { cs2cs } from "~/fabric/test-support/reference-tools.server";
import { launchBrowser, newPage, signIn } from "./support/browser";
import { get } from "./support/http";
import { plannerCookie, readAlternative, waitForEditor } from "./alternative-helpers";

// Map journeys draw with software WebGL and wait for live previews: on a busy machine one can pass a minute.
vi.setConfig({ testTimeout: 180_000 });

let browser: Browser;
beforeAll(async () => {
  browser = await launchBrowser();
});
afterAll(async () => {
  await browser?.close();
});

test("a planner starts a new alternative as a straight line across the fabric: it is placed where PROJ puts the fabric's middle, and opens in the editor", async () => {
  const cookie = await plannerCookie();
  const page = await newPage(browser);
  await signIn(page, "planner@demo.test", "takeline-demo");
  await page.getByRole("link", { name: "Quillmere Eastern Bypass" }).click();
  await page.getByRole("button", { name: "New alternative" }).click();
  await page.getByLabel("Name of the alternative").fill("Straight test line");
  await page.getByLabel("Start from").selectOption("line");
  await Promise.all([page.waitForURL(/\/alternatives\/\d+$/), page.getByRole("button", { name: "Create and open" }).click()]);
  await waitForEditor(page);
  await expect(page.getByRole("heading", { name: "Straight test line" }).count()).resolves.toBe(1);
  await expect(page.getByTestId("pi-table").locator("tbody tr").count()).resolves.toBe(2);

  const id = Number(new URL(page.url()).pathname.split("/").pop());
  const created = await readAlternative(id, cookie);
  const layers = (await (await get(`/api/v1/projects/${created.projectId}/layers`, { cookie })).json()) as { layers: { kind: string; bbox: [number, number, number, number] }[] };
  const bbox = layers.layers.find((l) => l.kind === "parcels")!.bbox;
  // Reference: PROJ cs2cs EPSG:32617 → EPSG:4326 (latitude, longitude out). The line runs west to
  // east along the box's middle latitude, from 20 % to 80 % of its width; coordinates are rounded
  // to the metre, so ±1 m ≈ 1.3e-5° of longitude and 0.9e-5° of latitude here.
  const [start, end] = cs2cs(32617, 4326, created.alignment.points.map((p) => [p.x, p.y]));
  const midLat = (bbox[1] + bbox[3]) / 2;
  const span = bbox[2] - bbox[0];
  expect(Math.abs(start![0] - midLat)).toBeLessThan(2e-5);
  expect(Math.abs(end![0] - midLat)).toBeLessThan(2e-5);
  expect(Math.abs(start![1] - (bbox[0] + 0.2 * span))).toBeLessThan(2e-5);
  expect(Math.abs(end![1] - (bbox[2] - 0.2 * span))).toBeLessThan(2e-5);
  await page.context().close();
});
