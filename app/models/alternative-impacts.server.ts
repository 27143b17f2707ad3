import { createHash } from "node:crypto";
import { and, desc, eq } from "drizzle-orm";
import { takeResults } from "~/db/schema";
import { evaluateAlternative, type Evaluation, type EvaluationInputs, type TakeComputer } from "~/calculations/evaluate-alternative";
import type { AlternativeSummary } from "~/calculations/alternative-summary";
import { resolveTakeRules } from "~/calculations/take-rules";
import { createTakeSession } from "~/geometry/take-session";
import type { ParcelTake } from "~/geometry/take-types";
import type { LengthUnit } from "~/geometry/units";
import { db, type Db } from "~/utils/db.server";
import type { Alternative, AlternativeInputs } from "./alternatives.server";
import { readProjectLand, readProjectLandKey, type ProjectLand } from "./project-land.server";
import type { Project } from "./projects.server";

/** Bump when the take engine's results change for the same inputs, so stored results are recomputed. */
const TAKE_ENGINE_VERSION = 3; // 3: ground the right-of-way covers twice is taken once
const SESSIONS_KEPT = 3;

/** Take sessions by land key, most recently used last: the parsed fabric stays in memory between edits. */
const sessions = new Map<string, { session: TakeComputer; land: ProjectLand }>();

/** The project's land and take session, reading its layers only when they changed since last time. */
export function landSessionFor(project: Project, tx: Db = db()): { session: TakeComputer; land: ProjectLand } {
  const key = readProjectLandKey(project, tx);
  const cached = sessions.get(key);
  if (cached) {
    sessions.delete(key);
    sessions.set(key, cached);
    return cached;
  }
  const land = readProjectLand(project, tx);
  const entry = { session: createTakeSession(land.parcels, land.buildings), land };
  sessions.set(key, entry);
  while (sessions.size > SESSIONS_KEPT) sessions.delete(sessions.keys().next().value!);
  return entry;
}

/** The project's take session (see {@link landSessionFor}). */
export function takeSessionFor(project: Project, tx: Db = db()): TakeComputer {
  return landSessionFor(project, tx).session;
}

/** The engine's inputs for an alternative's saved (or edited) inputs in its project. */
export function evaluationInputsOf(inputs: Pick<AlternativeInputs, "alignment" | "corridor" | "rules" | "designSpeed" | "speedUnit" | "emaxPercent" | "acceptedChecks">, project: Project): EvaluationInputs {
  return {
    alignment: inputs.alignment,
    corridor: inputs.corridor,
    rules: resolveTakeRules(project.units as LengthUnit, project.takeRules, inputs.rules),
    design: { designSpeed: inputs.designSpeed, speedUnit: inputs.speedUnit, emaxPercent: inputs.emaxPercent },
    acceptedChecks: inputs.acceptedChecks,
  };
}

export interface StoredImpacts {
  version: number;
  computedAt: Date;
  summary: AlternativeSummary;
  parcels: ParcelTake[];
}

/**
 * The alternative's impacts at its current version: read from storage when nothing they depend on
 * changed (inputs, rules, land layers, engine), computed and stored otherwise.
 */
export function readImpacts(alternative: Alternative, project: Project, tx: Db = db()): StoredImpacts {
  const inputs = evaluationInputsOf(alternative, project);
  const landKey = readProjectLandKey(project, tx);
  const inputHash = hashInputs(inputs, landKey);
  const stored = tx.select().from(takeResults).where(and(eq(takeResults.alternativeId, alternative.id), eq(takeResults.inputHash, inputHash))).get();
  if (stored) return { version: alternative.version, computedAt: stored.computedAt, summary: stored.summary as unknown as AlternativeSummary, parcels: stored.parcels as unknown as ParcelTake[] };
  const evaluation = evaluateAlternative(inputs, takeSessionFor(project, tx));
  const row = tx
    .insert(takeResults)
    .values({ alternativeId: alternative.id, version: alternative.version, inputHash, summary: evaluation.summary as unknown as Record<string, unknown>, parcels: evaluation.takes.parcels as unknown as Record<string, unknown>[] })
    .returning()
    .get();
  return { version: alternative.version, computedAt: row.computedAt, summary: evaluation.summary, parcels: evaluation.takes.parcels };
}

/** Evaluates inputs that are not saved (the editor's what-if); nothing is stored. */
export function previewImpacts(inputs: EvaluationInputs, project: Project, tx: Db = db()): Evaluation {
  return evaluateAlternative(inputs, takeSessionFor(project, tx));
}

/** The latest stored summary of an alternative, if any, without computing. */
export function readLatestSummary(alternativeId: number, tx: Db = db()): AlternativeSummary | undefined {
  return tx.select({ summary: takeResults.summary }).from(takeResults).where(eq(takeResults.alternativeId, alternativeId)).orderBy(desc(takeResults.version), desc(takeResults.id)).get()?.summary as unknown as AlternativeSummary | undefined;
}

function hashInputs(inputs: EvaluationInputs, landKey: string): string {
  return createHash("sha256").update(JSON.stringify({ engine: TAKE_ENGINE_VERSION, landKey, ...inputs })).digest("hex");
}
