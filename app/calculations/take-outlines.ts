import type { Geometry } from "geojson";
import type { AlignmentElement } from "~/geometry/alignment-types";
import { buildCorridor } from "~/geometry/corridor-build";
import { corridorOutline, easementOutline } from "~/geometry/corridor-outline";
import { computeDisplayTakes } from "~/geometry/display-takes";
import type { CorridorInput, ParcelTake, TakeParcelInput } from "~/geometry/take-types";

export interface TakeOutlines {
  corridor: Geometry;
  easement: Geometry | null;
  takes: { parcelId: string; classification: ParcelTake["classification"]; geometry: Geometry }[];
}

/**
 * Drawable outlines (working CRS, arcs chorded at 1 cm) of the right-of-way, the easement strips
 * and each parcel's take (as fill pieces: see computeDisplayTakes). Display only: every area
 * reported comes from the exact overlay.
 */
export function computeTakeOutlines(elements: AlignmentElement[], corridor: CorridorInput, takes: ParcelTake[], parcels: TakeParcelInput[]): TakeOutlines {
  const built = buildCorridor(elements, corridor);
  const easement = built.easement ? easementOutline(built) : [];
  const taken = new Map(takes.map((t) => [t.parcelId, t.classification]));
  const polygons = computeDisplayTakes(built, parcels.filter((p) => taken.has(p.parcelId) && p.parcelId));
  return {
    corridor: { type: "Polygon", coordinates: corridorOutline(built) },
    easement: easement.length ? { type: "MultiPolygon", coordinates: easement } : null,
    takes: polygons.map((p) => ({ parcelId: p.parcelId, classification: taken.get(p.parcelId)!, geometry: { type: "MultiPolygon", coordinates: p.coordinates } })),
  };
}
