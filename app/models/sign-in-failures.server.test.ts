import { expect, test } from "vitest";
import { recordSignInFailure, signInRetryDelayMs } from "./sign-in-failures.server";
import { verifyCredentials, SignInError } from "~/utils/auth.server";
import { createUser } from "../../tests/factories/users";

test("four failures in 15 minutes cost nothing; the fifth starts a wait that doubles", () => {
  const email = "slow@example.test";
  const t0 = 1_000_000_000_000;
  for (let i = 0; i < 4; i++) recordSignInFailure(email, undefined, t0 + i * 1000);
  expect(signInRetryDelayMs(email, undefined, t0 + 4000)).toBe(0);
  recordSignInFailure(email, undefined, t0 + 4000);
  expect(signInRetryDelayMs(email, undefined, t0 + 4000)).toBe(2000);
  recordSignInFailure(email, undefined, t0 + 7000);
  expect(signInRetryDelayMs(email, undefined, t0 + 7000)).toBe(4000);
});

test("failures older than 15 minutes no longer count", () => {
  const email = "old@example.test";
  const t0 = 1_000_000_000_000;
  for (let i = 0; i < 6; i++) recordSignInFailure(email, undefined, t0 + i);
  expect(signInRetryDelayMs(email, undefined, t0 + 16 * 60 * 1000)).toBe(0);
});

test("after five wrong passwords even the right one is refused until the wait is over", async () => {
  const user = await createUser();
  for (let i = 0; i < 5; i++) await expect(verifyCredentials(user.email, "wrong password")).rejects.toThrow(SignInError);
  await expect(verifyCredentials(user.email, user.password)).rejects.toThrow(/Try again in \d+ s/);
});

test("an unknown e-mail and a wrong password get the same message", async () => {
  const user = await createUser();
  const unknown = await verifyCredentials("nobody@example.test", "whatever").catch((e: Error) => e.message);
  const wrong = await verifyCredentials(user.email, "whatever").catch((e: Error) => e.message);
  expect(unknown).toBe(wrong);
});

test("the right password signs in and clears earlier failures", async () => {
  const user = await createUser({ role: "analyst" });
  await verifyCredentials(user.email, "nope").catch(() => undefined);
  const signedIn = await verifyCredentials(user.email.toUpperCase(), user.password);
  expect(signedIn).toMatchObject({ id: user.id, role: "analyst" });
  expect(signInRetryDelayMs(user.email)).toBe(0);
});
