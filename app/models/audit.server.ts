import { desc, eq } from "drizzle-orm";
import { auditEvents } from "~/db/schema";
import { db, type Db } from "~/utils/db.server";

export type AuditInput = {
  actorId: number | null;
  action: string;
  subject?: string;
  projectId?: number | null;
  details?: Record<string, unknown>;
};

/** Appends one audit event; call it inside the transaction of the change it records. */
export function recordAuditEvent(event: AuditInput, tx: Db = db()): void {
  tx.insert(auditEvents)
    .values({
      actorId: event.actorId,
      action: event.action,
      subject: event.subject ?? "",
      projectId: event.projectId ?? null,
      details: event.details ?? null,
    })
    .run();
}

export function listRecentAuditEvents(limit = 50, tx: Db = db()) {
  return tx.select().from(auditEvents).orderBy(desc(auditEvents.id)).limit(limit).all();
}

export function listProjectAuditEvents(projectId: number, limit = 100, tx: Db = db()) {
  return tx
    .select()
    .from(auditEvents)
    .where(eq(auditEvents.projectId, projectId))
    .orderBy(desc(auditEvents.id))
    .limit(limit)
    .all();
}
