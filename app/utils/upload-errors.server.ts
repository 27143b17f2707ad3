import { isFabricInputError } from "~/fabric/index.server";
import { apiError } from "./api-error.server";

export type UploadErrorCode = "missing_file" | "empty_file" | "corrupt_file" | "unsafe_zip_entry" | "zip_too_large_unzipped" | "missing_dbf";

/** A whole-upload refusal found before the fabric reader runs (422, nothing stored). */
export class UploadInputError extends Error {
  override readonly name = "UploadInputError";
  constructor(
    readonly code: UploadErrorCode,
    message: string,
    readonly details: Record<string, unknown> = {},
  ) {
    super(message);
  }
}

/**
 * Turns a refusal of the file (ours or the fabric reader's) into the 422 envelope, with
 * `details` as the README's `{path, message}` list plus the machine-readable `code`; anything
 * else is rethrown for apiHandler.
 */
export function uploadRefusal(error: unknown): Response {
  if (error instanceof UploadInputError || isFabricInputError(error)) {
    return apiError("unprocessable", error.message, [{ path: "file", message: error.message, code: error.code, info: error.details }]);
  }
  throw error;
}
