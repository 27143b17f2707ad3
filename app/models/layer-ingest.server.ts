import { eq } from "drizzle-orm";
import type { Position } from "geojson";
import { buildings, fabricChanges, layers, parcels, projects } from "~/db/schema";
import type { AreaGeometry, ParcelUpload, UploadedFeature } from "~/fabric/index.server";
import { db, type Db } from "~/utils/db.server";
import { recordAuditEvent } from "./audit.server";
import { findReplaceableLayer, type Layer, type LayerKind } from "./layers.server";
import type { Project } from "./projects.server";

/** Why a checked upload could not be stored; the route answers 409 and nothing is kept. */
export class LayerConflictError extends Error {
  override readonly name = "LayerConflictError";
}

export interface LayerMeta {
  name: string;
  kind: LayerKind;
  sourceFileName: string;
  replacesLayerId?: number | undefined;
}

/** Rows per INSERT: 16 columns × 500 stays far under SQLite's bound-parameter limit. */
const BATCH = 500;

/** Bounds [minX, minY, maxX, maxY] of a polygon or multipolygon. */
export function boundsOf(geometry: AreaGeometry): [number, number, number, number] {
  const b: [number, number, number, number] = [Infinity, Infinity, -Infinity, -Infinity];
  const rings: Position[][] = geometry.type === "Polygon" ? geometry.coordinates : geometry.coordinates.flat();
  for (const p of rings.flat()) {
    b[0] = Math.min(b[0], p[0]!);
    b[1] = Math.min(b[1], p[1]!);
    b[2] = Math.max(b[2], p[0]!);
    b[3] = Math.max(b[3], p[1]!);
  }
  return b;
}

function shared(f: UploadedFeature) {
  const [minX, minY, maxX, maxY] = boundsOf(f.geometry);
  return { attributes: f.attributes, geometry: JSON.stringify(f.geometry), geometryWgs84: JSON.stringify(f.geometryWgs84), area: f.area, minX, minY, maxX, maxY };
}

function insertFeatures(t: Db, layerId: number, kind: LayerKind, features: UploadedFeature[]): void {
  for (let i = 0; i < features.length; i += BATCH) {
    const batch = features.slice(i, i + BATCH);
    if (kind === "parcels") {
      // applyFieldMapping guarantees a unique, non-empty parcel ID for every parcel.
      t.insert(parcels).values(batch.map((f) => ({ layerId, parcelId: f.parcelId!, owner: f.owner, address: f.address, landUse: f.landUse, landValue: f.landValue, landValueBasis: f.landValueBasis, ...shared(f) }))).run();
    } else {
      t.insert(buildings).values(batch.map((f) => ({ layerId, parcelId: f.parcelId, value: f.landValue, ...shared(f) }))).run();
    }
  }
}

export const crsCode = (crs: { epsg?: number; name: string }) => (crs.epsg === undefined ? crs.name : `EPSG:${crs.epsg}`);

/** The first layer fixes a project's working CRS; later layers must have been read in it. */
function settleWorkingCrs(t: Db, projectId: number, workingCrs: string): void {
  const current = t.select({ crs: projects.crs }).from(projects).where(eq(projects.id, projectId)).get();
  if (!current) throw new LayerConflictError("The project no longer exists.");
  if (current.crs === null) t.update(projects).set({ crs: workingCrs }).where(eq(projects.id, projectId)).run();
  else if (current.crs !== workingCrs) throw new LayerConflictError(`The project's working CRS became ${current.crs} while this file was read in ${workingCrs}; upload it again.`);
}

/**
 * Stores a checked upload as one transaction: the layer row, every feature (R*Tree rows follow
 * by trigger), the working CRS when the project had none, the replaced layer's status, the
 * project's fabric-change time (stale impacts) and the audit event. Any failure stores nothing.
 */
export function ingestLayer(project: Project, user: { id: number }, meta: LayerMeta, upload: ParcelUpload, tx: Db = db()): Layer {
  return tx.transaction((t) => {
    const replaced = meta.replacesLayerId === undefined ? undefined : findReplaceableLayer(project.id, meta.replacesLayerId, t);
    if (meta.replacesLayerId !== undefined && (!replaced || replaced.kind !== meta.kind)) {
      throw new LayerConflictError(`Layer ${meta.replacesLayerId} is not an active ${meta.kind} layer of this project, so it cannot be replaced.`);
    }
    settleWorkingCrs(t, project.id, crsCode(upload.workingCrs));
    const layer = t
      .insert(layers)
      .values({
        projectId: project.id, kind: meta.kind, name: meta.name, sourceFileName: meta.sourceFileName, format: upload.format,
        sourceCrs: crsCode(upload.sourceCrs), fieldMapping: upload.mapping, featureCount: upload.featureCount, bbox: upload.bbox, createdBy: user.id,
      })
      .returning()
      .get();
    insertFeatures(t, layer.id, meta.kind, upload.features);
    const now = new Date();
    if (replaced) t.update(layers).set({ status: "replaced", replacedAt: now, replacedByLayerId: layer.id }).where(eq(layers.id, replaced.id)).run();
    t.insert(fabricChanges).values({ projectId: project.id, changedAt: now, layerId: layer.id })
      .onConflictDoUpdate({ target: fabricChanges.projectId, set: { changedAt: now, layerId: layer.id } }).run();
    recordAuditEvent({ actorId: user.id, projectId: project.id, action: "layer.uploaded", subject: meta.name, details: { layerId: layer.id, kind: meta.kind, featureCount: upload.featureCount, replacedLayerId: replaced?.id ?? null } }, t);
    return layer;
  });
}
