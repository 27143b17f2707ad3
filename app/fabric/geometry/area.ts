import type { Position } from "geojson";
import type { AreaGeometry } from "../types";
import { signedDoubleArea } from "./ring-orientation";

/**
 * Planar area of one closed ring in the CRS's unit² (absolute value of the
 * shoelace sum). Meaningful only in a projected CRS.
 */
export function ringArea(ring: Position[]): number {
  return Math.abs(signedDoubleArea(ring)) / 2;
}

/** Planar area of polygon rings (first exterior, rest holes), holes subtracted, in unit². */
export function polygonRingsArea(rings: Position[][]): number {
  let area = 0;
  rings.forEach((ring, i) => {
    area += i === 0 ? ringArea(ring) : -ringArea(ring);
  });
  return area;
}

/**
 * Planar area of a Polygon or MultiPolygon in the CRS's unit², holes subtracted.
 * Parts of a MultiPolygon are assumed disjoint (as the readers' validation requires).
 */
export function polygonArea(geometry: AreaGeometry): number {
  if (geometry.type === "Polygon") return polygonRingsArea(geometry.coordinates);
  return geometry.coordinates.reduce((sum, rings) => sum + polygonRingsArea(rings), 0);
}
