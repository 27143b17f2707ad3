import { db } from "~/utils/db.server";
import type { PublicUser } from "./users.server";
import { readImpacts } from "./alternative-impacts.server";
import { findLastSubmission } from "./alternative-transitions.server";
import type { Alternative } from "./alternatives.server";
import { notifyAgents } from "./assignment-mail.server";
import { notifyDecision, notifySubmission } from "./decision-mail.server";
import { moveAlternativeState } from "./lifecycle-update.server";
import { applyAssignments, type AssignmentRequest } from "./parcel-assignments.server";
import { applyTakesToCases, readAgentHoldings } from "./parcel-cases.server";
import { recordApproval, type PreferredRow } from "./preferred-alternatives.server";
import type { Project } from "./projects.server";

type Actor = Pick<PublicUser, "id" | "role" | "name">;

/**
 * A planner submits the alternative's current version for decision: its impacts are computed (a
 * version that does not compute cannot be submitted) and the project's managers are told.
 */
export function submitAlternative(alternative: Alternative, project: Project, actor: Actor, comment: string, baseUrl: string) {
  return db().transaction((tx) => {
    const moved = moveAlternativeState(alternative, "submit", actor, { comment }, tx);
    const { summary } = readImpacts(moved, project, tx);
    const mailed = notifySubmission({ project, alternative: moved, submitterName: actor.name, comment, baseUrl }, tx);
    return { alternative: moved, summary, mailed };
  });
}

/** A planner takes a submission back to draft (nobody is mailed: no decision was made). */
export function withdrawSubmission(alternative: Alternative, actor: Actor, comment: string) {
  return db().transaction((tx) => ({ alternative: moveAlternativeState(alternative, "withdraw", actor, { comment }, tx) }));
}

export interface DecisionInput {
  decision: "approve" | "return";
  comment: string;
  /** The version the manager looked at; a different current version is a 409. */
  version?: number;
  /** On approval: parcels to assign at once (else existing assignments carry over). */
  assign?: AssignmentRequest;
}

export type DecisionOutcome = { alternative: Alternative; preferred: PreferredRow | null; parcels: number; mailed: string[] };

/**
 * A manager approves or returns a submitted alternative, in one transaction with its mail. The
 * state test sits in the UPDATE (see moveAlternativeState), so of two managers deciding at once
 * one wins and the other gets a 409.
 */
export function decideAlternative(alternative: Alternative, project: Project, actor: Actor, input: DecisionInput, baseUrl: string): DecisionOutcome {
  return db().transaction((tx) => {
    const options = { comment: input.comment, expectedVersion: input.version };
    if (input.decision === "return") {
      const moved = moveAlternativeState(alternative, "return", actor, options, tx);
      const submitter = findLastSubmission(alternative.id, tx);
      const mailed = notifyDecision({ project, alternative: moved, decision: "return", comment: input.comment, deciderName: actor.name, submitter, baseUrl }, tx);
      return { alternative: moved, preferred: null, parcels: 0, mailed };
    }
    const moved = moveAlternativeState(alternative, "approve", actor, options, tx);
    const impacts = readImpacts(moved, project, tx);
    const before = readAgentHoldings(project.id, tx);
    const preferred = recordApproval(moved, impacts, actor, input.comment, tx);
    applyTakesToCases(project.id, preferred.id, impacts.parcels, actor.id, tx);
    if (input.assign) applyAssignments(project.id, input.assign, actor, tx);
    const agentMail = notifyAgents(before, { project, alternativeName: moved.name, version: moved.version, reason: "approval", baseUrl }, tx);
    const plannerMail = notifyDecision({ project, alternative: moved, decision: "approve", comment: input.comment, deciderName: actor.name, baseUrl }, tx);
    return { alternative: moved, preferred, parcels: impacts.parcels.length, mailed: [...agentMail, ...plannerMail] };
  });
}
