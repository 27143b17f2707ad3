import { afterAll, beforeAll, expect, test } from "vitest";
import type { Browser } from "playwright-core";
import { launchBrowser, newPage, signIn, signOut } from "./support/browser";
import { firstLink, waitForMail } from "./support/mail";
import { inviteAndAccept } from "./support/accounts";

let browser: Browser;
beforeAll(async () => {
  browser = await launchBrowser();
});
afterAll(async () => {
  await browser?.close();
});

test("an admin invites a land agent; the mail arrives, its link works once, and the new agent signs in", async () => {
  const admin = await newPage(browser);
  await signIn(admin, "admin@demo.test", "takeline-demo");
  await admin.getByRole("button", { name: "Invite someone" }).click();
  const dialog = admin.getByRole("dialog");
  await dialog.getByLabel("E-mail").fill("wenna.tolbridge@demo.test");
  await dialog.getByLabel("Role").selectOption("agent");
  await dialog.getByRole("button", { name: "Send invitation" }).click();
  await admin.getByRole("status").filter({ hasText: "Invitation sent" }).waitFor();
  await admin.getByRole("cell", { name: "wenna.tolbridge@demo.test" }).waitFor();

  const mail = await waitForMail("wenna.tolbridge@demo.test", /invited/i);
  const link = firstLink(mail.text);

  const invitee = await newPage(browser);
  await invitee.goto(link);
  await invitee.getByLabel("Your name").fill("Wenna Tolbridge");
  await invitee.getByLabel("Password", { exact: true }).fill("tolbridge-password");
  await invitee.getByLabel("Password again").fill("tolbridge-password");
  await Promise.all([invitee.waitForURL("**/sign-in"), invitee.getByRole("button", { name: "Create my account" }).click()]);
  await signIn(invitee, "wenna.tolbridge@demo.test", "tolbridge-password");
  expect(new URL(invitee.url()).pathname).toBe("/work");
  await expect(invitee.getByTestId("signed-in-as").textContent()).resolves.toBe("Wenna Tolbridge");
  await signOut(invitee);

  await invitee.goto(link);
  await expect(invitee.getByRole("alert").textContent()).resolves.toContain("used or has expired");
  await admin.context().close();
  await invitee.context().close();
});

test("a forgotten password is reset through the e-mailed link", async () => {
  // A user of this test's own, so the shared demo accounts keep their password.
  const email = "brisa.kettleworth@demo.test";
  await inviteAndAccept(email, "analyst", "first-password-1");
  const page = await newPage(browser);
  await page.goto("/forgot-password");
  await page.getByLabel("E-mail").fill(email);
  await page.getByRole("button", { name: "Send reset link" }).click();
  await page.getByRole("status").filter({ hasText: "reset link is on its way" }).waitFor();
  const mail = await waitForMail(email, /reset/i);
  await page.goto(firstLink(mail.text));
  await page.getByLabel("New password", { exact: true }).fill("analyst-new-password");
  await page.getByLabel("New password again").fill("analyst-new-password");
  await Promise.all([page.waitForURL("**/sign-in"), page.getByRole("button", { name: "Save password" }).click()]);
  await signIn(page, email, "analyst-new-password");
  expect(new URL(page.url()).pathname).toBe("/projects");
  await page.context().close();
});
