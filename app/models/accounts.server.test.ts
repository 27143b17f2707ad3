import { eq } from "drizzle-orm";
import { expect, test } from "vitest";
import { db } from "~/utils/db.server";
import { mailOutbox, emailLinks } from "~/db/schema";
import { verifyCredentials } from "~/utils/auth.server";
import { acceptInvitation, AccountConflictError, findInvitation, inviteUser, requestPasswordReset, resetPassword } from "./accounts.server";
import { findUserByEmail, toPublicUser } from "./users.server";
import { createUser } from "../../tests/factories/users";

const BASE = "http://takeline.example.test";

function mailsTo(address: string) {
  return db().select().from(mailOutbox).where(eq(mailOutbox.to, address)).all();
}

function linkTokenFromOutbox(prefix: string): string {
  const mail = db().select().from(mailOutbox).all().at(-1)!;
  const match = mail.text.match(new RegExp(`${BASE}/${prefix}/(\\S+)`));
  if (!match?.[1]) throw new Error(`no ${prefix} link in: ${mail.text}`);
  return match[1];
}

test("an invitation creates an invited user and queues exactly one mail with a working link", async () => {
  const admin = toPublicUser(await createUser({ role: "admin", name: "Ada Min" }));
  inviteUser({ email: "New.Person@Example.test", role: "analyst" }, admin, BASE);
  const outbox = mailsTo("new.person@example.test");
  expect(outbox).toHaveLength(1);
  expect(outbox[0]).toMatchObject({ to: "new.person@example.test", status: "pending" });
  expect(findUserByEmail("new.person@example.test")).toMatchObject({ status: "invited", passwordHash: null });

  const token = linkTokenFromOutbox("invitations");
  expect(findInvitation(token)?.user.email).toBe("new.person@example.test");
  expect(await acceptInvitation(token, "Nia Person", "a long new password")).toBe(true);
  expect(await verifyCredentials("new.person@example.test", "a long new password")).toMatchObject({ role: "analyst", name: "Nia Person" });
  // Single use: the same link cannot set a password again.
  expect(await acceptInvitation(token, "Someone Else", "another long password")).toBe(false);
});

test("inviting an address that already has an active account is refused", async () => {
  const admin = toPublicUser(await createUser({ role: "admin" }));
  const existing = await createUser();
  expect(() => inviteUser({ email: existing.email, role: "agent" }, admin, BASE)).toThrow(AccountConflictError);
  expect(mailsTo(existing.email)).toHaveLength(0);
});

test("a reset link changes the password once; the old password stops working", async () => {
  const user = await createUser();
  requestPasswordReset(user.email, BASE);
  const token = linkTokenFromOutbox("reset-password");
  expect(await resetPassword(token, "brand new password 1")).toBe(true);
  expect(await resetPassword(token, "brand new password 2")).toBe(false);
  await expect(verifyCredentials(user.email, user.password)).rejects.toThrow();
  expect(await verifyCredentials(user.email, "brand new password 1")).toMatchObject({ id: user.id });
});

test("an expired reset link is refused", async () => {
  const user = await createUser();
  requestPasswordReset(user.email, BASE);
  const token = linkTokenFromOutbox("reset-password");
  db().update(emailLinks).set({ expiresAt: new Date(Date.now() - 1000) }).run();
  expect(await resetPassword(token, "brand new password 1")).toBe(false);
});

test("a reset for an unknown address sends nothing and says nothing", () => {
  expect(() => requestPasswordReset("ghost@example.test", BASE)).not.toThrow();
  expect(mailsTo("ghost@example.test")).toHaveLength(0);
});

test("links are stored only as hashes", async () => {
  const user = await createUser();
  requestPasswordReset(user.email, BASE);
  const token = linkTokenFromOutbox("reset-password");
  const stored = db().select().from(emailLinks).all();
  expect(stored.map((l) => l.tokenHash)).not.toContain(token);
  expect(stored[0]?.tokenHash).toMatch(/^[0-9a-f]{64}$/);
});
