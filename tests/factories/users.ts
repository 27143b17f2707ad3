import { randomBytes } from "node:crypto";
import { insertUser, type User } from "~/models/users.server";
import { hashPassword } from "~/utils/password.server";
import type { Role } from "~/utils/roles";

/** A real active user in the test database, with a known password. */
export async function createUser(overrides: Partial<{ email: string; name: string; role: Role; password: string }> = {}): Promise<User & { password: string }> {
  const password = overrides.password ?? `pw-${randomBytes(6).toString("hex")}`;
  const user = insertUser({
    email: overrides.email ?? `u-${randomBytes(4).toString("hex")}@example.test`,
    name: overrides.name ?? "Test Person",
    role: overrides.role ?? "planner",
    passwordHash: await hashPassword(password),
    status: "active",
  });
  return { ...user, password };
}
