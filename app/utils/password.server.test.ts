import { expect, test } from "vitest";
import { hashPassword, verifyPassword } from "./password.server";

test("a hashed password verifies and a different one does not", async () => {
  const stored = await hashPassword("correct horse battery");
  expect(stored).toMatch(/^scrypt\$\d+\$8\$1\$[\w-]{22}\$[\w-]{43}$/);
  expect(await verifyPassword("correct horse battery", stored)).toBe(true);
  expect(await verifyPassword("correct horse batterY", stored)).toBe(false);
});

test("two hashes of one password differ because each has its own salt", async () => {
  expect(await hashPassword("same password here")).not.toBe(await hashPassword("same password here"));
});

test("a malformed stored hash never verifies", async () => {
  expect(await verifyPassword("x", "plain-text")).toBe(false);
});
