import { afterAll, beforeAll, expect, test, vi } from "vitest";
import type { Browser } from "playwright-core";
import { formatCost, formatNumber } from "~/components/alternatives/format";
import { launchBrowser, newPage, signIn } from "./support/browser";
import { get, sessionCookie } from "./support/http";
import { countDifferentPixels } from "./support/pixels";

// Map journeys draw with software WebGL and wait for live previews: on a busy machine one can pass a minute.
vi.setConfig({ testTimeout: 180_000 });

let browser: Browser;
beforeAll(async () => {
  browser = await launchBrowser();
});
afterAll(async () => {
  await browser?.close();
});

type Summary = { takeArea: number; parcelsAffected: number; displacements: number; estimatedCost: number; length: number };
type Comparison = {
  alternatives: { id: number; name: string; summary: Summary }[];
  matrix: { parcelId: string; takes: { alternativeId: number; takeArea: number }[] }[];
};

async function readComparison(cookie: string): Promise<{ projectId: number; comparison: Comparison }> {
  const projects = (await (await get("/api/v1/projects", { cookie })).json()) as { projects: { id: number; name: string }[] };
  const projectId = projects.projects.find((p) => p.name === "Quillmere Eastern Bypass")!.id;
  const res = await get(`/api/v1/projects/${projectId}/comparison`, { cookie });
  expect(res.status).toBe(200);
  return { projectId, comparison: (await res.json()) as Comparison };
}

test("a manager compares the demo alternatives: the table, charts, map and parcel matrix show the API's figures", async () => {
  const cookie = await sessionCookie("manager@demo.test");
  const { comparison } = await readComparison(cookie);
  const { alternatives, matrix } = comparison;
  // The demo seeds three alternatives (earlier journeys may have added more).
  expect(alternatives.length).toBeGreaterThanOrEqual(3);
  const page = await newPage(browser);
  await page.setViewportSize({ width: 1280, height: 1000 });
  await signIn(page, "manager@demo.test", "takeline-demo");
  await page.getByRole("link", { name: "Quillmere Eastern Bypass" }).click();
  await page.getByRole("link", { name: "Compare alternatives" }).click();

  const table = page.getByTestId("comparison-table");
  await table.locator("tbody tr").first().waitFor();
  await expect(table.locator("tbody tr").count()).resolves.toBe(alternatives.length);
  for (const a of alternatives) {
    const row = table.locator("tbody tr").filter({ has: page.getByRole("link", { name: a.name, exact: true }) });
    const text = await row.textContent();
    expect(text).toContain(formatNumber(a.summary.takeArea, 0));
    expect(text).toContain(formatCost(a.summary.estimatedCost));
    expect(text).toContain(formatNumber(a.summary.length, 1));
  }

  // Sorting by take area puts the largest (or smallest) first, as aria-sort says.
  await table.getByRole("button", { name: /Take area/ }).click();
  const sort = await table.locator("th", { has: page.getByRole("button", { name: /Take area/ }) }).getAttribute("aria-sort");
  const byTake = [...alternatives].sort((x, y) => x.summary.takeArea - y.summary.takeArea);
  const expectedFirst = sort === "descending" ? byTake[byTake.length - 1]! : byTake[0]!;
  expect(sort === "ascending" || sort === "descending").toBe(true);
  await expect(table.locator("tbody tr").first().textContent()).resolves.toContain(expectedFirst.name);

  await page.getByLabel("Filter alternatives by name or status").fill(alternatives[1]!.name);
  await expect(table.locator("tbody tr").count()).resolves.toBe(1);
  await page.getByLabel("Filter alternatives by name or status").fill("");
  const headers = await table.locator("thead th").count();
  await page.getByText("Columns", { exact: true }).click();
  await page.getByLabel("Cost estimate", { exact: true }).uncheck();
  await expect(table.locator("thead th").count()).resolves.toBe(headers - 1);

  // One bar per alternative in each of the six metric charts.
  const charts = page.getByTestId("metric-chart");
  await expect(charts.count()).resolves.toBe(6);
  for (let i = 0; i < 6; i++) await expect(charts.nth(i).locator("rect").count()).resolves.toBe(alternatives.length);

  // The map: switching which alternative's takes are shown redraws them.
  await page.waitForFunction(() => (window as unknown as { __takelineMapReady?: boolean }).__takelineMapReady === true, null, { timeout: 45_000 });
  await page.waitForTimeout(5000);
  const map = page.getByTestId("comparison-map");
  const first = await map.screenshot();
  await page.getByLabel(`Show the takes of ${alternatives[1]!.name} on the map`).check();
  await page.waitForTimeout(1500);
  expect(countDifferentPixels(first, await map.screenshot())).toBeGreaterThan(300);

  // The matrix lists every parcel any alternative takes, filterable by who takes it.
  const matrixStatus = page.getByRole("status").filter({ hasText: /parcels?$/ });
  await expect(matrixStatus.textContent()).resolves.toBe(`${matrix.length} parcels`);
  await page.getByLabel("Taken by").selectOption("all");
  const byAll = matrix.filter((r) => r.takes.length === alternatives.length).length;
  await expect(matrixStatus.textContent()).resolves.toBe(`${byAll} parcel${byAll === 1 ? "" : "s"}`);
  await page.getByLabel("Taken by").selectOption("any");
  const sample = matrix.find((r) => r.takes.length >= 2) ?? matrix[0]!;
  await page.getByLabel("Filter parcels by ID, owner or address").fill(sample.parcelId);
  const rows = page.getByTestId("parcel-matrix").locator("tbody tr");
  await expect(rows.count()).resolves.toBeGreaterThanOrEqual(1);
  const row = rows.filter({ hasText: sample.parcelId }).first();
  for (const t of sample.takes) await expect(row.textContent()).resolves.toContain(formatNumber(t.takeArea, 1));
  await page.context().close();
});
