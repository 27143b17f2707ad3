import { eq } from "drizzle-orm";
import { fabricChanges, layers, projects } from "~/db/schema";
import type { ParcelUpload } from "~/fabric/index.server";
import { db, type Db } from "~/utils/db.server";
import { recordAuditEvent } from "./audit.server";
import { insertLayerFeatures } from "./layer-feature-insert.server";
export { boundsOf } from "./layer-feature-insert.server";
import { findReplaceableLayer, layerWarningsOf, type Layer, type LayerKind } from "./layers.server";
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

export const crsCode = (crs: { epsg?: number; name: string }) => (crs.epsg === undefined ? crs.name : `EPSG:${crs.epsg}`);

/** The first layer fixes a project's working CRS; later layers must have been read in it. */
function settleWorkingCrs(t: Db, projectId: number, workingCrs: string): void {
  const current = t.select({ crs: projects.crs }).from(projects).where(eq(projects.id, projectId)).get();
  if (!current) throw new LayerConflictError("The project no longer exists.");
  if (current.crs === null) t.update(projects).set({ crs: workingCrs }).where(eq(projects.id, projectId)).run();
  else if (current.crs !== workingCrs) throw new LayerConflictError(`The project's working CRS became ${current.crs} while this file was read in ${workingCrs}; upload it again.`);
}

/**
 * Stores a checked upload as one transaction: the layer row (with the upload's warnings), every
 * feature (R*Tree rows follow by trigger), the working CRS when the project had none, the replaced
 * layer's status, the project's fabric-change time (stale impacts) and the audit event. Any
 * failure stores nothing.
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
        sourceCrs: crsCode(upload.sourceCrs), fieldMapping: upload.mapping, featureCount: upload.featureCount, bbox: upload.bbox, warnings: layerWarningsOf(upload), createdBy: user.id,
      })
      .returning()
      .get();
    insertLayerFeatures(t, layer.id, meta.kind, upload.features);
    const now = new Date();
    if (replaced) t.update(layers).set({ status: "replaced", replacedAt: now, replacedByLayerId: layer.id }).where(eq(layers.id, replaced.id)).run();
    t.insert(fabricChanges).values({ projectId: project.id, changedAt: now, layerId: layer.id })
      .onConflictDoUpdate({ target: fabricChanges.projectId, set: { changedAt: now, layerId: layer.id } }).run();
    recordAuditEvent({ actorId: user.id, projectId: project.id, action: "layer.uploaded", subject: meta.name, details: { layerId: layer.id, kind: meta.kind, featureCount: upload.featureCount, replacedLayerId: replaced?.id ?? null } }, t);
    return layer;
  });
}
