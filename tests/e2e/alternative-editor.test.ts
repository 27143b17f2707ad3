import { afterAll, beforeAll, expect, test, vi } from "vitest";
import type { Browser } from "playwright-core";
import { formatNumber } from "~/components/alternatives/format";
import { launchBrowser, newPage, signIn } from "./support/browser";
import { countDifferentPixels } from "./support/pixels";
import { listDemoAlternatives, plannerCookie, readAlternative, shownNumber, waitForEditor, waitForPreview, waitForSaved } from "./alternative-helpers";

// Map journeys draw with software WebGL and wait for live previews: on a busy machine one can pass a minute.
vi.setConfig({ testTimeout: 180_000 });

let browser: Browser;
beforeAll(async () => {
  browser = await launchBrowser();
});
afterAll(async () => {
  await browser?.close();
});

test("a planner moves a PI of the demo's first alternative: take totals and map change, the edit is autosaved and survives a reload", async () => {
  const cookie = await plannerCookie();
  const [first] = await listDemoAlternatives(cookie);
  const before = await readAlternative(first!.id, cookie);
  const page = await newPage(browser);
  await signIn(page, "planner@demo.test", "takeline-demo");
  await page.getByRole("link", { name: "Quillmere Eastern Bypass" }).click();
  await page.getByRole("link", { name: before.name }).click();
  await waitForEditor(page);
  // What the page shows is what the server stored for this version.
  await expect(page.getByTestId("total-takeArea").textContent()).resolves.toContain(formatNumber(before.summary.takeArea, 1));
  const map = page.getByTestId("alternative-map");
  const mapBefore = await map.screenshot();

  const x0 = before.alignment.points[1]!.x;
  const xInput = page.getByLabel("PI 1 x", { exact: true });
  await xInput.fill(String(x0 + 60));
  await xInput.press("Enter");
  await page.getByTestId("total-takeArea").filter({ hasNotText: formatNumber(before.summary.takeArea, 1) }).waitFor();
  await waitForPreview(page);
  await page.waitForTimeout(1200);
  const mapAfter = await map.screenshot();
  // The corridor, takes and PI marker moved: a band of pixels along two legs changes.
  expect(countDifferentPixels(mapBefore, mapAfter)).toBeGreaterThan(800);
  const shownTake = shownNumber(await page.getByTestId("total-takeArea").textContent());

  await waitForSaved(page, before.version + 1);
  const saved = await readAlternative(first!.id, cookie);
  expect(saved.version).toBe(before.version + 1);
  expect(saved.alignment.points[1]!.x).toBe(x0 + 60);
  expect(saved.alignment.points[1]!.y).toBe(before.alignment.points[1]!.y);
  // The server's own figures for the saved version match what the editor showed while editing.
  expect(Math.abs(saved.summary.takeArea - shownTake)).toBeLessThan(0.06);
  expect(saved.summary.takeArea).not.toBeCloseTo(before.summary.takeArea, 0);

  await page.reload();
  await waitForEditor(page);
  await expect(page.getByLabel("PI 1 x", { exact: true }).inputValue()).resolves.toBe(String(x0 + 60));
  await expect(page.getByTestId("total-takeArea").textContent()).resolves.toContain(formatNumber(saved.summary.takeArea, 1));
  await page.context().close();
});

test("dragging a PI on the map moves it in the table; undo puts it back and that is saved too", async () => {
  const cookie = await plannerCookie();
  const alternatives = await listDemoAlternatives(cookie);
  const target = alternatives[2]!;
  const page = await newPage(browser);
  await signIn(page, "planner@demo.test", "takeline-demo");
  await page.goto(`/projects/${target.projectId}/alternatives/${target.id}`);
  await waitForEditor(page);
  const takeBefore = await page.getByTestId("total-takeArea").textContent();
  const marker = page.getByTestId("pi-marker-2");
  const box = (await marker.boundingBox())!;
  const cx = box.x + box.width / 2;
  const cy = box.y + box.height / 2;
  await page.mouse.move(cx, cy);
  await page.mouse.down();
  for (let i = 1; i <= 10; i++) await page.mouse.move(cx + i * 4, cy + i * 1.5);
  await page.mouse.up();
  await page.waitForTimeout(150);
  await waitForPreview(page);
  const xAfterDrag = Number(await page.getByLabel("PI 2 x", { exact: true }).inputValue());
  const yAfterDrag = Number(await page.getByLabel("PI 2 y", { exact: true }).inputValue());
  // Dragged right and down on a north-up map: east (x up) and south (y down) in the working CRS.
  expect(xAfterDrag).toBeGreaterThan(target.alignment.points[2]!.x + 5);
  expect(yAfterDrag).toBeLessThan(target.alignment.points[2]!.y);
  await expect(page.getByTestId("total-takeArea").textContent()).resolves.not.toBe(takeBefore);
  await waitForSaved(page, target.version + 1);
  expect((await readAlternative(target.id, cookie)).alignment.points[2]!.x).toBe(xAfterDrag);

  await page.getByRole("button", { name: "Undo" }).click();
  await expect(page.getByLabel("PI 2 x", { exact: true }).inputValue()).resolves.toBe(String(target.alignment.points[2]!.x));
  await waitForSaved(page, target.version + 2);
  await waitForPreview(page);
  await expect(page.getByTestId("total-takeArea").textContent()).resolves.toBe(takeBefore);
  await page.keyboard.press("Control+Shift+Z");
  await expect(page.getByLabel("PI 2 x", { exact: true }).inputValue()).resolves.toBe(String(xAfterDrag));
  await waitForSaved(page, target.version + 3);
  await page.context().close();
});

test("clicking the map in add mode inserts a PI in the nearest leg; Delete removes it", async () => {
  const cookie = await plannerCookie();
  const target = (await listDemoAlternatives(cookie))[1]!;
  const page = await newPage(browser);
  await signIn(page, "planner@demo.test", "takeline-demo");
  await page.goto(`/projects/${target.projectId}/alternatives/${target.id}`);
  await waitForEditor(page);
  const rows = page.getByTestId("pi-table").locator("tbody tr");
  await expect(rows.count()).resolves.toBe(target.alignment.points.length);
  // Half-way between the first two markers lies on the first leg.
  const a = (await page.getByTestId("pi-marker-0").boundingBox())!;
  const b = (await page.getByTestId("pi-marker-1").boundingBox())!;
  await page.getByRole("button", { name: "Add PIs by clicking the map" }).click();
  await page.mouse.click((a.x + b.x + a.width) / 2 + 8, (a.y + b.y + a.height) / 2);
  await expect(rows.count()).resolves.toBe(target.alignment.points.length + 1);
  await expect(rows.nth(1).textContent()).resolves.toContain("PI 1");
  // The old PI 1 (with its curve) is now PI 2.
  await expect(page.getByLabel("PI 2 curve", { exact: true }).inputValue()).resolves.toBe(target.alignment.points[1]!.curve!.type);
  await page.getByTestId("pi-marker-1").focus();
  await page.keyboard.press("Delete");
  await expect(rows.count()).resolves.toBe(target.alignment.points.length);
  // Both edits are autosaved: the stored alignment is back to its points.
  const stored = async () => {
    const a = await readAlternative(target.id, cookie);
    return { saved: a.version > target.version, points: a.alignment.points.map((p) => [p.x, p.y]) };
  };
  await expect.poll(stored, { timeout: 20_000 }).toEqual({ saved: true, points: target.alignment.points.map((p) => [p.x, p.y]) });
  await page.context().close();
});

test("a save over someone else's newer version gets the conflict notice and overwrites nothing", async () => {
  const cookie = await plannerCookie();
  const target = (await listDemoAlternatives(cookie))[1]!;
  const page = await newPage(browser);
  await signIn(page, "planner@demo.test", "takeline-demo");
  await page.goto(`/projects/${target.projectId}/alternatives/${target.id}`);
  await waitForEditor(page);
  // Another planner's save, straight through the API, from the same version.
  const other = await fetch(`${new URL(page.url()).origin}/api/v1/alternatives/${target.id}`, {
    method: "PUT",
    headers: { cookie, "content-type": "application/json" },
    body: JSON.stringify({ version: target.version, description: "Changed by a colleague" }),
  });
  expect(other.status).toBe(200);
  const input = page.getByLabel("Left right-of-way half-width (m)", { exact: true });
  await input.fill("25");
  await input.press("Enter");
  const banner = page.getByTestId("save-conflict");
  await banner.waitFor({ timeout: 20_000 });
  await expect(banner.textContent()).resolves.toContain(`Someone else saved version ${target.version + 1}`);
  await expect(banner.textContent()).resolves.toContain("nothing was overwritten");
  const stored = await readAlternative(target.id, cookie);
  expect(stored.version).toBe(target.version + 1);
  expect((stored as unknown as { corridor: { left: number } }).corridor.left).toBe((target as unknown as { corridor: { left: number } }).corridor.left);
  await page.getByRole("button", { name: "Reload" }).click();
  await waitForEditor(page);
  await expect(page.getByTestId("save-status").textContent()).resolves.toContain(`version ${target.version + 1}`);
  await page.context().close();
});

test("a manager sees the same alternative read only", async () => {
  const cookie = await plannerCookie();
  const target = (await listDemoAlternatives(cookie))[0]!;
  const page = await newPage(browser);
  await signIn(page, "manager@demo.test", "takeline-demo");
  await page.goto(`/projects/${target.projectId}/alternatives/${target.id}`);
  await waitForEditor(page);
  await page.getByTestId("read-only").waitFor();
  await expect(page.getByTestId("pi-table").locator("input").count()).resolves.toBe(0);
  await expect(page.getByRole("button", { name: "Undo" }).count()).resolves.toBe(0);
  await expect(page.getByTestId("total-takeArea").textContent()).resolves.toContain(formatNumber(target.summary.takeArea, 1));
  await expect(page.getByTestId("curve-elements").locator("tbody tr").count()).resolves.toBeGreaterThan(0);
  await page.context().close();
});

test("a radius whose tangents overrun the leg shows the engine's message by the table, keeps the last good totals, and is not saved", async () => {
  const cookie = await plannerCookie();
  const target = (await listDemoAlternatives(cookie))[2]!;
  const page = await newPage(browser);
  await signIn(page, "planner@demo.test", "takeline-demo");
  await page.goto(`/projects/${target.projectId}/alternatives/${target.id}`);
  await waitForEditor(page);
  const takeBefore = await page.getByTestId("total-takeArea").textContent();
  const radius = page.getByLabel("PI 1 radius", { exact: true });
  await radius.fill("50000");
  await radius.press("Enter");
  const error = page.getByTestId("geometry-error");
  await error.waitFor();
  // T = R·tan(Δ/2) (Schofield & Breach §10.1) far exceeds the leg: the engine names both lengths.
  await expect(error.textContent()).resolves.toMatch(/PI 1 needs [\d.]+ of tangent/);
  await expect(page.getByTestId("total-takeArea").textContent()).resolves.toBe(takeBefore);
  await page.getByTestId("save-status").filter({ hasText: "Not saved" }).waitFor({ timeout: 20_000 });
  expect((await readAlternative(target.id, cookie)).version).toBe(target.version);
  // Ctrl+Z outside a text field undoes the edit (inside one, the browser's own undo applies).
  await page.locator("h1").click();
  await page.keyboard.press("Control+Z");
  await error.waitFor({ state: "detached" });
  await waitForSaved(page, target.version);
  await page.context().close();
});

test("a design-check warning is accepted with a reason, which is saved with the alternative", async () => {
  const cookie = await plannerCookie();
  const target = (await listDemoAlternatives(cookie))[0]!;
  const page = await newPage(browser);
  await signIn(page, "planner@demo.test", "takeline-demo");
  await page.goto(`/projects/${target.projectId}/alternatives/${target.id}`);
  await waitForEditor(page);
  const checks = page.getByTestId("design-checks");
  const warningsBefore = await checks.getByRole("button", { name: "Accept with a reason…" }).count();
  // 150 m is below the minimum radius for 80 km/h at emax 8 % (AASHTO Green Book 2018, Table 3-7: 229 m, from memory of the rounded table value).
  const radius = page.getByLabel("PI 1 radius", { exact: true });
  await radius.fill("150");
  await radius.press("Enter");
  const warning = checks.locator("li").filter({ hasText: /PI 1: radius 150 is below the minimum/ });
  await warning.waitFor({ timeout: 20_000 });
  await expect(warning.textContent()).resolves.toContain("Source: AASHTO");
  const started = Date.now();
  await warning.getByRole("button", { name: "Accept with a reason…" }).click();
  await page.getByLabel("Reason for going ahead").fill("Existing bridge abutment fixes the curve; posted advisory speed.");
  await page.getByRole("dialog").getByRole("button", { name: "Accept" }).click();
  await warning.getByText("accepted", { exact: true }).waitFor();
  await expect(checks.getByRole("button", { name: "Accept with a reason…" }).count()).resolves.toBe(warningsBefore);
  const stored = async () => ((await readAlternative(target.id, cookie)) as unknown as { acceptedChecks: { id: string; reason: string; acceptedBy?: string; acceptedAt?: string }[] }).acceptedChecks;
  await expect.poll(stored, { timeout: 20_000 }).toEqual([{ id: "min-radius:pi-1", reason: "Existing bridge abutment fixes the curve; posted advisory speed.", acceptedBy: "Tamsin Quorral", acceptedAt: expect.stringMatching(/^\d{4}-\d\d-\d\dT\d\d:\d\d:\d\d\.\d{3}Z$/) }]);
  // The server stamps the demo planner (Tamsin Quorral, app/models/demo-accounts.ts) and the save time.
  const acceptedAt = Date.parse((await stored())[0]!.acceptedAt!);
  expect(acceptedAt).toBeGreaterThanOrEqual(started);
  expect(acceptedAt).toBeLessThanOrEqual(Date.now());
  // Once saved, the warning names who accepted it, without a reload.
  await warning.getByText(/— Tamsin Quorral, \d{1,2} \w{3} \d{4}/).waitFor({ timeout: 20_000 });
  await page.context().close();
});
