import type { ParcelUpload } from "~/fabric/index.server";
import type { LayerUploadFields } from "~/schemas/layer-schemas";
import type { MultipartUpload } from "~/utils/multipart-upload.server";
import { readLayerUpload } from "~/utils/read-layer-upload.server";
import { crsCode, ingestLayer } from "./layer-ingest.server";
import { forgetLayerTiles } from "./layer-tiles.server";
import { startUploadJob } from "./layer-upload-progress.server";
import type { Project } from "./projects.server";

function summary(upload: ParcelUpload) {
  return {
    featureCount: upload.featureCount,
    rejected: upload.rejected,
    repaired: upload.repaired,
    overlaps: upload.overlaps,
    overlapCount: upload.overlapCount,
    warnings: upload.warnings,
    sourceCrs: crsCode(upload.sourceCrs),
    sourceCrsName: upload.sourceCrs.name,
    workingCrs: crsCode(upload.workingCrs),
    workingCrsName: upload.workingCrs.name,
    areaUnit: upload.areaUnit,
    bbox: upload.bbox,
  };
}

/**
 * Reads, checks and stores an uploaded layer in one transaction; the answer of the upload route.
 * With a job id, progress is reported for the client to poll (readUploadJob).
 */
export async function commitLayerUpload(project: Project, user: { id: number }, upload: MultipartUpload, fields: LayerUploadFields, jobId?: string) {
  const job = startUploadJob(jobId, user, project.id);
  try {
    const read = await readLayerUpload(project, upload, fields, job.report);
    job.report?.({ stage: "storing", done: 0, total: read.featureCount });
    const layer = ingestLayer(project, user, { name: fields.name, kind: fields.kind, sourceFileName: upload.file!.fileName, replacesLayerId: fields.replacesLayerId }, read);
    job.report?.({ stage: "storing", done: read.featureCount, total: read.featureCount });
    forgetLayerTiles(layer.id);
    if (fields.replacesLayerId !== undefined) forgetLayerTiles(fields.replacesLayerId);
    return { id: layer.id, kind: layer.kind, name: layer.name, status: layer.status, ...summary(read), mapping: read.mapping, replacesLayerId: fields.replacesLayerId ?? null };
  } finally {
    job.finish();
  }
}

/** Reads and checks an upload without storing it: what the mapping screen shows before committing. */
export async function previewLayerUpload(project: Project, user: { id: number }, upload: MultipartUpload, fields: Omit<LayerUploadFields, "name">, jobId?: string) {
  const job = startUploadJob(jobId, user, project.id);
  try {
    const read = await readLayerUpload(project, upload, fields, job.report);
    return { fieldNames: read.fieldNames, sampleRows: read.sampleRows, mapping: read.mapping, format: read.format, ...summary(read) };
  } finally {
    job.finish();
  }
}
