import { and, eq, gt, lt } from "drizzle-orm";
import { signInFailures } from "~/db/schema";
import { db, type Db } from "~/utils/db.server";

/** Five failures within 15 minutes start the slow-down (issue 2). */
export const FAILURE_WINDOW_MS = 15 * 60 * 1000;
export const FREE_FAILURES = 5;
const MAX_DELAY_MS = 5 * 60 * 1000;

export function recordSignInFailure(email: string, tx: Db = db(), now = Date.now()): void {
  tx.insert(signInFailures).values({ email, at: new Date(now) }).run();
  // Keep the table small: rows older than the window no longer matter.
  tx.delete(signInFailures).where(lt(signInFailures.at, new Date(now - FAILURE_WINDOW_MS))).run();
}

export function clearSignInFailures(email: string, tx: Db = db()): void {
  tx.delete(signInFailures).where(eq(signInFailures.email, email)).run();
}

/**
 * Milliseconds the caller must still wait before another try for this e-mail is checked.
 * After the fifth failure in the window each further failure doubles the wait: 2 s, 4 s, 8 s … up to 5 min.
 */
export function signInRetryDelayMs(email: string, tx: Db = db(), now = Date.now()): number {
  const recent = tx
    .select({ at: signInFailures.at })
    .from(signInFailures)
    .where(and(eq(signInFailures.email, email), gt(signInFailures.at, new Date(now - FAILURE_WINDOW_MS))))
    .all();
  if (recent.length < FREE_FAILURES) return 0;
  const last = Math.max(...recent.map((r) => r.at.getTime()));
  const delay = Math.min(MAX_DELAY_MS, 1000 * 2 ** (recent.length - FREE_FAILURES + 1));
  return Math.max(0, last + delay - now);
}
