import { createInflateRaw } from "node:zlib";
import { UploadInputError } from "./upload-errors.server";
import { readZipDirectory, type ZipDirectoryEntry } from "./upload-zip-directory.server";

const LOCAL_SIG = 0x04034b50; // PKWARE APPNOTE.TXT 4.3.7
const ZIP_MAGIC = [0x50, 0x4b, 0x03, 0x04];

export const isZip = (bytes: Uint8Array) => ZIP_MAGIC.every((b, i) => bytes[i] === b);

/** Entry names that would leave the extraction folder (the "zip slip" pattern) or are absolute. */
function unsafeName(name: string): string | null {
  const path = name.replace(/\\/g, "/");
  if (path.startsWith("/") || /^[A-Za-z]:/.test(path)) return "is an absolute path";
  if (path.split("/").includes("..")) return "climbs out of the archive with ../";
  return null;
}

const tooBig = (limit: number) =>
  new UploadInputError("zip_too_large_unzipped", `The zip unpacks to more than ${Math.round(limit / 2 ** 20)} MB; that is far more than a parcel layer needs, so it was not opened.`, { maxUnzippedBytes: limit });

/**
 * Inflates one entry only to count its bytes, stopping as soon as the running total passes the
 * limit: a zip's declared sizes can lie, so the real output is measured, never kept.
 */
function countInflated(data: Uint8Array, budget: number): Promise<number> {
  return new Promise((resolve, reject) => {
    const inflate = createInflateRaw();
    let total = 0;
    inflate.on("data", (chunk: Buffer) => {
      total += chunk.length;
      if (total > budget) {
        inflate.destroy();
        resolve(total);
      }
    });
    inflate.on("end", () => resolve(total));
    inflate.on("error", () => reject(new UploadInputError("corrupt_file", "The zip archive is damaged: an entry does not inflate.", {})));
    inflate.end(data);
  });
}

function entryData(bytes: Uint8Array, e: ZipDirectoryEntry): Uint8Array {
  const view = new DataView(bytes.buffer, bytes.byteOffset, bytes.byteLength);
  const at = e.localHeaderOffset;
  if (at + 30 > bytes.byteLength || view.getUint32(at, true) !== LOCAL_SIG) {
    throw new UploadInputError("corrupt_file", `The zip archive is damaged: the entry "${e.name}" is missing.`, {});
  }
  const start = at + 30 + view.getUint16(at + 26, true) + view.getUint16(at + 28, true);
  if (start + e.compressedSize > bytes.byteLength) throw new UploadInputError("corrupt_file", `The zip archive is damaged: "${e.name}" is cut short.`, {});
  return bytes.subarray(start, start + e.compressedSize);
}

/** Every .shp needs its .dbf beside it (ESRI Shapefile Technical Description, 1998, p. 2: main file, index file and dBASE table). */
function checkShapefileParts(files: ZipDirectoryEntry[]): void {
  const names = files.map((f) => f.name).filter((n) => !n.includes("__MACOSX"));
  const lower = new Set(names.map((n) => n.toLowerCase()));
  for (const shp of names.filter((n) => n.toLowerCase().endsWith(".shp"))) {
    const dbf = shp.slice(0, -4).toLowerCase() + ".dbf";
    if (!lower.has(dbf)) {
      throw new UploadInputError("missing_dbf", `The zip has ${shp} but no ${shp.slice(0, -4)}.dbf; zip the .shp with its .dbf (attributes), .shx and .prj.`, { files: names });
    }
  }
}

/**
 * Checks a zip before the fabric reader unpacks it in memory: entry names stay inside the
 * archive, the total unpacked size (declared and real) stays under `maxUnzippedBytes`, only
 * stored and deflated entries (APPNOTE 4.4.5 methods 0 and 8), and every .shp has a .dbf.
 */
export async function checkZipUpload(bytes: Uint8Array, maxUnzippedBytes: number): Promise<void> {
  const entries = readZipDirectory(bytes);
  for (const e of entries) {
    const why = unsafeName(e.name);
    if (why) throw new UploadInputError("unsafe_zip_entry", `The zip entry "${e.name}" ${why}; zip the files without folders above them.`, { entry: e.name });
  }
  const files = entries.filter((e) => !e.name.endsWith("/"));
  if (files.reduce((sum, e) => sum + e.uncompressedSize, 0) > maxUnzippedBytes) throw tooBig(maxUnzippedBytes);
  let total = 0;
  for (const e of files) {
    if (e.method !== 0 && e.method !== 8) {
      throw new UploadInputError("corrupt_file", `The zip entry "${e.name}" uses compression method ${e.method}; re-zip it with ordinary deflate.`, { entry: e.name, method: e.method });
    }
    const data = entryData(bytes, e);
    total += e.method === 0 ? data.byteLength : await countInflated(data, maxUnzippedBytes - total);
    if (total > maxUnzippedBytes) throw tooBig(maxUnzippedBytes);
  }
  checkShapefileParts(files);
}
