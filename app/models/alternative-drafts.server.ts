import { and, eq } from "drizzle-orm";
import { planTransition } from "~/calculations/alternative-lifecycle";
import { alternatives } from "~/db/schema";
import { apiError } from "~/utils/api-error.server";
import type { Db } from "~/utils/db.server";
import { recordTransition } from "./alternative-transitions.server";
import { changedMeanwhile } from "./lifecycle-update.server";

/**
 * Runs first in a planner's save transaction. An alternative awaiting a decision cannot be edited
 * (409); an approved, replaced or returned one goes back to draft, so the save that follows becomes
 * the next version while the approved version's inputs (alternative_versions), its take result and
 * the project's preferred-alternative record stay exactly as they were. A save from a stale version
 * is left to the save's own version test (its usual 409).
 */
export function reopenForEdit(alternativeId: number, expectedVersion: number, actorId: number | null, tx: Db): void {
  const row = tx.select({ status: alternatives.status, version: alternatives.version, projectId: alternatives.projectId }).from(alternatives).where(eq(alternatives.id, alternativeId)).get();
  if (!row || row.version !== expectedVersion) return;
  const plan = planTransition(row.status, "edit", "planner");
  if (!plan.ok) throw apiError("conflict", plan.message, { status: row.status, version: row.version });
  if (row.status === "draft") return;
  const moved = tx
    .update(alternatives)
    .set({ status: "draft" })
    .where(and(eq(alternatives.id, alternativeId), eq(alternatives.version, expectedVersion), eq(alternatives.status, row.status)))
    .returning({ id: alternatives.id })
    .get();
  if (!moved) throw changedMeanwhile(alternativeId, tx);
  const comment = plan.startsNewVersion ? `Version ${row.version} stays as approved; the edit starts version ${row.version + 1}.` : "";
  recordTransition({ alternativeId, projectId: row.projectId, version: row.version + 1, action: "edit", from: row.status, to: "draft", actorId, comment }, tx);
}
