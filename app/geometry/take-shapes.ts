import { boundsOf, extendBounds, flatRingArea } from "./corridor-pieces";
import type { Bounds } from "./corridor-types";
import { GeometryInputError } from "./errors";
import type { PolygonCoords } from "./take-types";

/** One polygon as flat rings `[x0, y0, x1, y1, …]` (not closed): exterior counter-clockwise, holes clockwise. */
export interface PreparedPolygon {
  rings: number[][];
  /** Exterior area minus holes, square units. */
  area: number;
  bounds: Bounds;
}

/** A parcel's or building's polygons ready for clipping. */
export interface PreparedShape {
  polygons: PreparedPolygon[];
  area: number;
  bounds: Bounds;
}

/**
 * Reads GeoJSON (Multi)Polygon coordinates: drops the repeated closing point, orients the exterior
 * counter-clockwise and holes clockwise (RFC 7946 §3.1.6 orientation, enforced here rather than
 * trusted), and skips rings with fewer than three points or no area. Throws `invalid_number` for a
 * coordinate that is not a finite number.
 */
export function prepareShape(polygons: PolygonCoords[], field: string): PreparedShape {
  const prepared: PreparedPolygon[] = [];
  polygons.forEach((rings, pi) => {
    const usable = (r: number[]) => r.length >= 6 && flatRingArea(r) !== 0;
    const flat = rings.map((ring, ri) => flattenRing(ring, `${field}.${pi}.${ri}`));
    const exterior = flat[0];
    if (!exterior || !usable(exterior)) return;
    const holes = flat.slice(1).filter(usable);
    orient(exterior, true);
    for (const hole of holes) orient(hole, false);
    const kept = [exterior, ...holes];
    const area = kept.reduce((s, r) => s + flatRingArea(r), 0);
    prepared.push({ rings: kept, area, bounds: flatBounds(exterior) });
  });
  const bounds = prepared.length > 0 ? prepared.map((p) => p.bounds).reduce((a, b) => [Math.min(a[0], b[0]), Math.min(a[1], b[1]), Math.max(a[2], b[2]), Math.max(a[3], b[3])]) : boundsOf([[0, 0]]);
  return { polygons: prepared, area: prepared.reduce((s, p) => s + p.area, 0), bounds: [...bounds] as Bounds };
}

function flattenRing(ring: number[][], field: string): number[] {
  const out: number[] = [];
  ring.forEach((pt, i) => {
    const x = pt[0];
    const y = pt[1];
    if (typeof x !== "number" || typeof y !== "number" || !Number.isFinite(x) || !Number.isFinite(y)) {
      throw new GeometryInputError("invalid_number", `${field}.${i} must be a pair of finite numbers`, { field: `${field}.${i}` });
    }
    const n = out.length;
    if (n >= 2 && out[n - 2] === x && out[n - 1] === y) return;
    out.push(x, y);
  });
  if (out.length >= 4 && out[0] === out[out.length - 2] && out[1] === out[out.length - 1]) out.length -= 2;
  return out;
}

function orient(flat: number[], counterClockwise: boolean): void {
  if (flatRingArea(flat) > 0 === counterClockwise) return;
  const n = flat.length / 2;
  for (let i = 0, j = n - 1; i < j; i++, j--) {
    const x = flat[2 * i]!;
    const y = flat[2 * i + 1]!;
    flat[2 * i] = flat[2 * j]!;
    flat[2 * i + 1] = flat[2 * j + 1]!;
    flat[2 * j] = x;
    flat[2 * j + 1] = y;
  }
}

function flatBounds(flat: number[]): Bounds {
  const b: Bounds = [Infinity, Infinity, -Infinity, -Infinity];
  for (let i = 0; i < flat.length; i += 2) extendBounds(b, flat[i]!, flat[i + 1]!);
  return b;
}
