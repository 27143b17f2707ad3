import { expect } from "vitest";
import type { Role } from "~/utils/roles";
import { postJson } from "./http";
import { firstLink, waitForMail } from "./mail";

/** Creates an active account through the product's own path: admin invitation, e-mail, acceptance form. */
export async function inviteAndAccept(email: string, role: Role, password: string): Promise<void> {
  const tokenRes = await postJson("/api/v1/tokens", { email: "admin@demo.test", password: "takeline-demo" });
  const { token } = (await tokenRes.json()) as { token: string };
  const invited = await postJson("/api/v1/invitations", { email, role }, { authorization: `Bearer ${token}` });
  expect(invited.status).toBe(201);
  const link = firstLink((await waitForMail(email, /invited/i)).text);
  const accepted = await fetch(link, { method: "POST", body: new URLSearchParams({ name: "Test Person", password, confirm: password }), redirect: "manual" });
  expect(accepted.status).toBe(302);
}
