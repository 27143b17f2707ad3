/**
 * The single error type of the geometry engine. The API layer maps it to HTTP 422 with
 * `{error: {code, message, details}}`, so `details` must stay JSON-serializable.
 */
export type GeometryErrorCode =
  | "invalid_number"
  | "invalid_angle"
  | "invalid_bearing"
  | "invalid_station"
  | "invalid_unit"
  | "out_of_range"
  | "missing_knowns"
  | "inconsistent_knowns"
  | "tangent_overrun"
  | "offset_exceeds_radius"
  | "repeated_point"
  | "zero_deflection"
  | "ambiguous_station"
  | "invalid_alignment";

/** Extra context for an error; `field` names the offending input (dot path for nested data). */
export interface GeometryErrorDetails {
  field?: string;
  piIndex?: number;
  [key: string]: string | number | boolean | string[] | number[] | undefined;
}

/** Bad or unsatisfiable input. Thrown instead of ever returning a wrong number. */
export class GeometryInputError extends Error {
  readonly code: GeometryErrorCode;
  readonly details?: GeometryErrorDetails;

  constructor(code: GeometryErrorCode, message: string, details?: GeometryErrorDetails) {
    super(message);
    this.name = "GeometryInputError";
    this.code = code;
    if (details !== undefined) this.details = details;
  }

  /** Plain object for an API response body. */
  toJSON(): { code: GeometryErrorCode; message: string; details?: GeometryErrorDetails } {
    return this.details === undefined
      ? { code: this.code, message: this.message }
      : { code: this.code, message: this.message, details: this.details };
  }
}
