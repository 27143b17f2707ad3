import type { PolygonCoords } from "../../geometry/take-types";

/** Shape types (ESRI Shapefile Technical Description, July 1998, Table 1). */
const NULL_SHAPE = 0;
const POLYGON = 5;

type Ring = number[][];

function signedArea(ring: Ring): number {
  const [x0, y0] = ring[0]!;
  let s = 0;
  for (let i = 1; i < ring.length - 1; i++) {
    const a = ring[i]!;
    const b = ring[i + 1]!;
    s += (a[0]! - x0!) * (b[1]! - y0!) - (b[0]! - x0!) * (a[1]! - y0!);
  }
  return s / 2;
}

/**
 * The rings of a MultiPolygon as Shapefile parts: "the neighborhood to the right of an observer
 * walking along the ring in vertex order is the neighborhood inside the polygon" — exterior
 * rings clockwise, holes counter-clockwise (ESRI Shapefile Technical Description, 1998, Polygon).
 */
export function shapefileRings(polygons: readonly PolygonCoords[]): Ring[] {
  return polygons.flatMap((rings) =>
    rings.map((ring, i) => {
      const clockwise = signedArea(ring) < 0;
      return clockwise === (i === 0) ? ring : [...ring].reverse();
    }),
  );
}

interface Box {
  xmin: number;
  ymin: number;
  xmax: number;
  ymax: number;
}

function boxOf(rings: Ring[]): Box {
  const b = { xmin: Infinity, ymin: Infinity, xmax: -Infinity, ymax: -Infinity };
  for (const r of rings) {
    for (const p of r) {
      b.xmin = Math.min(b.xmin, p[0]!);
      b.ymin = Math.min(b.ymin, p[1]!);
      b.xmax = Math.max(b.xmax, p[0]!);
      b.ymax = Math.max(b.ymax, p[1]!);
    }
  }
  return b;
}

/** Record content of one shape: a null shape (4 bytes) or a polygon with its box, parts and points. */
function recordContent(rings: Ring[]): Uint8Array {
  if (rings.length === 0) {
    const nul = new Uint8Array(4);
    new DataView(nul.buffer).setInt32(0, NULL_SHAPE, true);
    return nul;
  }
  const points = rings.reduce((n, r) => n + r.length, 0);
  const out = new Uint8Array(44 + 4 * rings.length + 16 * points);
  const v = new DataView(out.buffer);
  const b = boxOf(rings);
  v.setInt32(0, POLYGON, true);
  [b.xmin, b.ymin, b.xmax, b.ymax].forEach((x, i) => v.setFloat64(4 + 8 * i, x, true));
  v.setInt32(36, rings.length, true);
  v.setInt32(40, points, true);
  let first = 0;
  rings.forEach((r, i) => {
    v.setInt32(44 + 4 * i, first, true);
    first += r.length;
  });
  let at = 44 + 4 * rings.length;
  for (const r of rings) {
    for (const p of r) {
      v.setFloat64(at, p[0]!, true);
      v.setFloat64(at + 8, p[1]!, true);
      at += 16;
    }
  }
  return out;
}

/** The 100-byte main file header (file code 9994 and length big-endian, the rest little-endian). */
function header(lengthBytes: number, box: Box | null): Uint8Array {
  const out = new Uint8Array(100);
  const v = new DataView(out.buffer);
  v.setInt32(0, 9994, false);
  v.setInt32(24, lengthBytes / 2, false);
  v.setInt32(28, 1000, true);
  v.setInt32(32, POLYGON, true);
  if (box) [box.xmin, box.ymin, box.xmax, box.ymax].forEach((x, i) => v.setFloat64(36 + 8 * i, x, true));
  return out;
}

/**
 * Writes a polygon Shapefile's `.shp` and `.shx` (ESRI Shapefile Technical Description, July
 * 1998): one record per geometry, a Null Shape for a row without one, rings oriented as the
 * specification requires. Lengths and offsets are in 16-bit words; record numbers start at 1.
 */
export function writeShpShx(geometries: readonly (PolygonCoords[] | null | undefined)[]): { shp: Uint8Array; shx: Uint8Array } {
  const box: Box = { xmin: Infinity, ymin: Infinity, xmax: -Infinity, ymax: -Infinity };
  const contents = geometries.map((g) => {
    const rings = g?.length ? shapefileRings(g) : [];
    if (rings.length) {
      const b = boxOf(rings);
      box.xmin = Math.min(box.xmin, b.xmin);
      box.ymin = Math.min(box.ymin, b.ymin);
      box.xmax = Math.max(box.xmax, b.xmax);
      box.ymax = Math.max(box.ymax, b.ymax);
    }
    return recordContent(rings);
  });
  const shpLength = 100 + contents.reduce((n, c) => n + 8 + c.length, 0);
  const shp = new Uint8Array(shpLength);
  const shx = new Uint8Array(100 + 8 * contents.length);
  const fileBox = box.xmin <= box.xmax ? box : null;
  shp.set(header(shpLength, fileBox), 0);
  shx.set(header(shx.length, fileBox), 0);
  const sv = new DataView(shp.buffer);
  const xv = new DataView(shx.buffer);
  let at = 100;
  contents.forEach((c, i) => {
    xv.setInt32(100 + 8 * i, at / 2, false);
    xv.setInt32(104 + 8 * i, c.length / 2, false);
    sv.setInt32(at, i + 1, false);
    sv.setInt32(at + 4, c.length / 2, false);
    shp.set(c, at + 8);
    at += 8 + c.length;
  });
  return { shp, shx };
}
