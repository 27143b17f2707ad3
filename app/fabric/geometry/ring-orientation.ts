import type { Position } from "geojson";
import type { AreaGeometry } from "../types";

/**
 * Twice the signed area of a closed ring by the shoelace formula, in the
 * coordinates' unit². Positive when counter-clockwise (y up). Coordinates are
 * shifted to the first vertex first: with projected values near 10^6 the
 * plain formula loses about 7 significant digits to cancellation.
 */
export function signedDoubleArea(ring: Position[]): number {
  const first = ring[0];
  if (!first || ring.length < 4) return 0;
  const x0 = first[0]!;
  const y0 = first[1]!;
  let sum = 0;
  for (let i = 1; i < ring.length - 2; i++) {
    const a = ring[i]!;
    const b = ring[i + 1]!;
    sum += (a[0]! - x0) * (b[1]! - y0) - (b[0]! - x0) * (a[1]! - y0);
  }
  return sum;
}

function orient(ring: Position[], counterClockwise: boolean): Position[] {
  const ccw = signedDoubleArea(ring) > 0;
  return ccw === counterClockwise ? ring : [...ring].reverse();
}

function orientPolygon(rings: Position[][]): Position[][] {
  return rings.map((ring, i) => orient(ring, i === 0));
}

/**
 * Returns the geometry with RFC 7946 §3.1.6 winding: exterior rings
 * counter-clockwise, holes clockwise. Vertices themselves are not changed.
 */
export function normalizeOrientation<G extends AreaGeometry>(geometry: G): G {
  if (geometry.type === "Polygon") {
    return { ...geometry, coordinates: orientPolygon(geometry.coordinates) };
  }
  return { ...geometry, coordinates: geometry.coordinates.map(orientPolygon) };
}
