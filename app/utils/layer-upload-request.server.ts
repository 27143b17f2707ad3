import type { z } from "zod";
import { LayerConflictError } from "~/models/layer-ingest.server";
import { apiError, zodDetails } from "./api-error.server";
import { readMultipartUpload, type MultipartUpload } from "./multipart-upload.server";
import { uploadRefusal } from "./upload-errors.server";
import { uploadLimits } from "./upload-limits.server";

/**
 * Runs `fn` on a streamed multipart layer upload and its validated text fields, then removes
 * the temporary file. Refusals of the file become 422, conflicts 409, an oversized body 413.
 */
export async function withLayerUpload<S extends z.ZodType>(request: Request, schema: S, fn: (upload: MultipartUpload, fields: z.infer<S>) => Promise<Response>): Promise<Response> {
  const upload = await readMultipartUpload(request, uploadLimits().maxBytes);
  try {
    const parsed = schema.safeParse(upload.fields);
    if (!parsed.success) return apiError("unprocessable", "The request has invalid fields.", zodDetails(parsed.error));
    return await fn(upload, parsed.data);
  } catch (error) {
    if (error instanceof LayerConflictError) return apiError("conflict", error.message);
    return uploadRefusal(error);
  } finally {
    await upload.cleanup();
  }
}
