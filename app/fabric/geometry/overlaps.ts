import Flatbush from "flatbush";
import * as polyclip from "polyclip-ts";
import type { Position } from "geojson";
import type { AreaGeometry } from "../types";
import { convexOverlapArea, isConvexRing } from "./convex-clip";
import { polygonArea } from "./area";

/** Two features (by index) whose interiors overlap, and the overlap's area in the CRS's unit². */
export interface OverlapPair { a: number; b: number; area: number }

/** Feature bounds in a spatial index, built once per layer for `overlapsOf`. */
export interface OverlapIndex { geometries: AreaGeometry[]; boxes: Float64Array; tree: Flatbush | null }

export function indexForOverlaps(geometries: AreaGeometry[]): OverlapIndex {
  const boxes = new Float64Array(geometries.length * 4);
  if (geometries.length === 0) return { geometries, boxes, tree: null };
  const tree = new Flatbush(geometries.length);
  geometries.forEach((g, i) => {
    let x0 = Infinity, y0 = Infinity, x1 = -Infinity, y1 = -Infinity;
    for (const ring of g.type === "Polygon" ? g.coordinates : g.coordinates.flat()) {
      for (const p of ring) {
        if (p[0]! < x0) x0 = p[0]!;
        if (p[0]! > x1) x1 = p[0]!;
        if (p[1]! < y0) y0 = p[1]!;
        if (p[1]! > y1) y1 = p[1]!;
      }
    }
    boxes.set([x0, y0, x1, y1], i * 4);
    tree.add(x0, y0, x1, y1);
  });
  tree.finish();
  return { geometries, boxes, tree };
}

/** The lone convex exterior ring of a hole-free polygon, or null when it needs the general clipper. */
function convexRing(g: AreaGeometry): Position[] | null {
  const rings = g.type === "Polygon" ? g.coordinates : g.coordinates.length === 1 ? g.coordinates[0]! : null;
  return rings && rings.length === 1 && isConvexRing(rings[0]!) ? rings[0]! : null;
}

/** Overlap area of two area geometries: convex pairs by Sutherland–Hodgman, the rest by polyclip-ts, near a local origin. */
export function overlapArea(a: AreaGeometry, b: AreaGeometry): number {
  const ca = convexRing(a), cb = convexRing(b);
  if (ca && cb) return convexOverlapArea(ca, cb);
  const first = (a.type === "Polygon" ? a.coordinates[0]![0] : a.coordinates[0]![0]![0])!;
  const shift = (rings: Position[][]) => rings.map((r) => r.map((p) => [p[0]! - first[0]!, p[1]! - first[1]!] as [number, number]));
  const geom = (g: AreaGeometry) => (g.type === "Polygon" ? shift(g.coordinates) : g.coordinates.map(shift));
  const parts = polyclip.intersection(geom(a), geom(b));
  return parts.reduce((s, rings) => s + polygonArea({ type: "Polygon", coordinates: rings }), 0);
}

/**
 * The features after `i` whose interiors overlap feature i by more than `minArea` (CRS unit²).
 * The overlap of two boxes bounds the overlap of what they hold, so pairs whose boxes share
 * no more than `minArea` (neighbours that only touch along a side) are never clipped.
 */
export function overlapsOf(index: OverlapIndex, i: number, minArea: number): OverlapPair[] {
  if (!index.tree) return [];
  const b = index.boxes;
  const [x0, y0, x1, y1] = [b[i * 4]!, b[i * 4 + 1]!, b[i * 4 + 2]!, b[i * 4 + 3]!];
  const found: OverlapPair[] = [];
  for (const j of index.tree.search(x0, y0, x1, y1)) {
    if (j <= i) continue;
    const w = Math.min(x1, b[j * 4 + 2]!) - Math.max(x0, b[j * 4]!);
    const h = Math.min(y1, b[j * 4 + 3]!) - Math.max(y0, b[j * 4 + 1]!);
    if (w <= 0 || h <= 0 || w * h <= minArea) continue;
    const area = overlapArea(index.geometries[i]!, index.geometries[j]!);
    if (area > minArea) found.push({ a: i, b: j, area });
  }
  return found;
}
