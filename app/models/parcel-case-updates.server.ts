import { and, eq } from "drizzle-orm";
import { ACQUISITION_LABELS, checkStatusMove, type AcquisitionStatus } from "~/calculations/acquisition-status";
import { parcelCases } from "~/db/schema";
import { apiError } from "~/utils/api-error.server";
import { db, type Db } from "~/utils/db.server";
import { recordAuditEvent } from "./audit.server";
import { recordCaseEvent } from "./parcel-cases.server";
import { findAgentCase } from "./work-list.server";

export interface CaseChange {
  status?: AcquisitionStatus;
  note?: string;
}

/**
 * A land agent moves their parcel to another status and/or adds a note. 404 for a case that is not
 * theirs; 409 for a released case or a move the status rules refuse. The status it was read in is
 * tested inside the UPDATE, so a change made meanwhile (another tab) is a 409, not overwritten.
 */
export function updateAgentCase(caseId: number, agentId: number, change: CaseChange, tx: Db = db()) {
  return tx.transaction((t) => {
    const found = findAgentCase(caseId, agentId, t);
    if (!found) throw apiError("not_found", "No such parcel in your work list.");
    const c = found.c;
    if (c.state === "released") throw apiError("conflict", "The preferred alternative no longer takes this parcel; its case is closed.", { state: c.state });
    const now = new Date();
    if (change.status && change.status !== c.status) {
      const move = checkStatusMove(c.status, change.status);
      if (!move.ok) throw apiError("conflict", move.message, { status: c.status });
      const row = t
        .update(parcelCases)
        .set({ status: change.status, statusChangedAt: now, updatedAt: now })
        .where(and(eq(parcelCases.id, c.id), eq(parcelCases.status, c.status), eq(parcelCases.agentId, agentId), eq(parcelCases.state, "open")))
        .returning({ id: parcelCases.id })
        .get();
      if (!row) throw apiError("conflict", "This parcel changed meanwhile; reload it. Nothing was saved.");
      recordCaseEvent(c.id, "status", agentId, { fromValue: c.status, toValue: change.status }, t);
      recordAuditEvent({ actorId: agentId, projectId: c.projectId, action: "parcel.status", subject: c.parcelId, details: { caseId: c.id, from: c.status, to: change.status } }, t);
    } else if (change.note?.trim()) {
      t.update(parcelCases).set({ updatedAt: now }).where(eq(parcelCases.id, c.id)).run();
    }
    if (change.note?.trim()) recordCaseEvent(c.id, "note", agentId, { note: change.note.trim() }, t);
    return findAgentCase(caseId, agentId, t)!;
  });
}

/** Words for a status event, e.g. "Offer made → Agreed". */
export function describeStatusChange(from: string | null, to: string | null): string {
  const label = (s: string | null) => (s && s in ACQUISITION_LABELS ? ACQUISITION_LABELS[s as AcquisitionStatus] : (s ?? ""));
  return `${label(from)} → ${label(to)}`;
}
