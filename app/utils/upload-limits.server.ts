import { z } from "zod";
import { apiError } from "./api-error.server";

const LimitsSchema = z.object({
  // Largest upload body, in MB (1 MB = 2^20 bytes).
  UPLOAD_MAX_MB: z.coerce.number().positive().default(200),
  // Largest total a zip may unpack to, in MB: stops zip bombs before the reader inflates them.
  UPLOAD_MAX_UNZIPPED_MB: z.coerce.number().positive().default(1024),
});

export type UploadLimits = { maxBytes: number; maxUnzippedBytes: number };

let cached: UploadLimits | undefined;

/** Upload limits from the environment, read once. */
export function uploadLimits(): UploadLimits {
  if (!cached) {
    const parsed = LimitsSchema.parse({ UPLOAD_MAX_MB: process.env.UPLOAD_MAX_MB, UPLOAD_MAX_UNZIPPED_MB: process.env.UPLOAD_MAX_UNZIPPED_MB });
    cached = { maxBytes: Math.floor(parsed.UPLOAD_MAX_MB * 2 ** 20), maxUnzippedBytes: Math.floor(parsed.UPLOAD_MAX_UNZIPPED_MB * 2 ** 20) };
  }
  return cached;
}

/**
 * The 413 answer. The rest of the body may still be on the socket, so the connection is closed
 * with the answer rather than read to the end.
 */
export function uploadTooLarge(maxBytes: number): Response {
  const mb = Math.round((maxBytes / 2 ** 20) * 10) / 10;
  return apiError("payload_too_large", `The upload is over the ${mb} MB limit.`, { maxBytes }, { Connection: "close" });
}
