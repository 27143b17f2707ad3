import { db, type Db } from "~/utils/db.server";
import { enqueueMail } from "./mail-outbox.server";
import { listProjectMembers, type Project } from "./projects.server";
import type { Alternative } from "./alternatives.server";

export interface DecisionMailContext {
  project: Project;
  alternative: Pick<Alternative, "id" | "name" | "version">;
  decision: "approve" | "return";
  comment: string;
  deciderName: string;
  /** The planner who submitted it, who gets the comments addressed to them. */
  submitter?: { email: string; at: Date };
  baseUrl: string;
}

function projectRecipients(projectId: number, role: "planner" | "manager", tx: Db): { email: string; name: string }[] {
  return listProjectMembers(projectId, tx).filter((m) => m.role === role);
}

const decisionLink = (ctx: { baseUrl: string; project: Project }) => `${ctx.baseUrl}/projects/${ctx.project.id}/decision`;

/**
 * Tells the project's planners the decision, once each; a returned alternative's comments are
 * addressed to the planner who submitted it (also when they are no longer a member). Returns the
 * addresses written to.
 */
export function notifyDecision(ctx: DecisionMailContext, tx: Db = db()): string[] {
  const to = new Map(projectRecipients(ctx.project.id, "planner", tx).map((p) => [p.email, p.name]));
  if (ctx.submitter && !to.has(ctx.submitter.email)) to.set(ctx.submitter.email, "");
  const { alternative, project } = ctx;
  const approved = ctx.decision === "approve";
  for (const email of to.keys()) {
    const isSubmitter = ctx.submitter?.email === email;
    const subject = approved ? `Approved: ${alternative.name} is the preferred alternative of ${project.name}` : `Returned with comments: ${alternative.name} (${project.name})`;
    const lead = approved
      ? `${ctx.deciderName} approved ${alternative.name} (version ${alternative.version}) as the preferred alternative of ${project.name}. That version is now frozen; editing the alternative starts a new draft version.`
      : `${ctx.deciderName} returned ${alternative.name} (version ${alternative.version}) of ${project.name}${isSubmitter ? `, which you submitted on ${ctx.submitter!.at.toISOString().slice(0, 10)}` : ""}.`;
    const comment = ctx.comment.trim() ? [approved ? "Comment:" : "Comments:", ctx.comment.trim()] : [approved ? "No comment was given." : "No comments were given."];
    const text = [lead, "", ...comment, "", `Decision page: ${decisionLink(ctx)}`].join("\n");
    enqueueMail({ to: email, subject, text }, tx);
  }
  return [...to.keys()];
}

/** Tells the project's managers that an alternative awaits their decision. */
export function notifySubmission(ctx: { project: Project; alternative: Pick<Alternative, "name" | "version">; submitterName: string; comment: string; baseUrl: string }, tx: Db = db()): string[] {
  const managers = projectRecipients(ctx.project.id, "manager", tx);
  for (const m of managers) {
    const text = [
      `${ctx.submitterName} submitted ${ctx.alternative.name} (version ${ctx.alternative.version}) of ${ctx.project.name} for your decision.`,
      "",
      ...(ctx.comment.trim() ? ["Their note:", ctx.comment.trim(), ""] : []),
      `Decide here: ${decisionLink(ctx)}`,
    ].join("\n");
    enqueueMail({ to: m.email, subject: `Decision requested: ${ctx.alternative.name} (${ctx.project.name})`, text }, tx);
  }
  return managers.map((m) => m.email);
}
