import { expect, test } from "vitest";
import { apiTokens } from "~/db/schema";
import { db } from "~/utils/db.server";
import { findUserByApiToken, issueApiToken, revokeApiToken } from "./api-tokens.server";
import { setUserStatus } from "./users.server";
import { createUser } from "../../tests/factories/users";

test("an issued token finds its user and is stored only as a SHA-256 hash", async () => {
  const user = await createUser({ role: "analyst" });
  const { token } = issueApiToken(user.id, "notebook");
  expect(findUserByApiToken(token)?.id).toBe(user.id);
  const row = db().select().from(apiTokens).get()!;
  expect(row.tokenHash).not.toBe(token);
  expect(row.tokenHash).toMatch(/^[0-9a-f]{64}$/);
});

test("a revoked token, an unknown token and a disabled user's token find nobody", async () => {
  const user = await createUser();
  const a = issueApiToken(user.id, "a");
  const b = issueApiToken(user.id, "b");
  expect(revokeApiToken(user.id, a.id)).toBe(true);
  expect(findUserByApiToken(a.token)).toBeUndefined();
  expect(findUserByApiToken("tl_not-a-real-token")).toBeUndefined();
  setUserStatus(user.id, "disabled");
  expect(findUserByApiToken(b.token)).toBeUndefined();
});

test("one user cannot revoke another user's token", async () => {
  const owner = await createUser();
  const other = await createUser();
  const { id, token } = issueApiToken(owner.id, "mine");
  expect(revokeApiToken(other.id, id)).toBe(false);
  expect(findUserByApiToken(token)?.id).toBe(owner.id);
});
