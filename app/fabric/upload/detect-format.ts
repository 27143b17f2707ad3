import { FabricInputError } from "../errors";

export type FabricFormat = "shapefile-zip" | "geojson" | "geopackage";

const startsWith = (bytes: Uint8Array, magic: number[]) => magic.every((b, i) => bytes[i] === b);
const ZIP = [0x50, 0x4b, 0x03, 0x04]; // "PK\3\4", a zip local file header
const SQLITE = [...new TextEncoder().encode("SQLite format 3"), 0];

/** First non-blank byte is "{" (after an optional UTF-8 byte-order mark). */
function looksLikeJson(bytes: Uint8Array): boolean {
  let i = startsWith(bytes, [0xef, 0xbb, 0xbf]) ? 3 : 0;
  while (i < bytes.length && [0x20, 0x09, 0x0a, 0x0d].includes(bytes[i]!)) i++;
  return bytes[i] === 0x7b;
}

/**
 * Tells the upload's format from its leading bytes (zip, SQLite, JSON), so a
 * misnamed file is still read right; the file name only explains refusals.
 * Throws FabricInputError `unsupported_format` for anything else.
 */
export function detectFormat(fileName: string, bytes: Uint8Array): FabricFormat {
  if (startsWith(bytes, ZIP)) return "shapefile-zip";
  if (startsWith(bytes, SQLITE)) return "geopackage";
  if (looksLikeJson(bytes)) return "geojson";
  const ext = /\.([^./\\]+)$/.exec(fileName)?.[1]?.toLowerCase() ?? "";
  const hint = ["shp", "shx", "dbf", "prj"].includes(ext)
    ? " Zip the .shp together with its .shx, .dbf, .prj (and .cpg) files and upload the .zip."
    : " Upload a zipped Shapefile, a GeoJSON file or a GeoPackage.";
  const what = bytes.length === 0 ? "is empty" : ext ? `is a .${ext} file Takeline cannot read` : "is in a format Takeline cannot read";
  throw new FabricInputError("unsupported_format", `"${fileName}" ${what}.${hint}`, { fileName, extension: ext });
}
