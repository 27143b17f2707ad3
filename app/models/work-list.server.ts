import { and, asc, desc, eq, inArray, sql } from "drizzle-orm";
import { ACQUISITION_LABELS, type AcquisitionStatus } from "~/calculations/acquisition-status";
import { alternatives, parcelCaseEvents, parcelCases, preferredAlternatives, projects, users } from "~/db/schema";
import { db, type Db } from "~/utils/db.server";

/** One row of a land agent's work list: the case, its project and the approved alternative it belongs to. */
export type WorkItem = ReturnType<typeof listAgentWork>[number];

const lastNote = sql<string | null>`(select e.note from ${parcelCaseEvents} e where e.case_id = ${parcelCases.id} and e.kind = 'note' order by e.id desc limit 1)`;
const lastNoteAt = sql<number | null>`(select e.created_at from ${parcelCaseEvents} e where e.case_id = ${parcelCases.id} and e.kind = 'note' order by e.id desc limit 1)`;

function selectWork(tx: Db) {
  return tx
    .select({
      c: parcelCases,
      projectName: projects.name,
      units: projects.units,
      alternativeId: alternatives.id,
      alternativeName: alternatives.name,
      version: preferredAlternatives.version,
      lastNote,
      lastNoteAt,
    })
    .from(parcelCases)
    .innerJoin(projects, eq(projects.id, parcelCases.projectId))
    .innerJoin(preferredAlternatives, eq(preferredAlternatives.id, parcelCases.preferredId))
    .innerJoin(alternatives, eq(alternatives.id, preferredAlternatives.alternativeId));
}

export interface WorkFilter {
  status?: AcquisitionStatus[];
  projectId?: number;
  includeReleased?: boolean;
}

/** The cases assigned to this agent across projects (scoped to them in the query), in station order per project. */
export function listAgentWork(agentId: number, filter: WorkFilter = {}, tx: Db = db()) {
  const conditions = [eq(parcelCases.agentId, agentId)];
  if (!filter.includeReleased) conditions.push(eq(parcelCases.state, "open"));
  if (filter.status?.length) conditions.push(inArray(parcelCases.status, filter.status));
  if (filter.projectId) conditions.push(eq(parcelCases.projectId, filter.projectId));
  return selectWork(tx)
    .where(and(...conditions))
    .orderBy(asc(projects.name), asc(parcelCases.stationFrom), asc(parcelCases.parcelId))
    .all();
}

/** One case if it is assigned to this agent; undefined otherwise (another agent's case is not theirs to see). */
export function findAgentCase(caseId: number, agentId: number, tx: Db = db()) {
  return selectWork(tx)
    .where(and(eq(parcelCases.id, caseId), eq(parcelCases.agentId, agentId)))
    .get();
}

/** A case's history, newest first, with who acted. */
export function listCaseEvents(caseId: number, tx: Db = db()) {
  return tx
    .select({ e: parcelCaseEvents, actorName: users.name })
    .from(parcelCaseEvents)
    .leftJoin(users, eq(users.id, parcelCaseEvents.actorId))
    .where(eq(parcelCaseEvents.caseId, caseId))
    .orderBy(desc(parcelCaseEvents.id))
    .all()
    .map((r) => ({ ...r.e, actorName: r.actorName }));
}

export type CaseEvent = ReturnType<typeof listCaseEvents>[number];

/** A work item as the API shows it (areas in the project's units², cost an estimate). */
export function toWorkItemJson(w: WorkItem) {
  const c = w.c;
  return {
    caseId: c.id,
    projectId: c.projectId,
    projectName: w.projectName,
    units: w.units,
    alternativeId: w.alternativeId,
    alternativeName: w.alternativeName,
    version: w.version,
    parcelId: c.parcelId,
    owner: c.owner,
    address: c.address,
    parcelArea: c.parcelArea,
    takeArea: c.takeArea,
    easementArea: c.easementArea,
    remainderArea: c.remainderArea,
    classification: c.classification,
    buildingsHit: c.buildingsHit,
    estimatedCost: c.estimatedCost,
    stationFrom: c.stationFrom,
    stationTo: c.stationTo,
    status: c.status,
    statusLabel: ACQUISITION_LABELS[c.status],
    state: c.state,
    assignedAt: c.assignedAt?.toISOString() ?? null,
    statusChangedAt: c.statusChangedAt.toISOString(),
    updatedAt: c.updatedAt.toISOString(),
    lastNote: w.lastNote,
    lastNoteAt: w.lastNoteAt === null ? null : new Date(Number(w.lastNoteAt)).toISOString(),
  };
}

export type WorkItemJson = ReturnType<typeof toWorkItemJson>;
