import * as polyclip from "polyclip-ts";
import { boundsOverlap, flatRingArea } from "./corridor-pieces";
import type { CorridorPiece } from "./corridor-types";
import { clippedArea, clipRingConvex } from "./take-clip";
import { pieceAreas } from "./take-parcel";
import type { PreparedShape } from "./take-shapes";
import type { RelativeSpan } from "./take-span";

/** Footprint overlaps with the right-of-way and with the proximity band (square units). */
export interface BuildingMeasure {
  hitArea: number;
  nearArea: number;
  /** Stations the hit spans on the right-of-way pieces measured; null when it does not reach it. */
  span: RelativeSpan | null;
}

/** Exact overlaps of a footprint with the right-of-way pieces and the widened (proximity) pieces near it. */
export function measureBuilding(shape: PreparedShape, row: CorridorPiece[], near: CorridorPiece[]): BuildingMeasure {
  const hit = pieceAreas(shape, row);
  return { hitArea: hit.total, nearArea: pieceAreas(shape, near).total, span: hit.span };
}

/**
 * Index (into `candidates`) of the parcel holding most of a footprint, or −1 when none overlaps it.
 * A convex one-ring footprint is used as the clip polygon (Sutherland–Hodgman, exact area); any
 * other footprint is intersected with polyclip-ts.
 */
export function findOwnerParcel(building: PreparedShape, candidates: PreparedShape[]): number {
  let best = -1;
  let bestArea = 0;
  const convex = convexClip(building);
  candidates.forEach((parcel, i) => {
    if (!boundsOverlap(parcel.bounds, building.bounds)) return;
    const a = convex ? convexOverlap(parcel, convex) : generalOverlap(parcel, building);
    if (a > bestArea) {
      bestArea = a;
      best = i;
    }
  });
  return best;
}

/** The footprint's ring relative to its first vertex when it is one convex ring, else null. */
function convexClip(shape: PreparedShape): { ox: number; oy: number; local: number[] } | null {
  const only = shape.polygons.length === 1 ? shape.polygons[0]! : null;
  if (!only || only.rings.length !== 1) return null;
  const ring = only.rings[0]!;
  const n = ring.length;
  for (let i = 0; i < n; i += 2) {
    const ax = ring[(i + 2) % n]! - ring[i]!;
    const ay = ring[(i + 3) % n]! - ring[i + 1]!;
    const bx = ring[(i + 4) % n]! - ring[(i + 2) % n]!;
    const by = ring[(i + 5) % n]! - ring[(i + 3) % n]!;
    if (ax * by - ay * bx < 0) return null;
  }
  const ox = ring[0]!;
  const oy = ring[1]!;
  return { ox, oy, local: ring.map((v, i) => v - (i % 2 === 0 ? ox : oy)) };
}

function convexOverlap(parcel: PreparedShape, clip: { ox: number; oy: number; local: number[] }): number {
  let a = 0;
  for (const p of parcel.polygons) for (const ring of p.rings) a += clippedArea(clipRingConvex(ring, clip.ox, clip.oy, clip.local));
  return a;
}

function generalOverlap(parcel: PreparedShape, building: PreparedShape): number {
  const ox = building.bounds[0];
  const oy = building.bounds[1];
  const geom = (s: PreparedShape) => s.polygons.map((p) => p.rings.map((r) => pairs(r, ox, oy)));
  const out = polyclip.intersection(geom(parcel), geom(building));
  return out.reduce((s, poly) => s + poly.reduce((t, r, i) => t + (i === 0 ? 1 : -1) * Math.abs(flatRingArea(r.flat())), 0), 0);
}

function pairs(flat: number[], ox: number, oy: number): [number, number][] {
  const pts: [number, number][] = [];
  for (let i = 0; i < flat.length; i += 2) pts.push([flat[i]! - ox, flat[i + 1]! - oy]);
  pts.push(pts[0]!);
  return pts;
}
