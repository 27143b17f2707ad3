import type { Position } from "geojson";
import type { AreaGeometry } from "../types";

/** Every vertex of a Polygon/MultiPolygon (closing vertices included). */
export function positionsOf(geometry: AreaGeometry): Position[] {
  return geometry.type === "Polygon" ? geometry.coordinates.flat() : geometry.coordinates.flat(2);
}

/** Bounding box [minX, minY, maxX, maxY] of geometries in their own units; null when there are none. */
export function bboxOf(geometries: AreaGeometry[]): [number, number, number, number] | null {
  let box: [number, number, number, number] | null = null;
  for (const g of geometries) {
    for (const p of positionsOf(g)) {
      const [x, y] = p as [number, number];
      if (!box) box = [x, y, x, y];
      else box = [Math.min(box[0], x), Math.min(box[1], y), Math.max(box[2], x), Math.max(box[3], y)];
    }
  }
  return box;
}
