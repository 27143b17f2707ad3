/**
 * Shapes shared by the demo-world generator: parcels as planned on the design
 * plane, before they are bent onto EPSG:32617 and given owners and values.
 */
import type { Uv } from "./warp";

export type LandUse = "RES" | "COM" | "AGR" | "IND" | "PUB" | "VAC";
export type OwnerKind = "person" | "business" | "farm" | "town" | "county" | "schools";
export type Zone = "core" | "mid" | "outer" | "rural";

/** Inner rectangle of a town lot where buildings may stand (vFront is on the street). */
export interface Plot {
  uL: number;
  uR: number;
  vFront: number;
  vBack: number;
}

/** A rural building site: a point inside the tract and the direction of its road. */
export interface Site {
  centre: Uv;
  angle: number;
}

export interface PlanParcel {
  /** Assessor's book (block or rural sector) and lot within it: APN OC-bbbb-lll. */
  book: number;
  lot: number;
  /** Polygons of rings (outer first, then holes), design plane. More than one: a MultiPolygon. */
  polygons: Uv[][][];
  use: LandUse;
  owner: OwnerKind;
  situs: string;
  zone: Zone;
  plot?: Plot;
  site?: Site;
}

/** Twice the signed area of a ring (positive when counter-clockwise). */
export function signedArea2(ring: Uv[]): number {
  let s = 0;
  for (let i = 0; i + 1 < ring.length; i++) s += ring[i]![0] * ring[i + 1]![1] - ring[i + 1]![0] * ring[i]![1];
  return s;
}

/** Closes a ring and orients it: outer rings counter-clockwise, holes clockwise (RFC 7946). */
export function orient(ring: Uv[], hole = false): Uv[] {
  const closed = [...ring];
  const a = closed[0]!;
  const z = closed[closed.length - 1]!;
  if (a[0] !== z[0] || a[1] !== z[1]) closed.push([a[0], a[1]]);
  const ccw = signedArea2(closed) > 0;
  return ccw !== hole ? closed : closed.reverse();
}

/** Even–odd point-in-ring test (ray casting). */
export function pointInRing([x, y]: Uv, ring: Uv[]): boolean {
  let inside = false;
  for (let i = 0, j = ring.length - 1; i < ring.length; j = i++) {
    const [xi, yi] = ring[i]!;
    const [xj, yj] = ring[j]!;
    if (yi > y !== yj > y && x < ((xj - xi) * (y - yi)) / (yj - yi) + xi) inside = !inside;
  }
  return inside;
}
