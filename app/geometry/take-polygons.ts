import * as polyclip from "polyclip-ts";
import type { AlignmentElement } from "./alignment-types";
import { buildCorridor } from "./corridor-build";
import { piecesRing } from "./corridor-outline";
import { DISPLAY_CHORD_TOLERANCE, TAKE_MIN_AREA } from "./corridor-tolerances";
import { extendBounds } from "./corridor-pieces";
import type { Bounds } from "./corridor-types";
import { indexBounds } from "./take-index";
import { pieceAreas } from "./take-parcel";
import { prepareShape } from "./take-shapes";
import type { CorridorInput, PolygonCoords, TakeParcelInput } from "./take-types";
import { requirePositive } from "./validate";

/** A parcel's take as GeoJSON MultiPolygon coordinates (working CRS). */
export interface TakePolygon {
  parcelId: string;
  coordinates: PolygonCoords[];
}

/**
 * Take polygons (right-of-way ∩ parcel) for display and export: each parcel with an exact take is
 * intersected (polyclip-ts) with the local corridor, arcs chorded at `chordTolerance` (default
 * 1 cm). Areas must come from `computeTakes`; these outlines are within the chord tolerance.
 */
export function computeTakePolygons(input: { elements: AlignmentElement[]; corridor: CorridorInput; parcels: TakeParcelInput[]; chordTolerance?: number }): TakePolygon[] {
  const tol = requirePositive(input.chordTolerance ?? DISPLAY_CHORD_TOLERANCE, "chordTolerance");
  const row = buildCorridor(input.elements, { left: input.corridor.left, right: input.corridor.right, ...(input.corridor.ranges ? { ranges: input.corridor.ranges } : {}) });
  const index = indexBounds(row.pieces.map((p) => p.bounds));
  const out: TakePolygon[] = [];
  input.parcels.forEach((parcel, i) => {
    if (index.search(rawBounds(parcel.polygons)).length === 0) return; // cheap test before preparing the rings
    const shape = prepareShape(parcel.polygons, `parcels.${i}.polygons`);
    const hits = index.search(shape.bounds).sort((a, b) => a - b);
    if (hits.length === 0) return;
    if (!(pieceAreas(shape, hits.map((k) => row.pieces[k]!)).total > TAKE_MIN_AREA)) return;
    const [ox, oy] = [shape.bounds[0], shape.bounds[1]];
    const ring = piecesRing(row.pieces, hits[0]!, hits[hits.length - 1]!, tol).map(([x, y]) => [x - ox, y - oy] as [number, number]);
    const subject = parcel.polygons.map((rings) => rings.map((r) => r.map(([x, y]) => [x! - ox, y! - oy] as [number, number])));
    const clipped = polyclip.intersection(subject, [[...ring, ring[0]!]]);
    out.push({ parcelId: parcel.parcelId, coordinates: clipped.map((poly) => poly.map((r) => r.map(([x, y]) => [x + ox, y + oy]))) });
  });
  return out;
}

function rawBounds(polygons: PolygonCoords[]): Bounds {
  const b: Bounds = [Infinity, Infinity, -Infinity, -Infinity];
  for (const rings of polygons) for (const p of rings[0] ?? []) extendBounds(b, Number(p[0]), Number(p[1]));
  return b;
}
