import { readParcelUpload, type FieldMapping, type ParcelUpload, type ProgressSink } from "~/fabric/index.server";
import type { LayerUploadFields } from "~/schemas/layer-schemas";
import type { MultipartUpload } from "./multipart-upload.server";
import { UploadInputError } from "./upload-errors.server";
import { uploadLimits } from "./upload-limits.server";
import { checkZipUpload, isZip } from "./upload-zip-guard.server";

type Choices = Omit<LayerUploadFields, "name"> & { name?: string | undefined };

/**
 * Reads and checks an uploaded layer file for a project, storing nothing: refuses an absent or
 * empty file and unsafe or oversized zips first, then lets the fabric reader do the rest in
 * the project's working CRS (when it has one) with areas in the project's unit.
 */
export async function readLayerUpload(project: { crs: string | null; units: "m" | "ft" | "usft" }, upload: MultipartUpload, choices: Choices, onProgress?: ProgressSink): Promise<ParcelUpload> {
  if (!upload.file) throw new UploadInputError("missing_file", "Attach the layer file as the `file` part of the form.");
  if (upload.file.size === 0) throw new UploadInputError("empty_file", `"${upload.file.fileName}" is empty (0 bytes); export the layer again and upload the new file.`, { fileName: upload.file.fileName });
  const bytes = await upload.readFileBytes();
  if (isZip(bytes)) await checkZipUpload(bytes, uploadLimits().maxUnzippedBytes);
  return readParcelUpload({
    fileName: upload.file.fileName,
    bytes,
    kind: choices.kind,
    areaUnit: project.units,
    ...(choices.sourceCrs ? { sourceCrs: choices.sourceCrs } : {}),
    ...(choices.fields ? { fields: choices.fields as Partial<FieldMapping> } : {}),
    ...(project.crs ? { workingCrs: project.crs } : {}),
    ...(choices.landValueBasis ? { landValueBasis: choices.landValueBasis } : {}),
    ...(onProgress ? { onProgress } : {}),
  });
}
