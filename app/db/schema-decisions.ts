import { sql } from "drizzle-orm";
import { index, integer, primaryKey, real, sqliteTable, text, uniqueIndex } from "drizzle-orm/sqlite-core";
import { createdAt } from "./columns";
import { ACQUISITION_STATUSES } from "../calculations/acquisition-status";
import { ALTERNATIVE_STATES, LIFECYCLE_ACTIONS } from "../calculations/alternative-lifecycle";
import { projects, users } from "./schema";
import { alternatives, takeResults } from "./schema-alternatives";

/**
 * Every change of an alternative's lifecycle state (issue 6): who, when, at which version, and
 * the comment given. The state machine is app/calculations/alternative-lifecycle.ts.
 */
export const alternativeTransitions = sqliteTable(
  "alternative_transitions",
  {
    id: integer("id").primaryKey({ autoIncrement: true }),
    alternativeId: integer("alternative_id").notNull().references(() => alternatives.id, { onDelete: "cascade" }),
    projectId: integer("project_id").notNull().references(() => projects.id, { onDelete: "cascade" }),
    version: integer("version").notNull(),
    action: text("action", { enum: LIFECYCLE_ACTIONS }).notNull(),
    fromStatus: text("from_status", { enum: ALTERNATIVE_STATES }).notNull(),
    toStatus: text("to_status", { enum: ALTERNATIVE_STATES }).notNull(),
    actorId: integer("actor_id").references(() => users.id),
    comment: text("comment").notNull().default(""),
    at: createdAt(),
  },
  (t) => [index("alternative_transitions_alternative").on(t.alternativeId, t.id), index("alternative_transitions_project").on(t.projectId, t.at)],
);

/**
 * The approvals of a project's preferred alternative, each pinned to the approved version and its
 * take result. Exactly one per project is `preferred` (a partial unique index); a later approval
 * marks the earlier one `superseded`, and both stay on record.
 */
export const preferredAlternatives = sqliteTable(
  "preferred_alternatives",
  {
    id: integer("id").primaryKey({ autoIncrement: true }),
    projectId: integer("project_id").notNull().references(() => projects.id, { onDelete: "cascade" }),
    alternativeId: integer("alternative_id").notNull().references(() => alternatives.id, { onDelete: "cascade" }),
    version: integer("version").notNull(),
    takeResultId: integer("take_result_id").references(() => takeResults.id),
    // A copy of the approved version's summary, as it was when approved.
    summary: text("summary", { mode: "json" }).$type<Record<string, unknown>>().notNull(),
    status: text("status", { enum: ["preferred", "superseded"] }).notNull().default("preferred"),
    comment: text("comment").notNull().default(""),
    approvedBy: integer("approved_by").references(() => users.id),
    approvedAt: createdAt(),
    supersededAt: integer("superseded_at", { mode: "timestamp_ms" }),
    supersededById: integer("superseded_by_id"),
  },
  (t) => [
    uniqueIndex("preferred_alternatives_one_per_project").on(t.projectId).where(sql`status = 'preferred'`),
    index("preferred_alternatives_alternative").on(t.alternativeId, t.version),
  ],
);

/**
 * A parcel of the preferred alternative being acquired: its take as approved (figures copied, so
 * they never change under the agent), the land agent working it and its acquisition status. One
 * case per parcel and project: a new approval updates the take figures and keeps the agent, the
 * status and the history; a parcel the new preferred alternative no longer takes is `released`.
 */
export const parcelCases = sqliteTable(
  "parcel_cases",
  {
    id: integer("id").primaryKey({ autoIncrement: true }),
    projectId: integer("project_id").notNull().references(() => projects.id, { onDelete: "cascade" }),
    preferredId: integer("preferred_id").notNull().references(() => preferredAlternatives.id),
    parcelId: text("parcel_id").notNull(),
    owner: text("owner"),
    address: text("address"),
    // Areas in the project's units squared, stations internal, cost in the project's currency: estimates.
    parcelArea: real("parcel_area").notNull(),
    takeArea: real("take_area").notNull(),
    easementArea: real("easement_area").notNull(),
    remainderArea: real("remainder_area").notNull(),
    classification: text("classification", { enum: ["partial", "full"] }).notNull(),
    buildingsHit: integer("buildings_hit").notNull(),
    estimatedCost: real("estimated_cost").notNull(),
    stationFrom: real("station_from").notNull(),
    stationTo: real("station_to").notNull(),
    agentId: integer("agent_id").references(() => users.id, { onDelete: "set null" }),
    status: text("status", { enum: ACQUISITION_STATUSES }).notNull().default("not-started"),
    state: text("state", { enum: ["open", "released"] }).notNull().default("open"),
    openedAt: createdAt(),
    assignedAt: integer("assigned_at", { mode: "timestamp_ms" }),
    statusChangedAt: integer("status_changed_at", { mode: "timestamp_ms" }).notNull(),
    updatedAt: integer("updated_at", { mode: "timestamp_ms" }).notNull(),
    releasedAt: integer("released_at", { mode: "timestamp_ms" }),
  },
  (t) => [uniqueIndex("parcel_cases_project_parcel").on(t.projectId, t.parcelId), index("parcel_cases_agent").on(t.agentId, t.state)],
);

/** The history of a parcel case: opened, assigned, status changes, notes, new take figures, released. */
export const parcelCaseEvents = sqliteTable(
  "parcel_case_events",
  {
    id: integer("id").primaryKey({ autoIncrement: true }),
    caseId: integer("case_id").notNull().references(() => parcelCases.id, { onDelete: "cascade" }),
    at: createdAt(),
    actorId: integer("actor_id").references(() => users.id),
    kind: text("kind", { enum: ["opened", "assigned", "status", "note", "take-updated", "released", "reopened"] }).notNull(),
    fromValue: text("from_value"),
    toValue: text("to_value"),
    note: text("note").notNull().default(""),
    preferredId: integer("preferred_id").references(() => preferredAlternatives.id),
  },
  (t) => [index("parcel_case_events_case").on(t.caseId, t.id)],
);
