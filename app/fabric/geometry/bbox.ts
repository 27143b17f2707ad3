import type { Position } from "geojson";
import type { AreaGeometry } from "../types";

/** Every vertex of a Polygon/MultiPolygon (closing vertices included). */
export function positionsOf(geometry: AreaGeometry): Position[] {
  return geometry.type === "Polygon" ? geometry.coordinates.flat() : geometry.coordinates.flat(2);
}

/** Bounding box [minX, minY, maxX, maxY] of geometries in their own units; null when there are none. */
export function bboxOf(geometries: AreaGeometry[]): [number, number, number, number] | null {
  let minX = Infinity, minY = Infinity, maxX = -Infinity, maxY = -Infinity;
  for (const g of geometries) {
    const rings = g.type === "Polygon" ? g.coordinates : g.coordinates.flat();
    for (const ring of rings) {
      for (const p of ring) {
        const x = p[0]!, y = p[1]!;
        if (x < minX) minX = x;
        if (x > maxX) maxX = x;
        if (y < minY) minY = y;
        if (y > maxY) maxY = y;
      }
    }
  }
  return minX === Infinity ? null : [minX, minY, maxX, maxY];
}
