/** One dBASE field: C = text (UTF-8 bytes, as the .cpg says), N = number with fixed decimals. */
export interface DbfField {
  name: string;
  type: "C" | "N";
  /** Width in bytes: 1–254 for C; for N the total digits, sign and point (≤ 20). */
  length: number;
  decimals: number;
}

export type DbfValue = string | number | null;

const encoder = new TextEncoder();

/** UTF-8 bytes of `text`, cut to at most `max` bytes without splitting a character. */
export function utf8Within(text: string, max: number): Uint8Array {
  const bytes = encoder.encode(text);
  if (bytes.length <= max) return bytes;
  let end = max;
  while (end > 0 && (bytes[end]! & 0xc0) === 0x80) end--;
  return bytes.slice(0, end);
}

/** Text of a numeric field, right-aligned in its width (dBASE N). Throws if it does not fit. */
function numberText(value: number, field: DbfField): string {
  if (!Number.isFinite(value)) throw new Error(`DBF field ${field.name}: ${value} is not a finite number`);
  let text = value.toFixed(field.decimals);
  if (/^-0(\.0*)?$/.test(text)) text = text.slice(1);
  if (text.length > field.length) throw new Error(`DBF field ${field.name}: ${text} is wider than ${field.length} characters`);
  return text.padStart(field.length, " ");
}

/**
 * A dBASE III table (version byte 0x03; header 32 bytes + 32 per field + 0x0D; records start
 * with a space for "not deleted"; file ends with 0x1A). Layout as in the dBASE III file format
 * description and GDAL's Shapefile driver notes (from memory). Text is UTF-8; write a `.cpg`
 * saying so. Field names must be ≤ 10 ASCII characters.
 */
export function writeDbf(fields: readonly DbfField[], rows: readonly DbfValue[][], now = new Date()): Uint8Array {
  const recordLength = 1 + fields.reduce((s, f) => s + f.length, 0);
  const headerLength = 32 + 32 * fields.length + 1;
  const out = new Uint8Array(headerLength + recordLength * rows.length + 1);
  const view = new DataView(out.buffer);
  out[0] = 0x03;
  out.set([now.getUTCFullYear() - 1900, now.getUTCMonth() + 1, now.getUTCDate()], 1);
  view.setUint32(4, rows.length, true);
  view.setUint16(8, headerLength, true);
  view.setUint16(10, recordLength, true);
  fields.forEach((f, i) => {
    if (!/^[A-Za-z_][A-Za-z0-9_]{0,9}$/.test(f.name)) throw new Error(`DBF field name "${f.name}" is not 1–10 ASCII letters, digits or _`);
    const at = 32 + 32 * i;
    out.set(encoder.encode(f.name), at);
    out[at + 11] = f.type.charCodeAt(0);
    out[at + 16] = f.length;
    out[at + 17] = f.decimals;
  });
  out[headerLength - 1] = 0x0d;
  let at = headerLength;
  for (const row of rows) {
    out[at++] = 0x20;
    fields.forEach((f, i) => {
      const v = row[i];
      const bytes = v === null || v === undefined ? new Uint8Array() : f.type === "N" ? encoder.encode(numberText(Number(v), f)) : utf8Within(String(v), f.length);
      out.fill(0x20, at, at + f.length);
      out.set(bytes, at);
      at += f.length;
    });
  }
  out[at] = 0x1a;
  return out;
}
