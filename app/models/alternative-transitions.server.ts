import { and, asc, desc, eq } from "drizzle-orm";
import type { AlternativeState, LifecycleAction } from "~/calculations/alternative-lifecycle";
import { alternativeTransitions, alternatives, users } from "~/db/schema";
import { db, type Db } from "~/utils/db.server";
import { recordAuditEvent } from "./audit.server";

export interface TransitionInput {
  alternativeId: number;
  projectId: number;
  version: number;
  action: LifecycleAction;
  from: AlternativeState;
  to: AlternativeState;
  actorId: number | null;
  comment?: string;
}

/** Records one lifecycle transition and its audit event; call it in the transaction of the change. */
export function recordTransition(t: TransitionInput, tx: Db = db()): void {
  const comment = t.comment ?? "";
  tx.insert(alternativeTransitions)
    .values({ alternativeId: t.alternativeId, projectId: t.projectId, version: t.version, action: t.action, fromStatus: t.from, toStatus: t.to, actorId: t.actorId, comment })
    .run();
  recordAuditEvent(
    { actorId: t.actorId, projectId: t.projectId, action: `alternative.${t.action}`, subject: String(t.alternativeId), details: { alternativeId: t.alternativeId, version: t.version, from: t.from, to: t.to, comment } },
    tx,
  );
}

const transitionColumns = {
  id: alternativeTransitions.id,
  alternativeId: alternativeTransitions.alternativeId,
  alternativeName: alternatives.name,
  version: alternativeTransitions.version,
  action: alternativeTransitions.action,
  fromStatus: alternativeTransitions.fromStatus,
  toStatus: alternativeTransitions.toStatus,
  comment: alternativeTransitions.comment,
  at: alternativeTransitions.at,
  actorName: users.name,
  actorEmail: users.email,
};

export type TransitionRow = { id: number; alternativeId: number; alternativeName: string; version: number; action: LifecycleAction; fromStatus: AlternativeState; toStatus: AlternativeState; comment: string; at: Date; actorName: string | null; actorEmail: string | null };

/** A project's lifecycle history, newest first, with who acted. */
export function listProjectTransitions(projectId: number, limit = 200, tx: Db = db()): TransitionRow[] {
  return tx
    .select(transitionColumns)
    .from(alternativeTransitions)
    .innerJoin(alternatives, eq(alternatives.id, alternativeTransitions.alternativeId))
    .leftJoin(users, eq(users.id, alternativeTransitions.actorId))
    .where(eq(alternativeTransitions.projectId, projectId))
    .orderBy(desc(alternativeTransitions.id))
    .limit(limit)
    .all();
}

/** One alternative's history, oldest first. */
export function listAlternativeTransitions(alternativeId: number, tx: Db = db()): TransitionRow[] {
  return tx
    .select(transitionColumns)
    .from(alternativeTransitions)
    .innerJoin(alternatives, eq(alternatives.id, alternativeTransitions.alternativeId))
    .leftJoin(users, eq(users.id, alternativeTransitions.actorId))
    .where(eq(alternativeTransitions.alternativeId, alternativeId))
    .orderBy(asc(alternativeTransitions.id))
    .all();
}

/** Who submitted the alternative most recently, and when (the person a returned alternative's comments go to). */
export function findLastSubmission(alternativeId: number, tx: Db = db()): { userId: number; email: string; name: string; at: Date; version: number; comment: string } | undefined {
  return tx
    .select({ userId: users.id, email: users.email, name: users.name, at: alternativeTransitions.at, version: alternativeTransitions.version, comment: alternativeTransitions.comment })
    .from(alternativeTransitions)
    .innerJoin(users, eq(users.id, alternativeTransitions.actorId))
    .where(and(eq(alternativeTransitions.alternativeId, alternativeId), eq(alternativeTransitions.action, "submit")))
    .orderBy(desc(alternativeTransitions.id))
    .get();
}
