import { sql } from "drizzle-orm";
import { index, integer, primaryKey, real, sqliteTable, text, uniqueIndex } from "drizzle-orm/sqlite-core";
import { ROLES, type Role } from "../utils/roles";
import { ACQUISITION_STATUSES } from "../calculations/acquisition-status";
import { ALTERNATIVE_STATES, LIFECYCLE_ACTIONS } from "../calculations/alternative-lifecycle";

const createdAt = () =>
  integer("created_at", { mode: "timestamp_ms" }).notNull().default(sql`(unixepoch('subsec') * 1000)`);

export const users = sqliteTable("users", {
  id: integer("id").primaryKey({ autoIncrement: true }),
  email: text("email").notNull().unique(),
  name: text("name").notNull(),
  role: text("role", { enum: ROLES }).$type<Role>().notNull(),
  // Null until an invited user accepts and chooses a password.
  passwordHash: text("password_hash"),
  status: text("status", { enum: ["invited", "active", "disabled"] }).notNull().default("active"),
  createdAt: createdAt(),
});

export const apiTokens = sqliteTable("api_tokens", {
  id: integer("id").primaryKey({ autoIncrement: true }),
  userId: integer("user_id").notNull().references(() => users.id, { onDelete: "cascade" }),
  label: text("label").notNull(),
  // SHA-256 of the token: the token itself is shown once and never stored.
  tokenHash: text("token_hash").notNull().unique(),
  createdAt: createdAt(),
  lastUsedAt: integer("last_used_at", { mode: "timestamp_ms" }),
  revokedAt: integer("revoked_at", { mode: "timestamp_ms" }),
});

/** Single-use links sent by e-mail: invitations and password resets. */
export const emailLinks = sqliteTable("email_links", {
  id: integer("id").primaryKey({ autoIncrement: true }),
  userId: integer("user_id").notNull().references(() => users.id, { onDelete: "cascade" }),
  purpose: text("purpose", { enum: ["invitation", "password-reset"] }).notNull(),
  tokenHash: text("token_hash").notNull().unique(),
  expiresAt: integer("expires_at", { mode: "timestamp_ms" }).notNull(),
  usedAt: integer("used_at", { mode: "timestamp_ms" }),
  createdAt: createdAt(),
});

/** Failed sign-ins keyed by the e-mail typed, so unknown addresses are throttled alike. */
export const signInFailures = sqliteTable(
  "sign_in_failures",
  {
    id: integer("id").primaryKey({ autoIncrement: true }),
    email: text("email").notNull(),
    at: integer("at", { mode: "timestamp_ms" }).notNull(),
  },
  (t) => [index("sign_in_failures_email_at").on(t.email, t.at)],
);

export const projects = sqliteTable("projects", {
  id: integer("id").primaryKey({ autoIncrement: true }),
  name: text("name").notNull(),
  description: text("description").notNull().default(""),
  units: text("units", { enum: ["m", "ft", "usft"] }).notNull().default("m"),
  // EPSG code of the working CRS, e.g. "EPSG:32617"; null until the first layer fixes it.
  crs: text("crs"),
  scaleFactor: real("scale_factor"),
  // The project's take and cost rules (partial TakeRules); missing keys fall back to the defaults.
  takeRules: text("take_rules", { mode: "json" }).$type<Record<string, number>>(),
  createdBy: integer("created_by").references(() => users.id),
  createdAt: createdAt(),
});

export const projectMembers = sqliteTable(
  "project_members",
  {
    projectId: integer("project_id").notNull().references(() => projects.id, { onDelete: "cascade" }),
    userId: integer("user_id").notNull().references(() => users.id, { onDelete: "cascade" }),
    role: text("role", { enum: ROLES }).$type<Role>().notNull(),
  },
  (t) => [primaryKey({ columns: [t.projectId, t.userId] })],
);

export const auditEvents = sqliteTable(
  "audit_events",
  {
    id: integer("id").primaryKey({ autoIncrement: true }),
    at: createdAt(),
    actorId: integer("actor_id").references(() => users.id),
    projectId: integer("project_id").references(() => projects.id, { onDelete: "cascade" }),
    action: text("action").notNull(),
    subject: text("subject").notNull().default(""),
    details: text("details", { mode: "json" }).$type<Record<string, unknown>>(),
  },
  (t) => [index("audit_events_project").on(t.projectId, t.at)],
);

export const mailOutbox = sqliteTable(
  "mail_outbox",
  {
    id: integer("id").primaryKey({ autoIncrement: true }),
    to: text("to").notNull(),
    subject: text("subject").notNull(),
    text: text("text").notNull(),
    html: text("html"),
    attachments: text("attachments", { mode: "json" }).$type<MailAttachment[]>(),
    status: text("status", { enum: ["pending", "sending", "sent"] }).notNull().default("pending"),
    attempts: integer("attempts").notNull().default(0),
    nextAttemptAt: integer("next_attempt_at", { mode: "timestamp_ms" }).notNull(),
    lastError: text("last_error"),
    createdAt: createdAt(),
    sentAt: integer("sent_at", { mode: "timestamp_ms" }),
  },
  (t) => [index("mail_outbox_due").on(t.status, t.nextAttemptAt)],
);

export type MailAttachment = { filename: string; contentType: string; content: string };


/** Bounds [west, south, east, north] in WGS84 degrees. */
export type BboxWgs84 = [number, number, number, number];

/**
 * One uploaded parcel or building layer. Layers are never edited: a new upload
 * replaces the old one (status `replaced`, kept for history and audit).
 */
export const layers = sqliteTable(
  "layers",
  {
    id: integer("id").primaryKey({ autoIncrement: true }),
    projectId: integer("project_id").notNull().references(() => projects.id, { onDelete: "cascade" }),
    kind: text("kind", { enum: ["parcels", "buildings"] }).notNull(),
    name: text("name").notNull(),
    sourceFileName: text("source_file_name").notNull(),
    format: text("format").notNull(),
    // "EPSG:nnnn" when identified, else the CRS's own name from the file.
    sourceCrs: text("source_crs").notNull(),
    fieldMapping: text("field_mapping", { mode: "json" }).$type<Record<string, string | null>>().notNull(),
    featureCount: integer("feature_count").notNull(),
    bbox: text("bbox", { mode: "json" }).$type<BboxWgs84>().notNull(),
    status: text("status", { enum: ["active", "replaced"] }).notNull().default("active"),
    replacedByLayerId: integer("replaced_by_layer_id"),
    createdBy: integer("created_by").references(() => users.id),
    createdAt: createdAt(),
    replacedAt: integer("replaced_at", { mode: "timestamp_ms" }),
  },
  (t) => [index("layers_project").on(t.projectId, t.kind, t.status)],
);

// Geometry columns hold GeoJSON geometry text; min/max are its bounds in the project's working CRS,
// mirrored into an R*Tree (custom migration) by triggers.
export const parcels = sqliteTable(
  "parcels",
  {
    id: integer("id").primaryKey({ autoIncrement: true }),
    layerId: integer("layer_id").notNull().references(() => layers.id, { onDelete: "cascade" }),
    parcelId: text("parcel_id").notNull(),
    owner: text("owner"),
    address: text("address"),
    landUse: text("land_use"),
    landValue: real("land_value"),
    landValueBasis: text("land_value_basis", { enum: ["total", "perArea"] }).notNull().default("total"),
    attributes: text("attributes", { mode: "json" }).$type<Record<string, unknown>>().notNull(),
    geometry: text("geometry").notNull(),
    geometryWgs84: text("geometry_wgs84").notNull(),
    // Planar area in the working CRS, in the project's units squared.
    area: real("area").notNull(),
    minX: real("min_x").notNull(),
    minY: real("min_y").notNull(),
    maxX: real("max_x").notNull(),
    maxY: real("max_y").notNull(),
  },
  (t) => [uniqueIndex("parcels_layer_parcel_id").on(t.layerId, t.parcelId)],
);

export const buildings = sqliteTable(
  "buildings",
  {
    id: integer("id").primaryKey({ autoIncrement: true }),
    layerId: integer("layer_id").notNull().references(() => layers.id, { onDelete: "cascade" }),
    // The parcel ID the footprint file names, if any (text, not a row reference: layers are replaced independently).
    parcelId: text("parcel_id"),
    value: real("value"),
    attributes: text("attributes", { mode: "json" }).$type<Record<string, unknown>>().notNull(),
    geometry: text("geometry").notNull(),
    geometryWgs84: text("geometry_wgs84").notNull(),
    area: real("area").notNull(),
    minX: real("min_x").notNull(),
    minY: real("min_y").notNull(),
    maxX: real("max_x").notNull(),
    maxY: real("max_y").notNull(),
  },
  (t) => [index("buildings_layer").on(t.layerId)],
);

/**
 * When a project's land data last changed: take and cost results computed before `changedAt`
 * are stale and must be recomputed (read by the impact calculation when it arrives).
 */
export const fabricChanges = sqliteTable("fabric_changes", {
  projectId: integer("project_id").primaryKey().references(() => projects.id, { onDelete: "cascade" }),
  changedAt: integer("changed_at", { mode: "timestamp_ms" }).notNull(),
  layerId: integer("layer_id").references(() => layers.id, { onDelete: "set null" }),
});

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
