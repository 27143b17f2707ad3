import { index, integer, primaryKey, real, sqliteTable, text, uniqueIndex } from "drizzle-orm/sqlite-core";
import { ROLES, type Role } from "../utils/roles";
import { createdAt } from "./columns";


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
 * A note the upload checks left on a stored layer (issue 4): two parcels that overlap, a row whose
 * geometry was safely repaired, or a note about the file as a whole (rows and parcel IDs empty).
 * `rows` are 1-based source rows; `area` is the overlap in the project's units squared.
 */
export type LayerWarning = { kind: "overlap" | "repair" | "file"; rows: number[]; parcelIds: (string | null)[]; reason: string; area?: number };

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
    // The upload's overlap warnings, repair notes and file notes; null for layers stored before they were kept.
    warnings: text("warnings", { mode: "json" }).$type<LayerWarning[]>(),
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

// Alternatives and their takes, and the decisions and parcel work that follow, live beside this
// file; their tables are exported from here so the app and drizzle-kit read one schema.
export * from "./schema-alternatives";
export * from "./schema-decisions";
