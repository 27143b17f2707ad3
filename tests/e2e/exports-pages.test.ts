import { afterAll, beforeAll, expect, test, vi } from "vitest";
import type { Browser } from "playwright-core";
import { launchBrowser, newPage, signIn } from "./support/browser";
import { demoProject } from "./exports-support";

vi.setConfig({ testTimeout: 120_000 });

let browser: Browser;
beforeAll(async () => {
  browser = await launchBrowser();
});
afterAll(async () => {
  await browser?.close();
});

test("the comparison page offers the impact tables and the report; its links download them with the session", async () => {
  const demo = await demoProject();
  const page = await newPage(browser);
  await signIn(page, "planner@demo.test", "takeline-demo");
  await page.goto(`/projects/${demo.projectId}/comparison`);
  const links = { csv: page.getByRole("link", { name: "CSV" }), xlsx: page.getByRole("link", { name: "Excel (XLSX)" }), report: page.getByRole("link", { name: "Alternatives report (PDF)" }) };
  await links.report.waitFor();
  await page.getByRole("heading", { name: "Downloads" }).waitFor();
  for (const [kind, link] of Object.entries(links)) {
    const href = (await link.getAttribute("href"))!;
    const res = await page.request.get(href);
    expect(res.status(), kind).toBe(200);
    expect(res.headers()["content-type"], kind).toMatch(kind === "csv" ? /text\/csv/ : kind === "xlsx" ? /spreadsheetml/ : /application\/pdf/);
  }
  await page.close();
});

test("an alternative's page lists its taken parcels and links each one's exhibit and description", async () => {
  const demo = await demoProject();
  const alt = demo.alternatives[1]!;
  const page = await newPage(browser);
  await signIn(page, "planner@demo.test", "takeline-demo");
  await page.goto(`/projects/${demo.projectId}/alternatives/${alt.id}`);
  const select = page.getByLabel("Take of parcel:");
  await page.getByRole("link", { name: "Exhibit (PDF)" }).waitFor();
  const options = await select.locator("option").allTextContents();
  const impacts = (await (await page.request.get(`/api/v1/alternatives/${alt.id}/impacts`)).json()) as { parcels: { parcelId: string; takeArea: number }[] };
  expect(options).toEqual(impacts.parcels.filter((p) => p.takeArea > 0).map((p) => p.parcelId));
  await select.selectOption(options[options.length - 1]!);
  const exhibit = (await page.getByRole("link", { name: "Exhibit (PDF)" }).getAttribute("href"))!;
  expect(exhibit).toContain(encodeURIComponent(options[options.length - 1]!));
  const pdf = await page.request.get(exhibit);
  expect(pdf.status()).toBe(200);
  expect(pdf.headers()["content-type"]).toBe("application/pdf");
  const description = await page.request.get((await page.getByRole("link", { name: "Legal description (JSON)" }).getAttribute("href"))!);
  expect(((await description.json()) as { text: string }).text).toContain(`PARCEL ${options[options.length - 1]}`);
  const landxml = await page.request.get((await page.getByRole("link", { name: "LandXML 1.2" }).getAttribute("href"))!);
  expect(await landxml.text()).toContain("<LandXML");
  await page.close();
});
