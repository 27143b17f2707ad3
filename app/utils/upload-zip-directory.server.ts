import { UploadInputError } from "./upload-errors.server";

/** One central-directory record (PKWARE APPNOTE.TXT 6.3.10, section 4.3.12). */
export interface ZipDirectoryEntry {
  name: string;
  method: number;
  compressedSize: number;
  uncompressedSize: number;
  localHeaderOffset: number;
}

const EOCD_SIG = 0x06054b50; // APPNOTE 4.3.16
const ZIP64_LOCATOR_SIG = 0x07064b50; // APPNOTE 4.3.15
const CENTRAL_SIG = 0x02014b50; // APPNOTE 4.3.12
const MAX_ENTRIES = 10_000;

const corrupt = (why: string) => new UploadInputError("corrupt_file", `The zip archive is damaged: ${why}.`, {});

function findEocd(view: DataView): number {
  // The record is 22 bytes plus a comment of at most 65535 bytes, at the very end.
  const stop = Math.max(0, view.byteLength - 22 - 0xffff);
  for (let i = view.byteLength - 22; i >= stop; i--) if (view.getUint32(i, true) === EOCD_SIG) return i;
  throw corrupt("it has no end-of-central-directory record (it may be cut short or not a zip)");
}

/** Where the central directory starts and how many records it has, following a Zip64 locator if sizes overflow. */
function directoryBounds(view: DataView, eocd: number): { offset: number; count: number } {
  const count = view.getUint16(eocd + 10, true);
  const offset = view.getUint32(eocd + 16, true);
  if (count !== 0xffff && offset !== 0xffffffff) return { offset, count };
  const locator = eocd - 20;
  if (locator < 0 || view.getUint32(locator, true) !== ZIP64_LOCATOR_SIG) throw corrupt("its Zip64 locator is missing");
  const record = Number(view.getBigUint64(locator + 8, true));
  if (record + 56 > view.byteLength) throw corrupt("its Zip64 directory lies outside the file");
  return { count: Number(view.getBigUint64(record + 32, true)), offset: Number(view.getBigUint64(record + 48, true)) };
}

/** Reads Zip64 extended information (APPNOTE 4.5.3) for the fields that overflowed 32 bits. */
function applyZip64Extra(view: DataView, start: number, end: number, entry: ZipDirectoryEntry): void {
  for (let p = start; p + 4 <= end; ) {
    const id = view.getUint16(p, true);
    const size = view.getUint16(p + 2, true);
    if (id === 0x0001) {
      let q = p + 4;
      const next = () => ((q += 8), Number(view.getBigUint64(q - 8, true)));
      if (entry.uncompressedSize === 0xffffffff) entry.uncompressedSize = next();
      if (entry.compressedSize === 0xffffffff) entry.compressedSize = next();
      if (entry.localHeaderOffset === 0xffffffff) entry.localHeaderOffset = next();
      return;
    }
    p += 4 + size;
  }
}

/** Lists a zip's entries from its central directory without inflating anything. */
export function readZipDirectory(bytes: Uint8Array): ZipDirectoryEntry[] {
  const view = new DataView(bytes.buffer, bytes.byteOffset, bytes.byteLength);
  if (bytes.byteLength < 22) throw corrupt("it is too short to be a zip");
  const { offset, count } = directoryBounds(view, findEocd(view));
  if (count > MAX_ENTRIES) throw new UploadInputError("corrupt_file", `The zip holds ${count} files; a Shapefile needs a handful.`, { count });
  const decoder = new TextDecoder();
  const entries: ZipDirectoryEntry[] = [];
  let p = offset;
  for (let i = 0; i < count; i++) {
    if (p + 46 > view.byteLength || view.getUint32(p, true) !== CENTRAL_SIG) throw corrupt("its central directory is unreadable");
    const nameLength = view.getUint16(p + 28, true);
    const extraLength = view.getUint16(p + 30, true);
    const commentLength = view.getUint16(p + 32, true);
    if (p + 46 + nameLength + extraLength > view.byteLength) throw corrupt("its central directory runs past the end of the file");
    const entry: ZipDirectoryEntry = {
      name: decoder.decode(bytes.subarray(p + 46, p + 46 + nameLength)),
      method: view.getUint16(p + 10, true),
      compressedSize: view.getUint32(p + 20, true),
      uncompressedSize: view.getUint32(p + 24, true),
      localHeaderOffset: view.getUint32(p + 42, true),
    };
    applyZip64Extra(view, p + 46 + nameLength, p + 46 + nameLength + extraLength, entry);
    entries.push(entry);
    p += 46 + nameLength + extraLength + commentLength;
  }
  return entries;
}
