import { afterAll, beforeAll, expect, test } from "vitest";
import type { Browser, Page } from "playwright-core";
import { launchBrowser, newPage, signIn, signOut } from "./support/browser";
import { get } from "./support/http";
import { attachmentText, createStripProject, readCsvWithPython, type StripProject } from "./support/decision-project";
import { firstLink, waitForMail } from "./support/mail";

const NAME = "Journey Strip";
let browser: Browser;
let strip: StripProject;
let alternativeId: number;

beforeAll(async () => {
  browser = await launchBrowser();
  strip = await createStripProject(NAME, "JS", 567_000);
  alternativeId = await strip.alternative("Journey line");
});
afterAll(async () => {
  await browser?.close();
});

async function waitForMap(page: Page): Promise<void> {
  await page.waitForFunction(() => (window as unknown as { __takelineMapReady?: boolean }).__takelineMapReady === true, undefined, { timeout: 30_000 });
}

test("planner submits, manager approves, the agent's mail carries exactly their parcels, the agent works one, the manager sees the progress", async () => {
  const page = await newPage(browser);

  // The planner submits the alternative for decision.
  await signIn(page, "planner@demo.test", "takeline-demo");
  await page.goto(`/projects/${strip.projectId}/decision`);
  await page.getByLabel("Note for the manager on Journey line (optional)").fill("Straight across the strip.");
  await page.getByRole("button", { name: "Submit version 1 for decision" }).click();
  await page.getByTestId("decision-outcome").filter({ hasText: "Journey line was submitted for decision." }).waitFor();
  await signOut(page);

  // The manager finds it awaiting a decision and approves it, splitting the parcels evenly.
  await signIn(page, "manager@demo.test", "takeline-demo");
  await page.goto("/decisions");
  await page.getByRole("link", { name: NAME }).waitFor();
  await page.getByRole("link", { name: NAME }).click();
  await page.waitForURL(`**/projects/${strip.projectId}/decision`);
  const form = page.getByRole("form", { name: "Decision on Journey line" });
  await form.getByLabel("Approve as the preferred alternative").check();
  await form.getByLabel("Comment (required to return)").fill("Fewest parcels; go.");
  await form.getByLabel(/split its parcels evenly/).check();
  await form.getByRole("button", { name: "Record decision" }).click();
  await page.getByTestId("decision-outcome").filter({ hasText: "approved as the preferred alternative" }).waitFor();
  await expect(page.getByTestId("preferred-alternative").textContent()).resolves.toContain("Journey line, version 1");
  await signOut(page);

  // The agent's mail: the list in the body and as CSV, exactly their four parcels (agent2@ sorts first and
  // gets JS-01…04), each a 100 m × 40 m take, and the link to their work list.
  const mail = await waitForMail("agent@demo.test", new RegExp(`Your parcels: ${NAME}`));
  const rows = readCsvWithPython(await attachmentText(mail, /\.csv$/));
  expect(rows.map((r) => r.parcel_id)).toEqual(["JS-05", "JS-06", "JS-07", "JS-08"]);
  expect(rows.map((r) => [r.owner, r.take_area_m2, r.remainder_area_m2, r.classification, r.station_range])).toEqual([
    ["Owner of JS-05", "4000", "16000", "partial", "0+400.000 to 0+500.000"],
    ["Owner of JS-06", "4000", "16000", "partial", "0+500.000 to 0+600.000"],
    ["Owner of JS-07", "4000", "16000", "partial", "0+600.000 to 0+700.000"],
    ["Owner of JS-08", "4000", "16000", "partial", "0+700.000 to 0+800.000"],
  ]);
  // The same figures the impacts API reports for those parcels of the approved alternative.
  const impacts = (await (await get(`/api/v1/alternatives/${alternativeId}/impacts`, strip.auth.analyst)).json()) as { parcels: { parcelId: string; estimatedCost: number }[] };
  for (const r of rows) expect(Number(r.estimated_cost)).toBeCloseTo(impacts.parcels.find((p) => p.parcelId === r.parcel_id)!.estimatedCost, 2);
  expect(mail.text).toContain("not surveys or appraisals");
  expect(mail.text).not.toContain("JS-01");

  // The agent follows the link, signs in on the way, and sees only their parcels.
  await page.goto(firstLink(mail.text));
  await page.waitForURL("**/sign-in**");
  await page.getByLabel("E-mail").fill("agent@demo.test");
  await page.getByLabel("Password").fill("takeline-demo");
  await Promise.all([page.waitForURL(`**/work?project=${strip.projectId}`), page.getByRole("button", { name: "Sign in" }).click()]);
  const listed = await page.getByRole("link", { name: /^JS-\d\d$/ }).allTextContents();
  expect(listed).toEqual(["JS-05", "JS-06", "JS-07", "JS-08"]);

  // The parcel page: the map of the take, and a status change with a note.
  await page.getByRole("link", { name: "JS-06" }).click();
  await page.getByRole("heading", { name: "Parcel JS-06" }).waitFor();
  await waitForMap(page);
  await expect(page.getByTestId("case-figures").textContent()).resolves.toContain("4,000.0 m²");
  await page.getByLabel("Status").selectOption("owner-contacted");
  await page.getByLabel("Note").fill("Met the owner at the gate; appraisal next.");
  await page.getByRole("button", { name: "Save" }).click();
  await page.getByTestId("case-history").getByText("Met the owner at the gate; appraisal next.").waitFor();
  await page.getByTestId("case-history").getByText("Status: Not started → Owner contacted").waitFor();
  await signOut(page);

  // The manager sees the progress of the preferred alternative.
  await signIn(page, "manager@demo.test", "takeline-demo");
  await page.goto(`/projects/${strip.projectId}/decision`);
  await expect(page.getByTestId("progress-owner-contacted").textContent()).resolves.toBe("Owner contacted: 1");
  await expect(page.getByTestId("progress-not-started").textContent()).resolves.toBe("Not started: 7");
  await page.goto("/decisions");
  await expect(page.getByTestId("progress-owner-contacted").first().textContent()).resolves.toBeTruthy();
  await page.context().close();
});

test("the manager assigns by station range on the assignment page; both agents are told", async () => {
  const page = await newPage(browser);
  await signIn(page, "manager@demo.test", "takeline-demo");
  await page.goto(`/projects/${strip.projectId}/assignments`);
  await waitForMap(page);
  await page.getByLabel("From station").fill("0+250");
  await page.getByLabel("to station").fill("0+450");
  await page.getByRole("button", { name: "Select by stations" }).click();
  // JS-03 (200–300), JS-04 (300–400) and JS-05 (400–500) overlap 250–450.
  await expect(page.getByTestId("selected-count").textContent()).resolves.toBe("3 selected");
  await page.getByLabel("Give the selected parcels to").selectOption("agent2@demo.test");
  await page.getByRole("button", { name: "Assign 3" }).click();
  await page.getByTestId("assignment-outcome").filter({ hasText: "1 parcel changed hands; 2 agents were e-mailed." }).waitFor();
  await page.getByTestId("agent-of-JS-05").filter({ hasText: "Corvin Ashlet" }).waitFor();
  const moved = await waitForMail("agent@demo.test", new RegExp(`Parcels moved from you: ${NAME}`));
  expect(moved.text).toContain("JS-05 (now with Corvin Ashlet)");
  const gained = await waitForMail("agent2@demo.test", new RegExp(`Your parcels: ${NAME} — 5 assigned to you`));
  expect(readCsvWithPython(await attachmentText(gained, /\.csv$/)).map((r) => r.parcel_id)).toEqual(["JS-01", "JS-02", "JS-03", "JS-04", "JS-05"]);
  await page.context().close();
});
