import { and, eq, isNull } from "drizzle-orm";
import { apiTokens, users } from "~/db/schema";
import { db, type Db } from "~/utils/db.server";
import { createSecretToken, hashSecretToken } from "~/utils/secret-token.server";
import type { User } from "./users.server";

/** Creates an API token for a user and returns it in clear: the only time it is ever visible. */
export function issueApiToken(userId: number, label: string, tx: Db = db()): { id: number; token: string } {
  const token = createSecretToken("tl");
  const row = tx.insert(apiTokens).values({ userId, label, tokenHash: hashSecretToken(token) }).returning().get();
  return { id: row.id, token };
}

/** The active user a bearer token belongs to, or undefined for an unknown or revoked token. */
export function findUserByApiToken(token: string, tx: Db = db()): User | undefined {
  const row = tx
    .select({ user: users, tokenId: apiTokens.id })
    .from(apiTokens)
    .innerJoin(users, eq(users.id, apiTokens.userId))
    .where(and(eq(apiTokens.tokenHash, hashSecretToken(token)), isNull(apiTokens.revokedAt)))
    .get();
  if (!row || row.user.status !== "active") return undefined;
  tx.update(apiTokens).set({ lastUsedAt: new Date() }).where(eq(apiTokens.id, row.tokenId)).run();
  return row.user;
}

export function listApiTokens(userId: number, tx: Db = db()) {
  return tx
    .select({ id: apiTokens.id, label: apiTokens.label, createdAt: apiTokens.createdAt, lastUsedAt: apiTokens.lastUsedAt, revokedAt: apiTokens.revokedAt })
    .from(apiTokens)
    .where(eq(apiTokens.userId, userId))
    .all();
}

export function revokeApiToken(userId: number, tokenId: number, tx: Db = db()): boolean {
  const result = tx
    .update(apiTokens)
    .set({ revokedAt: new Date() })
    .where(and(eq(apiTokens.id, tokenId), eq(apiTokens.userId, userId), isNull(apiTokens.revokedAt)))
    .run();
  return result.changes > 0;
}
