import { and, eq, gt, isNull } from "drizzle-orm";
import { emailLinks } from "~/db/schema";
import { db, type Db } from "~/utils/db.server";
import { createSecretToken, hashSecretToken } from "~/utils/secret-token.server";

export type LinkPurpose = (typeof emailLinks.$inferSelect)["purpose"];

/** How long each kind of e-mailed link stays valid. */
export const LINK_LIFETIME_MS: Record<LinkPurpose, number> = {
  invitation: 7 * 24 * 60 * 60 * 1000,
  "password-reset": 60 * 60 * 1000,
};

export function createEmailLink(userId: number, purpose: LinkPurpose, tx: Db = db(), now = Date.now()): string {
  const token = createSecretToken(purpose === "invitation" ? "inv" : "rst");
  tx.insert(emailLinks)
    .values({ userId, purpose, tokenHash: hashSecretToken(token), expiresAt: new Date(now + LINK_LIFETIME_MS[purpose]) })
    .run();
  return token;
}

/** The unused, unexpired link for a token, or undefined. */
export function findValidEmailLink(token: string, purpose: LinkPurpose, tx: Db = db(), now = Date.now()) {
  return tx
    .select()
    .from(emailLinks)
    .where(
      and(
        eq(emailLinks.tokenHash, hashSecretToken(token)),
        eq(emailLinks.purpose, purpose),
        isNull(emailLinks.usedAt),
        gt(emailLinks.expiresAt, new Date(now)),
      ),
    )
    .get();
}

/** Marks a link used; returns false if someone used it first (single use even under a race). */
export function consumeEmailLink(linkId: number, tx: Db = db()): boolean {
  const result = tx
    .update(emailLinks)
    .set({ usedAt: new Date() })
    .where(and(eq(emailLinks.id, linkId), isNull(emailLinks.usedAt)))
    .run();
  return result.changes === 1;
}
