import { asc, eq } from "drizzle-orm";
import { users } from "~/db/schema";
import { db, type Db } from "~/utils/db.server";
import type { Role } from "~/utils/roles";

export type User = typeof users.$inferSelect;
/** What the rest of the app may see of a user: never the password hash. */
export type PublicUser = Pick<User, "id" | "email" | "name" | "role" | "status">;

export function toPublicUser(u: User): PublicUser {
  return { id: u.id, email: u.email, name: u.name, role: u.role, status: u.status };
}

export function normalizeEmail(email: string): string {
  return email.trim().toLowerCase();
}

export function findUserByEmail(email: string, tx: Db = db()): User | undefined {
  return tx.select().from(users).where(eq(users.email, normalizeEmail(email))).get();
}

export function findUserById(id: number, tx: Db = db()): User | undefined {
  return tx.select().from(users).where(eq(users.id, id)).get();
}

export function listUsers(tx: Db = db()): PublicUser[] {
  return tx.select().from(users).orderBy(asc(users.email)).all().map(toPublicUser);
}

export function insertUser(
  input: { email: string; name: string; role: Role; passwordHash: string | null; status: User["status"] },
  tx: Db = db(),
): User {
  return tx
    .insert(users)
    .values({ ...input, email: normalizeEmail(input.email) })
    .returning()
    .get();
}

export function setUserPassword(userId: number, passwordHash: string, tx: Db = db()): void {
  tx.update(users).set({ passwordHash, status: "active" }).where(eq(users.id, userId)).run();
}

export function updateUserProfile(userId: number, fields: { name?: string; role?: Role }, tx: Db = db()): void {
  tx.update(users).set(fields).where(eq(users.id, userId)).run();
}

export function setUserStatus(userId: number, status: User["status"], tx: Db = db()): void {
  tx.update(users).set({ status }).where(eq(users.id, userId)).run();
}
