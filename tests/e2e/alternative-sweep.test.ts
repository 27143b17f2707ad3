import { afterAll, beforeAll, expect, test, vi } from "vitest";
import type { Browser } from "playwright-core";
import { launchBrowser, newPage, signIn } from "./support/browser";
import { postJson } from "./support/http";
import { listDemoAlternatives, plannerCookie, readAlternative, waitForEditor, waitForSaved } from "./alternative-helpers";

// Map journeys draw with software WebGL and wait for live previews: on a busy machine one can pass a minute.
vi.setConfig({ testTimeout: 180_000 });

let browser: Browser;
beforeAll(async () => {
  browser = await launchBrowser();
});
afterAll(async () => {
  await browser?.close();
});

type Step = { value: number; checks: { status: string } | null; error?: string };

test("the curve trade-off sweeps a PI's radius, charts the same steps the API computes with the minimum radius marked, and a clicked point is applied and saved", async () => {
  const cookie = await plannerCookie();
  const target = (await listDemoAlternatives(cookie))[0]!;
  const page = await newPage(browser);
  await signIn(page, "planner@demo.test", "takeline-demo");
  await page.goto(`/projects/${target.projectId}/alternatives/${target.id}`);
  await waitForEditor(page);
  await page.getByTestId("pi-table").getByRole("row", { name: /PI 1/ }).getByText("PI 1").click();
  const panel = page.getByTestId("curve-tradeoff");
  await expect(panel.getByLabel(/Vary at PI 1/).inputValue()).resolves.toBe("radius");
  const from = Number(await panel.getByLabel("Sweep from (m)").inputValue());
  const to = Number(await panel.getByLabel("Sweep to (m)").inputValue());
  await panel.getByLabel("Sweep steps").fill("12");
  await panel.getByLabel("Sweep steps").press("Tab");
  await panel.getByRole("button", { name: "Run the sweep" }).click();
  const charts = panel.getByTestId("sweep-chart");
  await charts.first().waitFor({ timeout: 30_000 });
  await expect(charts.count()).resolves.toBe(4);

  // The same sweep straight from the API: the charts must show exactly its steps.
  const res = await postJson(`/api/v1/alternatives/${target.id}/sweep`, { pointIndex: 1, vary: "radius", from, to, steps: 12 }, { cookie });
  expect(res.status).toBe(200);
  const api = (await res.json()) as { steps: Step[]; minimumRadius: number | null };
  // A step fails where it does not compute or any design check is unmet (accepted warnings included).
  const failing = api.steps.filter((s) => s.error || (s.checks && s.checks.status !== "pass")).length;
  for (let i = 0; i < 4; i++) {
    const chart = charts.nth(i);
    await expect(chart.locator("[data-failing]").count()).resolves.toBe(12);
    await expect(chart.locator('[data-failing="true"]').count()).resolves.toBe(failing);
  }
  // The minimum radius for 80 km/h lies inside the default range, which starts below it.
  expect(api.minimumRadius).not.toBeNull();
  expect(from).toBeLessThan(api.minimumRadius!);
  await expect(panel.getByTestId("minimum-radius-line").count()).resolves.toBe(4);
  expect(failing).toBeGreaterThan(0);

  // Apply the largest radius that computes and meets the checks, from the take-area chart.
  const passing = api.steps.filter((s) => !s.error && s.checks?.status === "pass");
  const chosen = passing[passing.length - 1]!;
  const points = charts.first().locator('[role="button"][data-failing="false"]');
  await points.nth((await points.count()) - 1).click();
  await expect(page.getByLabel("PI 1 radius", { exact: true }).inputValue()).resolves.toBe(String(chosen.value));
  await waitForSaved(page, target.version + 1);
  const saved = await readAlternative(target.id, cookie);
  expect(saved.alignment.points[1]!.curve).toEqual({ type: "simple", radius: chosen.value });
  await page.context().close();
});
