/**
 * The WHATWG encoding label for a .cpg file's text: "UTF-8", "ISO-8859-1",
 * "windows-1252" pass through; bare code pages ("1252", "ANSI 1252") become
 * "windows-NNNN". Undefined means UTF-8 (GDAL's default for new files).
 */
export function encodingFromCpg(cpg: string | undefined): string | undefined {
  const text = cpg?.trim();
  if (!text) return undefined;
  const codePage = /^(?:ANSI\s*)?(\d{3,4})$/i.exec(text);
  const label = codePage ? `windows-${codePage[1]}` : text;
  try {
    new TextDecoder(label);
    return label;
  } catch {
    return undefined;
  }
}

/**
 * Code pages named by the dBASE header's language driver ID (byte 29), for
 * files without a .cpg. GDAL writes 0x57 (its default ISO-8859-1); WHATWG
 * decodes ISO-8859-1 as windows-1252, a superset for printable text.
 */
const LDID_ENCODINGS: Record<number, string> = {
  0x03: "windows-1252", 0x57: "windows-1252", 0x58: "windows-1252", 0x59: "windows-1252",
  0x13: "shift_jis", 0x4d: "gbk", 0x4e: "euc-kr", 0x4f: "big5",
  0x64: "ibm866", 0x65: "ibm866", 0xc8: "windows-1250", 0xc9: "windows-1251", 0xca: "windows-1254", 0xcb: "windows-1253",
};

/** The encoding a .dbf's language driver ID names, or undefined (then UTF-8). */
export function encodingFromLdid(dbf: Uint8Array): string | undefined {
  return dbf.byteLength > 29 ? LDID_ENCODINGS[dbf[29]!] : undefined;
}

/**
 * Field names of a dBASE file in their stored order (the descriptors after the
 * 32-byte header, each 32 bytes, ended by 0x0D). Needed because a layer with
 * no rows still has fields to map.
 */
export function readDbfFieldNames(dbf: Uint8Array, encoding?: string): string[] {
  const decoder = new TextDecoder(encoding ?? "utf-8");
  const names: string[] = [];
  for (let offset = 32; offset + 32 <= dbf.byteLength && dbf[offset] !== 0x0d; offset += 32) {
    const raw = dbf.subarray(offset, offset + 11);
    const end = raw.indexOf(0);
    names.push(decoder.decode(end >= 0 ? raw.subarray(0, end) : raw).trim());
  }
  return names;
}

/**
 * 0-based indexes of records flagged deleted ("*" in a record's first byte,
 * dBASE III layout: record count at byte 4, header and record lengths at 8
 * and 10). The shape is still in the .shp, so readers must skip them.
 */
export function deletedDbfRecords(dbf: Uint8Array): Set<number> {
  const deleted = new Set<number>();
  if (dbf.byteLength < 12) return deleted;
  const view = new DataView(dbf.buffer, dbf.byteOffset, dbf.byteLength);
  const count = view.getUint32(4, true);
  const headerLength = view.getUint16(8, true);
  const recordLength = view.getUint16(10, true);
  for (let i = 0; i < count; i++) {
    const at = headerLength + i * recordLength;
    if (at < dbf.byteLength && dbf[at] === 0x2a) deleted.add(i);
  }
  return deleted;
}
