import { and, asc, eq, lte, or } from "drizzle-orm";
import { mailOutbox, type MailAttachment } from "~/db/schema";
import { db, type Db } from "~/utils/db.server";

export type OutgoingMail = { to: string; subject: string; text: string; html?: string; attachments?: MailAttachment[] };
export type OutboxRow = typeof mailOutbox.$inferSelect;

/** A claim older than this is assumed to belong to a sender that died, and is taken over. */
export const SENDING_LEASE_MS = 2 * 60 * 1000;

/** Queues a message. Call it with the transaction of the event that causes the mail. */
export function enqueueMail(mail: OutgoingMail, tx: Db = db(), now = Date.now()): number {
  const row = tx
    .insert(mailOutbox)
    .values({ ...mail, html: mail.html ?? null, attachments: mail.attachments ?? null, nextAttemptAt: new Date(now) })
    .returning({ id: mailOutbox.id })
    .get();
  return row.id;
}

/**
 * Claims the due messages for sending: pending ones whose next attempt is due, and stale claims.
 * The claim moves the retry time forward by the lease, so a second sender skips them.
 */
export function claimDueMail(limit: number, tx: Db = db(), now = Date.now()): OutboxRow[] {
  return tx.transaction((t) => {
    const due = t
      .select()
      .from(mailOutbox)
      .where(
        and(
          or(eq(mailOutbox.status, "pending"), eq(mailOutbox.status, "sending")),
          lte(mailOutbox.nextAttemptAt, new Date(now)),
        ),
      )
      .orderBy(asc(mailOutbox.nextAttemptAt))
      .limit(limit)
      .all();
    for (const row of due) {
      t.update(mailOutbox)
        .set({ status: "sending", nextAttemptAt: new Date(now + SENDING_LEASE_MS) })
        .where(eq(mailOutbox.id, row.id))
        .run();
    }
    return due;
  });
}

export function markMailSent(id: number, tx: Db = db(), now = Date.now()): void {
  tx.update(mailOutbox).set({ status: "sent", sentAt: new Date(now), lastError: null }).where(eq(mailOutbox.id, id)).run();
}

/** Exponential back-off: 2 s, 4 s, 8 s … capped at 10 minutes; the message is never dropped. */
export function retryDelayMs(attempts: number): number {
  return Math.min(10 * 60 * 1000, 1000 * 2 ** attempts);
}

export function markMailFailed(row: OutboxRow, error: string, tx: Db = db(), now = Date.now()): void {
  const attempts = row.attempts + 1;
  tx.update(mailOutbox)
    .set({ status: "pending", attempts, lastError: error.slice(0, 500), nextAttemptAt: new Date(now + retryDelayMs(attempts)) })
    .where(eq(mailOutbox.id, row.id))
    .run();
}

export function listOutbox(limit = 100, tx: Db = db()): OutboxRow[] {
  return tx.select().from(mailOutbox).orderBy(asc(mailOutbox.id)).limit(limit).all();
}
