import { expect, test } from "vitest";
import { launchBrowser, newPage, signIn } from "./support/browser";
import { get } from "./support/http";
import { bearer, newProject } from "./support/layer-uploads";

type ProjectJson = { takeRules: Record<string, number>; resolvedTakeRules: Record<string, number> };

test("a planner changes a take rule on the project page, sees it saved as the project's own, and can put the default back", async () => {
  const planner = await bearer("planner@demo.test");
  const projectId = await newProject(planner, { name: "Quillmere Rules Page", units: "ft" });
  const defaults = ((await (await get(`/api/v1/projects/${projectId}`, planner)).json()) as ProjectJson).resolvedTakeRules;
  const browser = await launchBrowser();
  try {
    const page = await newPage(browser);
    await signIn(page, "planner@demo.test", "takeline-demo");
    await page.goto(`/projects/${projectId}`);
    const row = page.locator('tr[data-rule="adminCostPerParcel"]');
    await expect.poll(() => page.getByTestId("rule-source-adminCostPerParcel").textContent()).toBe("default");
    // Areas are in the project's units: square international feet here.
    await expect.poll(() => page.locator('tr[data-rule="remnantMinArea"]').textContent()).toContain("ft²");
    await page.getByLabel("Appraisal, title and closing", { exact: true }).fill("15000");
    await page.getByLabel("Contingency", { exact: true }).fill("-3");
    await page.getByRole("button", { name: "Save rules" }).click();
    await expect.poll(() => page.locator("#rule-contingencyPercent-error").textContent()).toBe("Enter 0 or more.");
    // A refused form saves nothing.
    expect(((await (await get(`/api/v1/projects/${projectId}`, planner)).json()) as ProjectJson).takeRules).toEqual({});
    await page.getByLabel("Contingency", { exact: true }).fill("");
    await page.getByRole("button", { name: "Save rules" }).click();
    await page.getByRole("status").filter({ hasText: "Rules saved." }).waitFor();
    await expect.poll(() => page.getByTestId("rule-value-adminCostPerParcel").textContent()).toBe("15,000");
    expect(await page.getByTestId("rule-source-adminCostPerParcel").textContent()).toBe("this project");
    expect(((await (await get(`/api/v1/projects/${projectId}`, planner)).json()) as ProjectJson).takeRules).toEqual({ adminCostPerParcel: 15000 });
    await page.reload();
    expect(await row.locator("input").inputValue()).toBe("15000");
    await page.getByLabel("Appraisal, title and closing", { exact: true }).fill("");
    await page.getByRole("button", { name: "Save rules" }).click();
    await expect.poll(() => page.getByTestId("rule-source-adminCostPerParcel").textContent()).toBe("default");
    expect(await page.getByTestId("rule-value-adminCostPerParcel").textContent()).toBe(defaults.adminCostPerParcel!.toLocaleString("en-US"));
    expect(((await (await get(`/api/v1/projects/${projectId}`, planner)).json()) as ProjectJson).takeRules).toEqual({});
  } finally {
    await browser.close();
  }
});
