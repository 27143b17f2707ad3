import { and, eq } from "drizzle-orm";
import { planTransition, STATE_LABELS, type LifecycleAction, type TransitionPlan } from "~/calculations/alternative-lifecycle";
import { alternatives } from "~/db/schema";
import { apiError } from "~/utils/api-error.server";
import { db, type Db } from "~/utils/db.server";
import type { Role } from "~/utils/roles";
import type { Alternative } from "./alternatives.server";
import { recordTransition } from "./alternative-transitions.server";

export type Actor = { id: number; role: Role };

/** The API answer for a refused plan: 403 naming the roles, or 409 naming the state. */
export function refusalResponse(plan: Exclude<TransitionPlan, { ok: true }>, current: Pick<Alternative, "status" | "version">): Response {
  if (plan.refusal === "role") return apiError("forbidden", plan.message, { neededRoles: plan.neededActors.filter((a) => a !== "system") });
  return apiError("conflict", plan.message, { status: current.status, version: current.version });
}

/**
 * Moves an alternative to the state `action` leads to. The state it was read in (and, when given,
 * the version the caller saw) is tested inside the UPDATE itself, so of two people acting at once
 * exactly one wins; the other gets a 409 that says what happened first.
 */
export function moveAlternativeState(alternative: Alternative, action: LifecycleAction, actor: Actor, options: { comment?: string; expectedVersion?: number } = {}, tx: Db = db()): Alternative {
  const plan = planTransition(alternative.status, action, actor.role);
  if (!plan.ok) throw refusalResponse(plan, alternative);
  if (options.expectedVersion !== undefined && options.expectedVersion !== alternative.version) throw versionConflict(alternative, options.expectedVersion);
  const row = tx
    .update(alternatives)
    .set({ status: plan.to })
    .where(and(eq(alternatives.id, alternative.id), eq(alternatives.status, alternative.status), eq(alternatives.version, alternative.version)))
    .returning()
    .get();
  if (!row) throw changedMeanwhile(alternative.id, tx);
  recordTransition({ alternativeId: row.id, projectId: row.projectId, version: row.version, action, from: alternative.status, to: plan.to, actorId: actor.id, comment: options.comment }, tx);
  return row as unknown as Alternative;
}

function versionConflict(alternative: Alternative, expected: number): Response {
  return apiError("conflict", `You looked at version ${expected}, but the alternative is now at version ${alternative.version}. Reload it before deciding.`, {
    yourVersion: expected,
    currentVersion: alternative.version,
    status: alternative.status,
  });
}

/** The 409 for a row that changed between reading and writing: someone else acted first. */
export function changedMeanwhile(alternativeId: number, tx: Db): Response {
  const now = tx.select({ status: alternatives.status, version: alternatives.version }).from(alternatives).where(eq(alternatives.id, alternativeId)).get();
  const state = now ? STATE_LABELS[now.status].toLowerCase() : "gone";
  return apiError("conflict", `Someone else acted on this alternative first: it is now ${state}${now ? ` (version ${now.version})` : ""}. Nothing was changed; reload to see it.`, now);
}
