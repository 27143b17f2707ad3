/** Why an upload was refused as a whole; the API maps every code to HTTP 422. */
export type FabricErrorCode =
  | "unsupported_format"
  | "corrupt_file"
  | "missing_crs"
  | "unknown_crs"
  | "coordinates_outside_crs"
  | "geographic_working_crs"
  | "no_polygon_layer"
  | "too_many_layers"
  | "empty_layer"
  | "missing_parcel_id_field"
  | "unknown_field"
  | "reprojection_failed";

/**
 * A typed, user-facing refusal of an upload: nothing from the file is stored.
 * `details` is plain JSON data for the UI (layer names, field names, ...).
 */
export class FabricInputError extends Error {
  override readonly name = "FabricInputError";
  constructor(
    readonly code: FabricErrorCode,
    message: string,
    readonly details: Record<string, unknown> = {},
  ) {
    super(message);
  }
}

/** Narrows an unknown catch value to a FabricInputError (optionally of one code). */
export function isFabricInputError(e: unknown, code?: FabricErrorCode): e is FabricInputError {
  return e instanceof FabricInputError && (code === undefined || e.code === code);
}
