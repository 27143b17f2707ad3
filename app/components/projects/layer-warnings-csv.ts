import { csvField } from "~/exports/impact-csv";
import { formatPlainNumber } from "~/exchange/plain-number";

/** A note the upload checks left on a stored layer, as the layers API lists it. */
export interface LayerWarningRow {
  kind: "overlap" | "repair" | "file";
  /** 1-based source rows: two for an overlap, one for a repair, none for a note about the file. */
  rows: number[];
  parcelIds: (string | null)[];
  reason: string;
  /** Overlap area in the project's units squared. */
  area?: number;
}

const HEADER = ["kind", "row", "parcel_id", "other_row", "other_parcel_id", "overlap_area", "reason"];

/**
 * A layer's warnings as CSV text (RFC 4180: header line, CRLF line ends, quoted where needed; text
 * that a spreadsheet would run as a formula gets a leading apostrophe), one line per warning in
 * the stored order. `overlap_area` is in the project's units squared, to 0.0001.
 */
export function writeLayerWarningsCsv(warnings: readonly LayerWarningRow[]): string {
  const lines = [HEADER.join(",")];
  for (const w of warnings) {
    const cells = [
      csvField(w.kind, true),
      w.rows[0] === undefined ? "" : String(w.rows[0]),
      csvField(w.parcelIds[0] ?? "", true),
      w.rows[1] === undefined ? "" : String(w.rows[1]),
      csvField(w.parcelIds[1] ?? "", true),
      w.area === undefined ? "" : formatPlainNumber(w.area, 4),
      csvField(w.reason, true),
    ];
    lines.push(cells.join(","));
  }
  return lines.join("\r\n") + "\r\n";
}

/** Offers text as a file download in the browser (the same way the upload screen offers its row lists). */
export function downloadTextFile(text: string, fileName: string, type = "text/csv"): void {
  const url = URL.createObjectURL(new Blob([text], { type }));
  const a = document.createElement("a");
  a.href = url;
  a.download = fileName;
  document.body.appendChild(a);
  a.click();
  a.remove();
  // Revoked on the next turn: revoking at once can cancel the download in some browsers (common practice).
  setTimeout(() => URL.revokeObjectURL(url), 0);
}
