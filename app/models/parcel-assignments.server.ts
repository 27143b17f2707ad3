import { and, asc, eq } from "drizzle-orm";
import { splitEvenly } from "~/calculations/parcel-assignment";
import { projectMembers, users } from "~/db/schema";
import { apiError } from "~/utils/api-error.server";
import { db, type Db } from "~/utils/db.server";
import type { Alternative } from "./alternatives.server";
import { notifyAgents } from "./assignment-mail.server";
import type { Actor } from "./lifecycle-update.server";
import { listProjectCases, readAgentHoldings, setCaseAgent, type CaseWithAgent } from "./parcel-cases.server";
import { findPreferred } from "./preferred-alternatives.server";
import type { Project } from "./projects.server";

export type AssignmentRequest =
  | { assignments: { parcelId: string; agentEmail: string | null }[] }
  | { split: "even"; parcelIds?: string[] };

type Agent = { id: number; email: string; name: string };

/** The project's active land agents, by e-mail (the order an even split hands out runs in). */
export function listProjectAgents(projectId: number, tx: Db = db()): Agent[] {
  return tx
    .select({ id: users.id, email: users.email, name: users.name })
    .from(projectMembers)
    .innerJoin(users, eq(users.id, projectMembers.userId))
    .where(and(eq(projectMembers.projectId, projectId), eq(projectMembers.role, "agent"), eq(users.status, "active")))
    .orderBy(asc(users.email))
    .all();
}

/** Who gets which open case; 422 naming each parcel or agent that is not in the project. */
function resolveRequest(request: AssignmentRequest, cases: CaseWithAgent[], agents: Agent[]): { c: CaseWithAgent; agent: Agent | null }[] {
  const byParcel = new Map(cases.map((c) => [c.parcelId, c]));
  if ("split" in request) {
    if (agents.length === 0) throw apiError("conflict", "The project has no land agents to split among; add them as project members first.");
    const chosen = request.parcelIds ? request.parcelIds.map((id) => byParcel.get(id)) : cases;
    const unknown = (request.parcelIds ?? []).filter((id) => !byParcel.has(id));
    if (unknown.length) throw apiError("unprocessable", "Some parcels are not taken by the preferred alternative.", unknown.map((id) => ({ path: "parcelIds", message: `${id} is not among its parcels.` })));
    const byEmail = new Map(agents.map((a) => [a.email, a]));
    return splitEvenly(chosen as CaseWithAgent[], agents.map((a) => a.email)).map((s) => ({ c: byParcel.get(s.parcelId)!, agent: byEmail.get(s.agent)! }));
  }
  const byEmail = new Map(agents.map((a) => [a.email.toLowerCase(), a]));
  const problems: { path: string; message: string }[] = [];
  const seen = new Set<string>();
  const out = request.assignments.map((a, i) => {
    const c = byParcel.get(a.parcelId);
    const agent = a.agentEmail === null ? null : byEmail.get(a.agentEmail.trim().toLowerCase());
    if (!c) problems.push({ path: `assignments.${i}.parcelId`, message: `${a.parcelId} is not among the preferred alternative's parcels.` });
    if (seen.has(a.parcelId)) problems.push({ path: `assignments.${i}.parcelId`, message: `${a.parcelId} is listed twice.` });
    if (a.agentEmail !== null && !agent) problems.push({ path: `assignments.${i}.agentEmail`, message: `${a.agentEmail} is not a land agent of this project.` });
    seen.add(a.parcelId);
    return { c: c!, agent: agent ?? null };
  });
  if (problems.length) throw apiError("unprocessable", "Some assignments cannot be made.", problems);
  return out;
}

/** Applies assignments to the project's open cases (no mail); returns how many cases changed hands. */
export function applyAssignments(projectId: number, request: AssignmentRequest, actor: Actor, tx: Db): number {
  const resolved = resolveRequest(request, listProjectCases(projectId, {}, tx), listProjectAgents(projectId, tx));
  return resolved.filter(({ c, agent }) => setCaseAgent(c, agent, actor.id, tx)).length;
}

/**
 * Assigns parcels of the project's preferred alternative to its land agents and tells every agent
 * whose list changed (both sides of a re-assignment), in one transaction. 409 unless `alternative`
 * is the project's preferred alternative.
 */
export function assignParcels(alternative: Alternative, project: Project, request: AssignmentRequest, actor: Actor, baseUrl: string, tx: Db = db()) {
  return tx.transaction((t) => {
    const preferred = findPreferred(project.id, t);
    if (!preferred || preferred.alternativeId !== alternative.id) {
      throw apiError("conflict", `${alternative.name} is not the project's preferred alternative; only the parcels of an approved alternative are assigned.`, { preferredAlternativeId: preferred?.alternativeId ?? null });
    }
    const before = readAgentHoldings(project.id, t);
    const changed = applyAssignments(project.id, request, actor, t);
    const mailed = notifyAgents(before, { project, alternativeName: preferred.alternativeName, version: preferred.version, reason: "assignment", baseUrl }, t);
    return { preferred, changed, mailed, cases: listProjectCases(project.id, {}, t) };
  });
}
