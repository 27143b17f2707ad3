import { writeParcelListCsv, formatStationRange } from "~/calculations/parcel-list-csv";
import type { LengthUnit } from "~/geometry";
import { db, type Db } from "~/utils/db.server";
import { enqueueMail, type OutgoingMail } from "./mail-outbox.server";
import { listProjectCases, readAgentHoldings, type CaseWithAgent } from "./parcel-cases.server";
import type { Project } from "./projects.server";
import { findUserById } from "./users.server";

export interface AgentMailContext {
  project: Project;
  alternativeName: string;
  version: number;
  /** Why the agents hear from us: a new preferred alternative, or a change of assignments. */
  reason: "approval" | "assignment";
  baseUrl: string;
}

type Holdings = Map<number, Set<number>>;

const AREA: Record<LengthUnit, string> = { m: "m²", ft: "ft²", usft: "US ft²" };
const number = (v: number, digits = 1) => v.toLocaleString("en-US", { maximumFractionDigits: digits, minimumFractionDigits: digits });
const money = (v: number) => v.toLocaleString("en-US", { maximumFractionDigits: 0 });

/**
 * Queues one message to every agent whose parcels changed between `before` and now (on an approval,
 * to every agent who holds parcels, since the figures are new): their whole current list in the body
 * and as CSV, what was moved away from them, and the link to their work list. Call it in the event's
 * transaction; returns the addresses written to.
 */
export function notifyAgents(before: Holdings, context: AgentMailContext, tx: Db = db()): string[] {
  const after = readAgentHoldings(context.project.id, tx);
  const cases = listProjectCases(context.project.id, { includeReleased: true }, tx);
  const byId = new Map(cases.map((c) => [c.id, c]));
  const sent: string[] = [];
  for (const agentId of new Set([...before.keys(), ...after.keys()])) {
    const had = before.get(agentId) ?? new Set<number>();
    const has = after.get(agentId) ?? new Set<number>();
    const gained = [...has].filter((id) => !had.has(id));
    const lost = [...had].filter((id) => !has.has(id));
    if (gained.length === 0 && lost.length === 0 && !(context.reason === "approval" && has.size > 0)) continue;
    const agent = findUserById(agentId, tx);
    if (!agent) continue;
    const current = cases.filter((c) => has.has(c.id));
    const mail = agentParcelsMail({ ...agent }, current, gained.map((id) => byId.get(id)!), lost.map((id) => byId.get(id)!), context);
    enqueueMail(mail, tx);
    sent.push(agent.email);
  }
  return sent;
}

function where(c: CaseWithAgent): string {
  if (c.state === "released") return "no longer taken by the preferred alternative";
  return c.agentName ? `now with ${c.agentName}` : "now unassigned";
}

/** The message itself: a summary in the body, the list as CSV, the work-list link. */
export function agentParcelsMail(agent: { email: string; name: string }, current: CaseWithAgent[], gained: CaseWithAgent[], lost: CaseWithAgent[], context: AgentMailContext): OutgoingMail {
  const units = context.project.units as LengthUnit;
  const { project, alternativeName, version } = context;
  const link = `${context.baseUrl}/work?project=${project.id}`;
  const totalTake = current.reduce((s, c) => s + c.takeArea, 0);
  const totalCost = current.reduce((s, c) => s + c.estimatedCost, 0);
  const opening =
    context.reason === "approval"
      ? `${alternativeName} (version ${version}) is now the preferred alternative of ${project.name}.`
      : `Parcel assignments of ${project.name} (${alternativeName}, version ${version}) have changed.`;
  const lines = [`Hello ${agent.name || agent.email},`, "", opening, ""];
  if (gained.length) lines.push(`New to you (${gained.length}): ${gained.map((c) => c.parcelId).join(", ")}`);
  if (lost.length) lines.push(`Moved away from you (${lost.length}): ${lost.map((c) => `${c.parcelId} (${where(c)})`).join("; ")}`);
  if (gained.length || lost.length) lines.push("");
  if (current.length === 0) lines.push("You have no parcels in this project now.");
  else {
    lines.push(`Your parcels in this project: ${current.length}, taking ${number(totalTake)} ${AREA[units]} in all, estimated cost ${money(totalCost)}.`, "");
    for (const c of current) {
      lines.push(`${c.parcelId}  ${c.owner ?? "owner unknown"}, ${c.address ?? "no address"}: take ${number(c.takeArea)} ${AREA[units]}, remainder ${number(c.remainderArea)} ${AREA[units]}, ${c.classification}, est. ${money(c.estimatedCost)}, stations ${formatStationRange(c, units)}`);
    }
    lines.push("", "The attached CSV holds the same list.");
  }
  lines.push("", `Your work list: ${link}`, "", "Take areas and costs are planning estimates, not surveys or appraisals.");
  const subject = gained.length || (context.reason === "approval" && current.length) ? `Your parcels: ${project.name} — ${current.length} assigned to you` : `Parcels moved from you: ${project.name}`;
  const attachments = current.length ? [{ filename: `parcels-project-${project.id}.csv`, contentType: "text/csv", content: writeParcelListCsv(current, units) }] : undefined;
  return { to: agent.email, subject, text: lines.join("\n"), attachments };
}
