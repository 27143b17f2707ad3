import { and, asc, eq, sql } from "drizzle-orm";
import type { CheckAcceptance } from "~/calculations/check-acceptances";
import { alternatives, alternativeVersions, projectMembers } from "~/db/schema";
import type { AlignmentInput } from "~/geometry/alignment-types";
import type { CorridorInput } from "~/geometry/take-types";
import type { TakeRulesOverrides } from "~/schemas/take-schemas";
import { db, type Db } from "~/utils/db.server";
import type { Role } from "~/utils/roles";
import { recordAuditEvent } from "./audit.server";

type Row = typeof alternatives.$inferSelect;

/** An alternative with its JSON columns typed as the engine's contracts. */
export type Alternative = Omit<Row, "alignment" | "corridor" | "rules" | "acceptedChecks"> & {
  alignment: AlignmentInput;
  corridor: CorridorInput;
  rules: TakeRulesOverrides;
  /** Each stamped by the server with who accepted it and when (see stampAcceptances). */
  acceptedChecks: CheckAcceptance[];
};

/** The inputs a planner edits; everything a take result depends on, except the land layers. */
export type AlternativeInputs = Pick<Alternative, "name" | "description" | "designSpeed" | "speedUnit" | "emaxPercent" | "alignment" | "corridor" | "rules" | "acceptedChecks">;

/** Corridor colours, one per alternative in creation order: distinct from the parcel and basemap palette. */
const COLOURS = ["#d9480f", "#0b7285", "#7048e8", "#2b8a3e", "#c2255c", "#5c940d", "#1864ab", "#e67700"];

const asAlternative = (row: Row): Alternative => row as unknown as Alternative;

/** Creates version 1 of an alternative and records it, in one transaction. */
export function createAlternative(projectId: number, inputs: AlternativeInputs, actorId: number | null, tx: Db = db()): Alternative {
  return tx.transaction((t) => {
    const count = t.select({ n: sql<number>`count(*)` }).from(alternatives).where(eq(alternatives.projectId, projectId)).get()?.n ?? 0;
    const row = t
      .insert(alternatives)
      .values({ ...toColumns(inputs), name: inputs.name, designSpeed: inputs.designSpeed, speedUnit: inputs.speedUnit, emaxPercent: inputs.emaxPercent, alignment: json(inputs.alignment), corridor: json(inputs.corridor), rules: json(inputs.rules), acceptedChecks: inputs.acceptedChecks, projectId, colour: COLOURS[count % COLOURS.length]!, createdBy: actorId, updatedBy: actorId, updatedAt: new Date() })
      .returning()
      .get();
    saveVersion(row, actorId, t);
    recordAuditEvent({ actorId, projectId, action: "alternative.created", subject: inputs.name, details: { alternativeId: row.id, version: 1 } }, t);
    return asAlternative(row);
  });
}

export type UpdateOutcome = { kind: "saved"; alternative: Alternative } | { kind: "conflict"; current: Alternative };

/**
 * Saves changes made from `expectedVersion`. The version test is inside the UPDATE itself, so two
 * saves from the same version cannot both win: the second finds no row and gets the current state.
 */
export function updateAlternative(id: number, expectedVersion: number, changes: Partial<AlternativeInputs>, actorId: number | null, tx: Db = db()): UpdateOutcome {
  return tx.transaction((t) => {
    const row = t
      .update(alternatives)
      .set({ ...toColumns(changes), version: sql`${alternatives.version} + 1`, updatedBy: actorId, updatedAt: new Date() })
      .where(and(eq(alternatives.id, id), eq(alternatives.version, expectedVersion)))
      .returning()
      .get();
    if (!row) return { kind: "conflict", current: asAlternative(t.select().from(alternatives).where(eq(alternatives.id, id)).get()!) };
    saveVersion(row, actorId, t);
    recordAuditEvent({ actorId, projectId: row.projectId, action: "alternative.saved", subject: row.name, details: { alternativeId: id, version: row.version, fields: Object.keys(changes) } }, t);
    return { kind: "saved", alternative: asAlternative(row) };
  });
}

export function listAlternatives(projectId: number, tx: Db = db()): Alternative[] {
  return tx.select().from(alternatives).where(eq(alternatives.projectId, projectId)).orderBy(asc(alternatives.id)).all().map(asAlternative);
}

/** The alternative if the user may see its project (member, or admin), scoped in the query. */
export function findAlternativeForUser(id: number, user: { id: number; role: Role }, tx: Db = db()): Alternative | undefined {
  if (user.role === "admin") return tx.select().from(alternatives).where(eq(alternatives.id, id)).get() as unknown as Alternative | undefined;
  return tx
    .select({ alternative: alternatives })
    .from(alternatives)
    .innerJoin(projectMembers, and(eq(projectMembers.projectId, alternatives.projectId), eq(projectMembers.userId, user.id)))
    .where(eq(alternatives.id, id))
    .get()?.alternative as unknown as Alternative | undefined;
}

export function findAlternativeByName(projectId: number, name: string, tx: Db = db()): Alternative | undefined {
  return tx.select().from(alternatives).where(and(eq(alternatives.projectId, projectId), eq(alternatives.name, name))).get() as unknown as Alternative | undefined;
}

/** The inputs an alternative had at a saved version. */
export function findAlternativeVersion(id: number, version: number, tx: Db = db()): AlternativeInputs | undefined {
  return tx.select().from(alternativeVersions).where(and(eq(alternativeVersions.alternativeId, id), eq(alternativeVersions.version, version))).get()?.inputs as unknown as AlternativeInputs | undefined;
}

export function inputsOf(a: Alternative): AlternativeInputs {
  const { name, description, designSpeed, speedUnit, emaxPercent, alignment, corridor, rules, acceptedChecks } = a;
  return { name, description, designSpeed, speedUnit, emaxPercent, alignment, corridor, rules, acceptedChecks };
}

function saveVersion(row: Row, actorId: number | null, t: Db): void {
  t.insert(alternativeVersions).values({ alternativeId: row.id, version: row.version, inputs: inputsOf(asAlternative(row)) as unknown as Record<string, unknown>, savedBy: actorId }).run();
}

const json = (v: object): Record<string, unknown> => v as Record<string, unknown>;

function toColumns(inputs: Partial<AlternativeInputs>) {
  const { alignment, corridor, rules, ...rest } = inputs;
  return {
    ...rest,
    ...(alignment ? { alignment: json(alignment) } : {}),
    ...(corridor ? { corridor: json(corridor) } : {}),
    ...(rules ? { rules: json(rules) } : {}),
  };
}

/** The alternative as the API shows it; `summary` is its latest computed one, if any. */
export function toAlternativeJson(a: Alternative, extra: Record<string, unknown> = {}) {
  return {
    id: a.id,
    projectId: a.projectId,
    name: a.name,
    description: a.description,
    designSpeed: a.designSpeed,
    speedUnit: a.speedUnit,
    emaxPercent: a.emaxPercent,
    alignment: a.alignment,
    corridor: a.corridor,
    rules: a.rules,
    acceptedChecks: a.acceptedChecks,
    colour: a.colour,
    status: a.status,
    version: a.version,
    createdBy: a.createdBy,
    createdAt: a.createdAt.toISOString(),
    updatedBy: a.updatedBy,
    updatedAt: a.updatedAt.toISOString(),
    ...extra,
  };
}
