import { and, asc, desc, eq } from "drizzle-orm";
import { layers, projectMembers, projects, type LayerWarning } from "~/db/schema";
import type { ParcelUpload } from "~/fabric/index.server";
import { db, type Db } from "~/utils/db.server";
import type { Role } from "~/utils/roles";

export type Layer = typeof layers.$inferSelect;
export type LayerKind = Layer["kind"];

/** A layer with the project it belongs to, if the user may see that project (member, or admin). */
export function findLayerForUser(layerId: number, user: { id: number; role: Role }, tx: Db = db()) {
  if (user.role === "admin") {
    return tx.select({ layer: layers, project: projects }).from(layers).innerJoin(projects, eq(projects.id, layers.projectId)).where(eq(layers.id, layerId)).get();
  }
  return tx
    .select({ layer: layers, project: projects })
    .from(layers)
    .innerJoin(projects, eq(projects.id, layers.projectId))
    .innerJoin(projectMembers, and(eq(projectMembers.projectId, projects.id), eq(projectMembers.userId, user.id)))
    .where(eq(layers.id, layerId))
    .get();
}

/** A project's layers, active ones first, newest first within each status. */
export function listProjectLayers(projectId: number, tx: Db = db()): Layer[] {
  return tx.select().from(layers).where(eq(layers.projectId, projectId)).orderBy(asc(layers.status), desc(layers.id)).all();
}

/** The active layer of a kind a new upload may replace, or undefined. */
export function findReplaceableLayer(projectId: number, layerId: number, tx: Db = db()): Layer | undefined {
  return tx.select().from(layers).where(and(eq(layers.id, layerId), eq(layers.projectId, projectId), eq(layers.status, "active"))).get();
}

const areaLabel = (unit: ParcelUpload["areaUnit"]) => (unit === "m" ? "m²" : unit === "ft" ? "ft²" : "US ft²");

/**
 * What the upload checks found about a layer that was still loaded, kept with it: file notes first,
 * then each listed overlap (largest first, as the check lists them), then each repaired row.
 */
export function layerWarningsOf(upload: Pick<ParcelUpload, "warnings" | "overlaps" | "repaired" | "features" | "areaUnit">): LayerWarning[] {
  const idOfRow = new Map(upload.features.map((f) => [f.sourceRow, f.parcelId]));
  const unit = areaLabel(upload.areaUnit);
  return [
    ...upload.warnings.map((reason): LayerWarning => ({ kind: "file", rows: [], parcelIds: [], reason })),
    ...upload.overlaps.map((o): LayerWarning => ({ kind: "overlap", rows: [...o.rows], parcelIds: [...o.parcelIds], area: o.area, reason: `the two parcels overlap by ${o.area.toFixed(2)} ${unit}` })),
    ...upload.repaired.map((r): LayerWarning => ({ kind: "repair", rows: [r.row], parcelIds: [idOfRow.get(r.row) ?? null], reason: r.repairs.join("; ") })),
  ];
}

/** The layer as the API shows it. */
export function toLayerJson(layer: Layer) {
  return {
    id: layer.id,
    projectId: layer.projectId,
    kind: layer.kind,
    name: layer.name,
    sourceFileName: layer.sourceFileName,
    format: layer.format,
    sourceCrs: layer.sourceCrs,
    fieldMapping: layer.fieldMapping,
    featureCount: layer.featureCount,
    bbox: layer.bbox,
    status: layer.status,
    replacedByLayerId: layer.replacedByLayerId,
    createdBy: layer.createdBy,
    createdAt: layer.createdAt.toISOString(),
    replacedAt: layer.replacedAt?.toISOString() ?? null,
    // null: stored before warnings were kept with the layer (nothing known), not "none".
    warnings: layer.warnings ?? null,
    warningCount: layer.warnings?.length ?? null,
  };
}
