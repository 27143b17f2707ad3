import { crc32, deflateRawSync } from "node:zlib";

/** A file to put in a zip archive. Names are stored as UTF-8 (general purpose flag bit 11). */
export interface ZipEntry {
  name: string;
  data: Uint8Array;
}

const encoder = new TextEncoder();

/** MS-DOS time and date fields (APPNOTE.TXT §4.4.6), local time as zip tools expect. */
function dosDateTime(d: Date): { time: number; date: number } {
  return {
    time: (d.getHours() << 11) | (d.getMinutes() << 5) | Math.floor(d.getSeconds() / 2),
    date: ((Math.max(1980, d.getFullYear()) - 1980) << 9) | ((d.getMonth() + 1) << 5) | d.getDate(),
  };
}

interface Packed {
  name: Uint8Array;
  body: Uint8Array;
  method: number;
  crc: number;
  size: number;
  offset: number;
}

function localHeader(p: Packed, when: { time: number; date: number }): Uint8Array {
  const h = new Uint8Array(30 + p.name.length);
  const v = new DataView(h.buffer);
  v.setUint32(0, 0x04034b50, true);
  v.setUint16(4, 20, true);
  v.setUint16(6, 0x0800, true);
  v.setUint16(8, p.method, true);
  v.setUint16(10, when.time, true);
  v.setUint16(12, when.date, true);
  v.setUint32(14, p.crc, true);
  v.setUint32(18, p.body.length, true);
  v.setUint32(22, p.size, true);
  v.setUint16(26, p.name.length, true);
  h.set(p.name, 30);
  return h;
}

function centralHeader(p: Packed, when: { time: number; date: number }): Uint8Array {
  const h = new Uint8Array(46 + p.name.length);
  const v = new DataView(h.buffer);
  v.setUint32(0, 0x02014b50, true);
  v.setUint16(4, 20, true);
  v.setUint16(6, 20, true);
  v.setUint16(8, 0x0800, true);
  v.setUint16(10, p.method, true);
  v.setUint16(12, when.time, true);
  v.setUint16(14, when.date, true);
  v.setUint32(16, p.crc, true);
  v.setUint32(20, p.body.length, true);
  v.setUint32(24, p.size, true);
  v.setUint16(28, p.name.length, true);
  v.setUint32(42, p.offset, true);
  h.set(p.name, 46);
  return h;
}

/**
 * A zip archive of the entries (PKWARE APPNOTE.TXT 6.3: local headers, central directory, end
 * record; no ZIP64, so each file and the whole archive must stay under 4 GiB). Entries are
 * deflated (method 8) unless that does not make them smaller (then stored, method 0).
 */
export function writeZip(entries: readonly ZipEntry[], modified = new Date()): Uint8Array {
  const when = dosDateTime(modified);
  const parts: Uint8Array[] = [];
  const packed: Packed[] = [];
  let offset = 0;
  for (const e of entries) {
    const deflated = deflateRawSync(e.data, { level: 6 });
    const store = deflated.length >= e.data.length;
    const p: Packed = { name: encoder.encode(e.name), body: store ? e.data : deflated, method: store ? 0 : 8, crc: crc32(e.data) >>> 0, size: e.data.length, offset };
    if (p.size > 0xffffffff || offset > 0xffffffff) throw new Error("writeZip: archive too large without ZIP64");
    const local = localHeader(p, when);
    parts.push(local, p.body);
    packed.push(p);
    offset += local.length + p.body.length;
  }
  const central = packed.map((p) => centralHeader(p, when));
  const centralSize = central.reduce((n, c) => n + c.length, 0);
  const end = new Uint8Array(22);
  const v = new DataView(end.buffer);
  v.setUint32(0, 0x06054b50, true);
  v.setUint16(8, packed.length, true);
  v.setUint16(10, packed.length, true);
  v.setUint32(12, centralSize, true);
  v.setUint32(16, offset, true);
  const out = new Uint8Array(offset + centralSize + 22);
  let at = 0;
  for (const part of [...parts, ...central, end]) {
    out.set(part, at);
    at += part.length;
  }
  return out;
}
