import { and, asc, eq } from "drizzle-orm";
import { parcelCaseEvents, parcelCases, users } from "~/db/schema";
import type { ParcelTake } from "~/geometry/take-types";
import { db, type Db } from "~/utils/db.server";

export type ParcelCase = typeof parcelCases.$inferSelect;
export type CaseWithAgent = ParcelCase & { agentEmail: string | null; agentName: string | null };
export type CaseEventKind = (typeof parcelCaseEvents.$inferInsert)["kind"];

export function recordCaseEvent(caseId: number, kind: CaseEventKind, actorId: number | null, fields: { fromValue?: string | null; toValue?: string | null; note?: string; preferredId?: number } = {}, tx: Db = db()): void {
  tx.insert(parcelCaseEvents).values({ caseId, kind, actorId, fromValue: fields.fromValue ?? null, toValue: fields.toValue ?? null, note: fields.note ?? "", preferredId: fields.preferredId ?? null }).run();
}

/** The project's cases with their agents, in station order; open ones only unless asked. */
export function listProjectCases(projectId: number, options: { includeReleased?: boolean } = {}, tx: Db = db()): CaseWithAgent[] {
  const where = options.includeReleased ? eq(parcelCases.projectId, projectId) : and(eq(parcelCases.projectId, projectId), eq(parcelCases.state, "open"));
  return tx
    .select({ c: parcelCases, agentEmail: users.email, agentName: users.name })
    .from(parcelCases)
    .leftJoin(users, eq(users.id, parcelCases.agentId))
    .where(where)
    .orderBy(asc(parcelCases.stationFrom), asc(parcelCases.stationTo), asc(parcelCases.parcelId))
    .all()
    .map((r) => ({ ...r.c, agentEmail: r.agentEmail, agentName: r.agentName }));
}

/** Which open cases each agent holds in a project: the before/after of an event, to know whom to tell. */
export function readAgentHoldings(projectId: number, tx: Db = db()): Map<number, Set<number>> {
  const rows = tx.select({ id: parcelCases.id, agentId: parcelCases.agentId }).from(parcelCases).where(and(eq(parcelCases.projectId, projectId), eq(parcelCases.state, "open"))).all();
  const out = new Map<number, Set<number>>();
  for (const r of rows) if (r.agentId !== null) out.set(r.agentId, (out.get(r.agentId) ?? new Set()).add(r.id));
  return out;
}

function takeFigures(p: ParcelTake) {
  return {
    owner: p.owner,
    address: p.address,
    parcelArea: p.parcelArea,
    takeArea: p.takeArea,
    easementArea: p.easementArea,
    remainderArea: p.remainderArea,
    classification: p.classification,
    buildingsHit: p.buildingsHit.length,
    estimatedCost: p.cost.total,
    stationFrom: p.stationFrom,
    stationTo: p.stationTo,
  };
}

/**
 * Brings the project's cases in line with a newly approved preferred alternative: a parcel it takes
 * gets a case (new, or the existing one with the new figures, its agent, status and history kept);
 * an open case whose parcel it no longer takes is released. Runs inside the approval's transaction.
 */
export function applyTakesToCases(projectId: number, preferredId: number, takes: readonly ParcelTake[], actorId: number, tx: Db): void {
  const now = new Date();
  const existing = new Map(tx.select().from(parcelCases).where(eq(parcelCases.projectId, projectId)).all().map((c) => [c.parcelId, c]));
  for (const take of takes) {
    const before = existing.get(take.parcelId);
    existing.delete(take.parcelId);
    if (!before) {
      const row = tx.insert(parcelCases).values({ projectId, preferredId, parcelId: take.parcelId, ...takeFigures(take), statusChangedAt: now, updatedAt: now }).returning({ id: parcelCases.id }).get();
      recordCaseEvent(row.id, "opened", actorId, { preferredId }, tx);
      continue;
    }
    tx.update(parcelCases).set({ ...takeFigures(take), preferredId, state: "open", releasedAt: null, updatedAt: now }).where(eq(parcelCases.id, before.id)).run();
    const kind = before.state === "released" ? "reopened" : "take-updated";
    recordCaseEvent(before.id, kind, actorId, { fromValue: String(before.takeArea), toValue: String(take.takeArea), preferredId }, tx);
  }
  for (const gone of existing.values()) {
    if (gone.state !== "open") continue;
    tx.update(parcelCases).set({ state: "released", releasedAt: now, updatedAt: now }).where(eq(parcelCases.id, gone.id)).run();
    recordCaseEvent(gone.id, "released", actorId, { note: "The new preferred alternative does not take this parcel.", preferredId }, tx);
  }
}

/** Gives a case to an agent (or none), recording who had it; false when it already was theirs. */
export function setCaseAgent(c: CaseWithAgent, agent: { id: number; email: string } | null, actorId: number, tx: Db): boolean {
  if ((c.agentId ?? null) === (agent?.id ?? null)) return false;
  const now = new Date();
  tx.update(parcelCases).set({ agentId: agent?.id ?? null, assignedAt: agent ? now : null, updatedAt: now }).where(eq(parcelCases.id, c.id)).run();
  recordCaseEvent(c.id, "assigned", actorId, { fromValue: c.agentEmail, toValue: agent?.email ?? null }, tx);
  return true;
}

/** A case as the managers' API shows it (areas in the project's units², cost an estimate). */
export function toCaseJson(c: CaseWithAgent) {
  return {
    caseId: c.id,
    parcelId: c.parcelId,
    owner: c.owner,
    address: c.address,
    takeArea: c.takeArea,
    remainderArea: c.remainderArea,
    classification: c.classification,
    estimatedCost: c.estimatedCost,
    stationFrom: c.stationFrom,
    stationTo: c.stationTo,
    agentEmail: c.agentEmail,
    agentName: c.agentName,
    status: c.status,
    state: c.state,
  };
}
