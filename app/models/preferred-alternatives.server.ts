import { and, desc, eq } from "drizzle-orm";
import type { AlternativeSummary } from "~/calculations/alternative-summary";
import { alternatives, preferredAlternatives, takeResults, users } from "~/db/schema";
import { db, type Db } from "~/utils/db.server";
import type { Alternative } from "./alternatives.server";
import { recordTransition } from "./alternative-transitions.server";
import type { StoredImpacts } from "./alternative-impacts.server";
import type { Actor } from "./lifecycle-update.server";

export type PreferredRow = typeof preferredAlternatives.$inferSelect;
export type Preferred = Omit<PreferredRow, "summary"> & { summary: AlternativeSummary; alternativeName: string; approvedByName: string | null };

const columns = {
  row: preferredAlternatives,
  alternativeName: alternatives.name,
  approvedByName: users.name,
};

function withNames(r: { row: PreferredRow; alternativeName: string; approvedByName: string | null }): Preferred {
  return { ...r.row, summary: r.row.summary as unknown as AlternativeSummary, alternativeName: r.alternativeName, approvedByName: r.approvedByName };
}

/** The project's preferred alternative (its approved version), if one has been approved. */
export function findPreferred(projectId: number, tx: Db = db()): Preferred | undefined {
  const r = tx
    .select(columns)
    .from(preferredAlternatives)
    .innerJoin(alternatives, eq(alternatives.id, preferredAlternatives.alternativeId))
    .leftJoin(users, eq(users.id, preferredAlternatives.approvedBy))
    .where(and(eq(preferredAlternatives.projectId, projectId), eq(preferredAlternatives.status, "preferred")))
    .get();
  return r ? withNames(r) : undefined;
}

/** Every approval of the project, newest first: the preferred one and those it replaced. */
export function listApprovals(projectId: number, tx: Db = db()): Preferred[] {
  return tx
    .select(columns)
    .from(preferredAlternatives)
    .innerJoin(alternatives, eq(alternatives.id, preferredAlternatives.alternativeId))
    .leftJoin(users, eq(users.id, preferredAlternatives.approvedBy))
    .where(eq(preferredAlternatives.projectId, projectId))
    .orderBy(desc(preferredAlternatives.id))
    .all()
    .map(withNames);
}

/**
 * Records the approval of `approved` (already moved to `approved`) as the project's preferred
 * alternative, pinned to its version and take result. The earlier approval becomes superseded, and
 * so does its alternative if it still stands at that approved version (not if a new draft was
 * started from it). Runs inside the approval's transaction.
 */
export function recordApproval(approved: Alternative, impacts: StoredImpacts, actor: Actor, comment: string, tx: Db): PreferredRow {
  const previous = findPreferred(approved.projectId, tx);
  const now = new Date();
  if (previous) {
    tx.update(preferredAlternatives).set({ status: "superseded", supersededAt: now }).where(and(eq(preferredAlternatives.id, previous.id), eq(preferredAlternatives.status, "preferred"))).run();
    if (previous.alternativeId !== approved.id) supersedeAlternative(previous, approved, actor, tx);
  }
  const row = tx
    .insert(preferredAlternatives)
    .values({
      projectId: approved.projectId,
      alternativeId: approved.id,
      version: approved.version,
      takeResultId: findTakeResultId(approved, impacts, tx),
      summary: impacts.summary as unknown as Record<string, unknown>,
      comment,
      approvedBy: actor.id,
    })
    .returning()
    .get();
  if (previous) tx.update(preferredAlternatives).set({ supersededById: row.id }).where(eq(preferredAlternatives.id, previous.id)).run();
  return row;
}

function supersedeAlternative(previous: Preferred, approved: Alternative, actor: Actor, tx: Db): void {
  const moved = tx
    .update(alternatives)
    .set({ status: "superseded" })
    .where(and(eq(alternatives.id, previous.alternativeId), eq(alternatives.status, "approved"), eq(alternatives.version, previous.version)))
    .returning({ id: alternatives.id })
    .get();
  if (!moved) return;
  const comment = `Replaced by ${approved.name} (version ${approved.version}).`;
  recordTransition({ alternativeId: previous.alternativeId, projectId: previous.projectId, version: previous.version, action: "supersede", from: "approved", to: "superseded", actorId: actor.id, comment }, tx);
}

/** The stored take result the approved figures came from (same alternative and computation time; the row may carry an earlier version with identical inputs). */
function findTakeResultId(approved: Alternative, impacts: StoredImpacts, tx: Db): number | null {
  return (
    tx
      .select({ id: takeResults.id })
      .from(takeResults)
      .where(and(eq(takeResults.alternativeId, approved.id), eq(takeResults.computedAt, impacts.computedAt)))
      .orderBy(desc(takeResults.id))
      .get()?.id ?? null
  );
}
