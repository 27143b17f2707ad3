import { afterAll, beforeAll, expect, test, vi } from "vitest";
import type { Browser, Page } from "playwright-core";
import { formatCost, formatNumber } from "~/components/alternatives/format";
import { baseUrl, launchBrowser, newPage, signIn } from "./support/browser";
import { get, postJson } from "./support/http";
import { bearer, newProject, postLayer, shapefileZip } from "./support/layer-uploads";
import { waitForEditor, waitForPreview, waitForSaved } from "./alternative-helpers";

// Map journeys draw with software WebGL and wait for live previews: on a busy machine one can pass a minute.
vi.setConfig({ testTimeout: 180_000 });

// Four invented 100 m × 100 m lots side by side along y = 0..100 (EPSG:32617, metres), written
// by GDAL's ogr2ogr. A straight line along y = 50 with 20 + 20 m of right-of-way takes
// 100 × 40 = 4 000 m² of each and leaves two 30 × 100 = 3 000 m² pieces (closed-form rectangles).
const X0 = 561000;
const Y0 = 4417000;
const lot = (i: number) => `POLYGON ((${X0 + 100 * i} ${Y0}, ${X0 + 100 * (i + 1)} ${Y0}, ${X0 + 100 * (i + 1)} ${Y0 + 100}, ${X0 + 100 * i} ${Y0 + 100}, ${X0 + 100 * i} ${Y0}))`;
const straight = { units: "m", startStation: 0, points: [{ x: X0 - 50, y: Y0 + 50 }, { x: X0 + 450, y: Y0 + 50 }] };
const CORRIDOR = { left: 20, right: 20 };

type Stored = { version: number; corridor: { ranges?: unknown[] }; rules: Record<string, number>; acceptedChecks: { id: string }[]; alignment: { points: { x: number; y: number; curve?: unknown }[] }; summary: { corridorArea: number; takeArea: number; estimatedCost: number; fullTakes: number; partialTakes: number } };

let browser: Browser;
let planner: Record<string, string>;
let projectId: number;
beforeAll(async () => {
  const zip = shapefileZip([0, 1, 2, 3].map((i) => ({ wkt: lot(i), APN: `QS-70${i}`, OWNER_NM: `Settings Owner ${i}` })), "EPSG:32617");
  planner = await bearer("planner@demo.test");
  projectId = await newProject(planner, { name: "Quillmere Settings Strip", units: "m", crs: "EPSG:32617" });
  expect((await postLayer(projectId, planner, zip, "strip.zip")).status).toBe(201);
  browser = await launchBrowser();
});
afterAll(async () => {
  await browser?.close();
});

async function createAlternative(body: Record<string, unknown>): Promise<{ id: number; version: number }> {
  const res = await postJson(`/api/v1/projects/${projectId}/alternatives`, { alignment: straight, corridor: CORRIDOR, ...body }, planner);
  expect(res.status).toBe(201);
  return (await res.json()) as { id: number; version: number };
}

async function openEditor(id: number): Promise<Page> {
  const page = await newPage(browser);
  await signIn(page, "planner@demo.test", "takeline-demo");
  await page.goto(`/projects/${projectId}/alternatives/${id}`);
  await waitForEditor(page);
  return page;
}

test("a width range on the tangent adds Δw·(L + T) to the right-of-way; an overlapping one is refused; undo takes it back", async () => {
  const alt = await createAlternative({ name: "Settings widening" });
  const page = await openEditor(alt.id);
  const corridorTotal = page.getByTestId("total-corridorArea");
  // 500 m × 40 m, straight: 20 000 m².
  await expect(corridorTotal.textContent()).resolves.toBe(`${formatNumber(20_000, 1)} m²`);

  const ranges = page.getByTestId("width-ranges");
  await ranges.getByLabel("New range from station", { exact: true }).fill("0+150.000");
  await ranges.getByLabel("New range to station", { exact: true }).fill("0+250.000");
  await ranges.getByLabel("New range right half-width (m)", { exact: true }).fill("30");
  await ranges.getByLabel("New range transition (m)", { exact: true }).fill("20");
  await ranges.getByRole("button", { name: "Add range" }).click();
  // Right half-width 20 → 30 over 100 m with 20 m linear tapers each side (closed form, a trapezoid):
  // Δw·L + 2·(½·Δw·T) = 10·100 + 10·20 = 1 200 m². All of it lies inside the lots (stations 130…270
  // are x = X0 + 80…220; y 20…30), so the take grows by the same amount.
  await corridorTotal.filter({ hasText: formatNumber(21_200, 1) }).waitFor({ timeout: 30_000 });
  await waitForPreview(page);
  await expect(page.getByTestId("total-takeArea").textContent()).resolves.toBe(`${formatNumber(16_000 + 1_200, 1)} m²`);
  await expect(ranges.getByLabel("Range 1 from station", { exact: true }).inputValue()).resolves.toBe("0+150.000");
  await waitForSaved(page, alt.version + 1);
  const saved = await storedOf(alt.id);
  expect(saved.corridor.ranges).toEqual([{ fromStation: 150, toStation: 250, right: 30, transition: 20 }]);
  expect(saved.summary.corridorArea).toBeCloseTo(21_200, 6);

  // Its taper would start at 0+240, inside the first range's (which ends at 0+270): refused, nothing changes.
  await ranges.getByLabel("New range from station", { exact: true }).fill("0+260.000");
  await ranges.getByLabel("New range to station", { exact: true }).fill("0+300.000");
  await ranges.getByLabel("New range transition (m)", { exact: true }).fill("20");
  await ranges.getByLabel("New range transition (m)", { exact: true }).press("Enter");
  await expect(ranges.getByRole("alert").textContent()).resolves.toMatch(/overlaps range 1 \(tapers included/);
  const beyond = ranges.getByLabel("Range 1 to station", { exact: true });
  await beyond.fill("0+600.000");
  await beyond.press("Enter");
  await expect(ranges.getByRole("alert").first().textContent()).resolves.toContain("ends beyond the alignment's last station, 0+500.000");
  await beyond.press("Escape");
  await expect(ranges.locator("tbody tr").filter({ hasText: "Range" }).count()).resolves.toBe(1);

  await page.locator("h1").click();
  await page.keyboard.press("Control+Z");
  await corridorTotal.filter({ hasText: formatNumber(20_000, 1) }).waitFor({ timeout: 30_000 });
  await waitForSaved(page, alt.version + 2);
  expect((await storedOf(alt.id)).corridor.ranges).toBeUndefined();
  await page.context().close();
});

// The cost lines of app/geometry/take-costs.ts (land = value × area, or × the whole parcel for a
// full take; severance % of land on a partial take; administration per parcel; contingency % of
// the rest), with the placeholder defaults (app/calculations/take-rules.ts) under the project's
// 30 % contingency, worked by hand:
const perLot = (land: number, severance: number, admin: number) => 1.3 * (land + severance + admin);
const PARTIAL = (admin: number) => 4 * perLot(60 * 4000, 0.15 * 60 * 4000, admin);
const FULL = (admin: number) => 4 * perLot(60 * 10_000, 0, admin);

test("overriding the remnant threshold and the cost per parcel changes classification and estimate; clearing an override restores it", async () => {
  const alt = await createAlternative({ name: "Settings rules" });
  const patched = await fetch(`${baseUrl()}/api/v1/projects/${projectId}`, { method: "PATCH", headers: { "content-type": "application/json", ...planner }, body: JSON.stringify({ takeRules: { contingencyPercent: 30 } }) });
  expect(patched.status).toBe(200);
  const page = await openEditor(alt.id);
  const rules = page.getByTestId("take-rules");
  await expect(rules.textContent()).resolves.toContain("order-of-magnitude estimate, not an appraisal");
  await expect(page.getByTestId("rule-source-adminCostPerParcel").textContent()).resolves.toBe("placeholder default");
  await expect(page.getByTestId("rule-source-contingencyPercent").textContent()).resolves.toBe("project");
  await expect(rules.getByLabel("Contingency (% of the other lines)", { exact: true }).inputValue()).resolves.toBe("30");
  await expect(page.getByTestId("total-estimatedCost").textContent()).resolves.toBe(formatCost(PARTIAL(12_000)));

  const admin = rules.getByLabel("Appraisal, title and closing (currency per parcel with a take)", { exact: true });
  await admin.fill("20000");
  await admin.press("Enter");
  await page.getByTestId("total-estimatedCost").filter({ hasText: formatCost(PARTIAL(20_000)) }).waitFor({ timeout: 30_000 });
  await expect(page.getByTestId("rule-source-adminCostPerParcel").textContent()).resolves.toBe("this alternativeplaceholder default: 12,000");
  await waitForSaved(page, alt.version + 1);

  // Each lot keeps two 3 000 m² pieces: under a 3 500 m² threshold both are uneconomic remnants, so
  // every take is full (49 CFR 24.102(k); the threshold is the project's own, common practice).
  const remnant = rules.getByLabel("Smallest usable remainder (m²)", { exact: true });
  await remnant.fill("3500");
  await remnant.press("Enter");
  await page.getByTestId("total-parcelsAffected").filter({ hasText: "4 (0 partial, 4 full)" }).waitFor({ timeout: 30_000 });
  await waitForPreview(page);
  await expect(page.getByTestId("total-estimatedCost").textContent()).resolves.toBe(formatCost(FULL(20_000)));
  await waitForSaved(page, alt.version + 2);
  const saved = await storedOf(alt.id);
  expect(saved.rules).toEqual({ adminCostPerParcel: 20_000, remnantMinArea: 3500 });
  expect(saved.summary.fullTakes).toBe(4);
  expect(saved.summary.estimatedCost).toBeCloseTo(FULL(20_000), 6);

  await rules.getByRole("button", { name: "Clear the override of smallest usable remainder" }).click();
  await page.getByTestId("total-parcelsAffected").filter({ hasText: "4 (4 partial, 0 full)" }).waitFor({ timeout: 30_000 });
  await waitForPreview(page);
  await expect(page.getByTestId("total-estimatedCost").textContent()).resolves.toBe(formatCost(PARTIAL(20_000)));
  await waitForSaved(page, alt.version + 3);
  expect((await storedOf(alt.id)).rules).toEqual({ adminCostPerParcel: 20_000 });
  await page.context().close();
});

test("a PI inserted from the keyboard lands mid-tangent, takes focus for its coordinates, and an acceptance it makes stale can be dropped", async () => {
  // POB → PI 1 (R 150) → POE. Δ = atan(100 / 250) = 21.801°, T = R·tan(Δ/2) (Schofield & Breach,
  // Engineering Surveying, 6th ed., §10.1); the tangent from the POB ends at the PC, 250 − T along.
  const points = [{ x: X0 - 50, y: Y0 + 50 }, { x: X0 + 200, y: Y0 + 50, curve: { type: "simple", radius: 150 } }, { x: X0 + 450, y: Y0 + 150 }];
  const reason = "Tie-in to the existing junction fixes this curve.";
  const alt = await createAlternative({ name: "Settings bend", alignment: { ...straight, points }, acceptedChecks: [{ id: "min-radius:pi-1", reason }] });
  const page = await openEditor(alt.id);
  const t = 150 * Math.tan(Math.atan(100 / 250) / 2);
  const expectedX = X0 - 50 + (250 - t) / 2;

  await page.getByLabel("POB x", { exact: true }).focus();
  for (let i = 0; i < 12; i++) {
    if ((await page.evaluate(() => document.activeElement?.getAttribute("aria-label"))) === "Insert a PI after POB") break;
    await page.keyboard.press("Tab");
  }
  await page.keyboard.press("Enter");
  await expect(page.getByTestId("pi-table").locator("tbody tr").count()).resolves.toBe(4);
  await expect(page.evaluate(() => document.activeElement?.getAttribute("aria-label"))).resolves.toBe("PI 1 x");
  await expect(page.getByTestId("pi-table-announcement").textContent()).resolves.toBe("PI 1 inserted after POB. Type its x and y.");
  expect(Math.abs(Number(await page.getByLabel("PI 1 x", { exact: true }).inputValue()) - expectedX)).toBeLessThanOrEqual(0.0005);
  await expect(page.getByLabel("PI 1 y", { exact: true }).inputValue()).resolves.toBe(String(Y0 + 50));
  // The old PI 1 (with its curve) is PI 2 now.
  await expect(page.getByLabel("PI 2 curve", { exact: true }).inputValue()).resolves.toBe("simple");

  // The acceptance named PI 1; the curve it was for is now PI 2, so it no longer applies.
  await waitForPreview(page);
  const stale = page.getByTestId("stale-acceptances");
  await stale.waitFor({ timeout: 30_000 });
  await expect(stale.textContent()).resolves.toContain(`min-radius at PI 1`);
  await expect(stale.textContent()).resolves.toContain(reason);
  await expect(page.getByTestId("design-checks").locator("li").filter({ hasText: /PI 2: radius 150 is below the minimum/ }).count()).resolves.toBe(1);

  await page.keyboard.press("Control+A");
  await page.keyboard.type(String(X0 + 60));
  await page.keyboard.press("Tab");
  await page.keyboard.press("Control+A");
  await page.keyboard.type(String(Y0 + 45));
  await page.keyboard.press("Enter");
  await stale.getByRole("button", { name: "Drop the acceptance of min-radius at PI 1" }).click();
  await stale.waitFor({ state: "detached" });
  await expect.poll(async () => {
    const s = await storedOf(alt.id);
    return { points: s.alignment.points.map((p) => [p.x, p.y, p.curve !== undefined]), accepted: s.acceptedChecks };
  }, { timeout: 30_000 }).toEqual({
    points: [[X0 - 50, Y0 + 50, false], [X0 + 60, Y0 + 45, false], [X0 + 200, Y0 + 50, true], [X0 + 450, Y0 + 150, false]],
    accepted: [],
  });
  await page.context().close();
});

/** The alternative as the API stores it. */
async function storedOf(id: number): Promise<Stored> {
  const res = await get(`/api/v1/alternatives/${id}`, planner);
  expect(res.status).toBe(200);
  return (await res.json()) as Stored;
}
