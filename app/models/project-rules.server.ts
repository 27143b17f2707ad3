import { eq } from "drizzle-orm";
import { z } from "zod";
import { defaultTakeRules } from "~/calculations/take-rules";
import { projects } from "~/db/schema";
import type { TakeRules } from "~/geometry/take-types";
import type { LengthUnit } from "~/geometry/units";
import { TakeRulesSchema, type TakeRulesOverrides } from "~/schemas/take-schemas";
import { apiError } from "~/utils/api-error.server";
import { db, type Db } from "~/utils/db.server";
import { GeometryInputError } from "~/geometry/errors";
import { readImpacts } from "./alternative-impacts.server";
import { listAlternatives } from "./alternatives.server";
import { recordAuditEvent } from "./audit.server";
import type { Project } from "./projects.server";

type RuleShape = typeof TakeRulesSchema.shape;
export type TakeRuleKey = keyof RuleShape;

/** The rule keys in the order the page lists them (the schema's order). */
export const TAKE_RULE_KEYS = Object.keys(TakeRulesSchema.shape) as TakeRuleKey[];

/** A change to a project's rules: a number sets a rule, `null` clears it back to the default, a missing key leaves it. */
export const TakeRulesPatchSchema = z
  .object(Object.fromEntries(TAKE_RULE_KEYS.map((k) => [k, TakeRulesSchema.shape[k].nullable()])) as { [K in TakeRuleKey]: z.ZodNullable<RuleShape[K]> })
  .strict();
export type TakeRulesPatch = z.infer<typeof TakeRulesPatchSchema>;

/** `PATCH /api/v1/projects/:projectId` body. */
export const ProjectPatchSchema = z.object({ takeRules: TakeRulesPatchSchema }).strict();

/** The project's own rules with the patch applied key by key; `null` removes a key. */
export function mergeTakeRules(current: TakeRulesOverrides | null | undefined, patch: TakeRulesPatch): TakeRulesOverrides {
  const merged: TakeRulesOverrides = { ...(current ?? {}) };
  for (const key of TAKE_RULE_KEYS) {
    const value = patch[key];
    if (value === null) delete merged[key];
    else if (value !== undefined) merged[key] = value;
  }
  return merged;
}

export type RulesFormResult = { ok: true; patch: TakeRulesPatch } | { ok: false; fieldErrors: Partial<Record<TakeRuleKey, string>> };

function fieldMessage(issue: z.core.$ZodIssue | undefined): string {
  if (issue?.code === "too_small") return "Enter 0 or more.";
  if (issue?.code === "too_big") return `Enter at most ${String(issue.maximum)}.`;
  return "Enter a number, or leave it blank for the default.";
}

/**
 * Reads the rules form: every rule is a field named by its key; a blank field means "use the
 * default" (null), anything else must be a plain number the rule accepts. Keys not in the form
 * are left as they are.
 */
export function readTakeRulesForm(form: Record<string, string>): RulesFormResult {
  const patch: Record<string, number | null> = {};
  const fieldErrors: Partial<Record<TakeRuleKey, string>> = {};
  for (const key of TAKE_RULE_KEYS) {
    const text = form[key]?.trim();
    if (text === undefined) continue;
    if (text === "") {
      patch[key] = null;
      continue;
    }
    const parsed = TakeRulesSchema.shape[key].safeParse(/^[+-]?(\d+\.?\d*|\.\d+)(e[+-]?\d+)?$/i.test(text) ? Number(text) : Number.NaN);
    if (parsed.success && parsed.data !== undefined) patch[key] = parsed.data;
    else fieldErrors[key] = fieldMessage(parsed.error?.issues[0]);
  }
  return Object.keys(fieldErrors).length > 0 ? { ok: false, fieldErrors } : { ok: true, patch: patch as TakeRulesPatch };
}

/**
 * Applies a patch to the project's own take and cost rules in one transaction (read, merge, write,
 * audit), so two saves never lose each other's keys. Returns the updated project.
 */
export function updateProjectTakeRules(projectId: number, patch: TakeRulesPatch, actor: { id: number }, tx: Db = db()): Project {
  return tx.transaction((t) => {
    const current = t.select({ takeRules: projects.takeRules }).from(projects).where(eq(projects.id, projectId)).get();
    if (!current) throw apiError("not_found", "No such project, or you are not a member of it.");
    const merged = mergeTakeRules(current.takeRules, patch);
    const stored = Object.keys(merged).length > 0 ? (merged as Record<string, number>) : null;
    const project = t.update(projects).set({ takeRules: stored }).where(eq(projects.id, projectId)).returning().get()!;
    recordAuditEvent({ actorId: actor.id, projectId, action: "project.take-rules-changed", subject: project.name, details: { patch, takeRules: stored } }, t);
    return project;
  });
}

/**
 * Saves a rules change, then works out every alternative's takes and costs under the new rules
 * (readImpacts stores them under a hash of the resolved rules), so the project's lists show
 * current figures at once. Returns the updated project.
 */
export function saveProjectTakeRules(project: Pick<Project, "id">, patch: TakeRulesPatch, actor: { id: number }, tx: Db = db()): Project {
  const updated = updateProjectTakeRules(project.id, patch, actor, tx);
  for (const alternative of listAlternatives(updated.id, tx)) {
    try {
      readImpacts(alternative, updated, tx);
    } catch (error) {
      // An alignment the engine refuses fails the same way on its own page, whatever the rules; the save stands.
      if (!(error instanceof GeometryInputError)) throw error;
    }
  }
  return updated;
}

/** The project's rules key by key for its page: the value in effect, whose it is, and the default (in the project's units). */
export function describeProjectRules(project: Pick<Project, "units" | "takeRules">) {
  const defaults: TakeRules = defaultTakeRules(project.units as LengthUnit);
  const own: TakeRulesOverrides = project.takeRules ?? {};
  return TAKE_RULE_KEYS.map((key) => {
    const mine = own[key];
    return typeof mine === "number"
      ? { key, value: mine, source: "project" as const, defaultValue: defaults[key] }
      : { key, value: defaults[key], source: "default" as const, defaultValue: defaults[key] };
  });
}
