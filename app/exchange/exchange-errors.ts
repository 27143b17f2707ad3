/** Why an alignment file (LandXML, PI list CSV) was refused. The API maps every code to HTTP 422. */
export type ExchangeErrorCode =
  | "malformed_xml"
  | "not_landxml"
  | "no_alignment"
  | "unsupported_unit"
  | "unsupported_geometry"
  | "broken_chain"
  | "malformed_csv"
  | "invalid_rows";

/** One refused CSV row: its 1-based line in the file (the header is line 1) and why. */
export interface RowError {
  row: number;
  column?: string;
  message: string;
}

/**
 * A typed, user-facing refusal of an exchange file; nothing is imported. `details` stays plain
 * JSON (row errors, element indexes) so the API can return it as is.
 */
export class ExchangeInputError extends Error {
  override readonly name = "ExchangeInputError";
  constructor(
    readonly code: ExchangeErrorCode,
    message: string,
    readonly details: { rows?: RowError[]; [key: string]: unknown } = {},
  ) {
    super(message);
  }
}
