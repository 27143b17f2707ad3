import { index, integer, primaryKey, real, sqliteTable, text, uniqueIndex } from "drizzle-orm/sqlite-core";
import { createdAt } from "./columns";
import { projects, users } from "./schema";

/**
 * A candidate alignment of a project with its right-of-way corridor and take rules. `version`
 * grows by one on every saved change; a save names the version it started from (optimistic
 * concurrency). JSON columns hold the engine's own contracts (app/geometry alignment-types,
 * take-types).
 */
export const alternatives = sqliteTable(
  "alternatives",
  {
    id: integer("id").primaryKey({ autoIncrement: true }),
    projectId: integer("project_id").notNull().references(() => projects.id, { onDelete: "cascade" }),
    name: text("name").notNull(),
    description: text("description").notNull().default(""),
    // Design inputs for the checks: speed in speedUnit, maximum superelevation in percent.
    designSpeed: real("design_speed").notNull(),
    speedUnit: text("speed_unit", { enum: ["km/h", "mph"] }).notNull(),
    emaxPercent: integer("emax_percent").notNull(),
    alignment: text("alignment", { mode: "json" }).$type<Record<string, unknown>>().notNull(),
    corridor: text("corridor", { mode: "json" }).$type<Record<string, unknown>>().notNull(),
    rules: text("rules", { mode: "json" }).$type<Record<string, unknown>>().notNull(),
    acceptedChecks: text("accepted_checks", { mode: "json" }).$type<{ id: string; reason: string }[]>().notNull(),
    colour: text("colour").notNull(),
    status: text("status", { enum: ["draft", "submitted", "approved", "returned", "superseded"] }).notNull().default("draft"),
    version: integer("version").notNull().default(1),
    createdBy: integer("created_by").references(() => users.id),
    createdAt: createdAt(),
    updatedBy: integer("updated_by").references(() => users.id),
    updatedAt: integer("updated_at", { mode: "timestamp_ms" }).notNull(),
  },
  (t) => [index("alternatives_project").on(t.projectId)],
);

/** Every saved version of an alternative's inputs, so an approved version can be shown as it was. */
export const alternativeVersions = sqliteTable(
  "alternative_versions",
  {
    alternativeId: integer("alternative_id").notNull().references(() => alternatives.id, { onDelete: "cascade" }),
    version: integer("version").notNull(),
    inputs: text("inputs", { mode: "json" }).$type<Record<string, unknown>>().notNull(),
    savedBy: integer("saved_by").references(() => users.id),
    savedAt: createdAt(),
  },
  (t) => [primaryKey({ columns: [t.alternativeId, t.version] })],
);

/**
 * Take results of an alternative, keyed by a hash of everything they depend on (alignment,
 * corridor, rules and the project's land layers), so they are recomputed only when one changes.
 */
export const takeResults = sqliteTable(
  "take_results",
  {
    id: integer("id").primaryKey({ autoIncrement: true }),
    alternativeId: integer("alternative_id").notNull().references(() => alternatives.id, { onDelete: "cascade" }),
    version: integer("version").notNull(),
    inputHash: text("input_hash").notNull(),
    summary: text("summary", { mode: "json" }).$type<Record<string, unknown>>().notNull(),
    parcels: text("parcels", { mode: "json" }).$type<Record<string, unknown>[]>().notNull(),
    computedAt: createdAt(),
  },
  (t) => [uniqueIndex("take_results_alternative_hash").on(t.alternativeId, t.inputHash), index("take_results_alternative_version").on(t.alternativeId, t.version)],
);
