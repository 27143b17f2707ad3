import type { Transporter } from "nodemailer";
import { claimDueMail, markMailFailed, markMailSent, type OutboxRow } from "~/models/mail-outbox.server";
import { db, type Db } from "./db.server";
import { mailFrom } from "./mail-transport.server";

/** A stable Message-ID per outbox row, so a receiving server could spot a duplicate. */
export function outboxMessageId(row: OutboxRow): string {
  return `<outbox-${row.id}-${row.createdAt.getTime()}@takeline.invalid>`;
}

async function deliver(transport: Transporter, row: OutboxRow): Promise<void> {
  await transport.sendMail({
    from: mailFrom(),
    to: row.to,
    subject: row.subject,
    text: row.text,
    html: row.html ?? undefined,
    messageId: outboxMessageId(row),
    attachments: (row.attachments ?? []).map((a) => ({ filename: a.filename, contentType: a.contentType, content: a.content })),
  });
}

/** Sends every due message once; failures are rescheduled with back-off. Returns how many were sent. */
export async function deliverDueMail(transport: Transporter, options: { tx?: Db; now?: () => number } = {}): Promise<number> {
  const tx = options.tx ?? db();
  const now = options.now ?? Date.now;
  let sent = 0;
  for (const row of claimDueMail(20, tx, now())) {
    try {
      await deliver(transport, row);
      markMailSent(row.id, tx, now());
      sent += 1;
    } catch (error) {
      markMailFailed(row, error instanceof Error ? error.message : String(error), tx, now());
    }
  }
  return sent;
}

/** Polls the outbox until stopped. One loop per process. */
export function startMailSender(transport: Transporter, pollMs: number): () => void {
  let stopped = false;
  let timer: NodeJS.Timeout | undefined;
  const tick = async () => {
    if (stopped) return;
    try {
      await deliverDueMail(transport);
    } catch (error) {
      // The database being briefly busy must not end the loop; the next tick tries again.
      console.warn("mail sender:", error instanceof Error ? error.message : error);
    }
    if (!stopped) timer = setTimeout(tick, pollMs);
  };
  timer = setTimeout(tick, 0);
  return () => {
    stopped = true;
    if (timer) clearTimeout(timer);
  };
}
