import type { FeatureCollection, LineString, MultiPolygon, Polygon } from "geojson";
import { collectionOf, EMPTY_COLLECTION, type WorkingCrs } from "./working-crs";

type Area = Polygon | MultiPolygon;

/** One alternative's drawing in the working CRS, as the API gives it. */
export interface OverlayInput {
  corridor: Area;
  easement: Area | null;
  takes: { parcelId: string; classification: "partial" | "full"; geometry: Area }[];
  centerline?: LineString | null;
}

/** The same in WGS84, ready for MapLibre's GeoJSON sources. */
export interface OverlayData {
  corridor: FeatureCollection;
  easement: FeatureCollection;
  takes: FeatureCollection;
  centreline: FeatureCollection;
}

export const EMPTY_OVERLAY: OverlayData = { corridor: EMPTY_COLLECTION, easement: EMPTY_COLLECTION, takes: EMPTY_COLLECTION, centreline: EMPTY_COLLECTION };

/** Reprojects an alternative's outlines to WGS84; `properties` go on every feature (e.g. its colour). */
export function toOverlayData(input: OverlayInput, crs: WorkingCrs, properties: Record<string, unknown> = {}): OverlayData {
  return {
    corridor: collectionOf([{ geometry: crs.geometryToLngLat(input.corridor), properties }]),
    easement: collectionOf([{ geometry: input.easement ? crs.geometryToLngLat(input.easement) : null, properties }]),
    takes: collectionOf(input.takes.map((t) => ({ geometry: crs.geometryToLngLat(t.geometry), properties: { ...properties, parcelId: t.parcelId, classification: t.classification } }))),
    centreline: collectionOf([{ geometry: input.centerline ? crs.geometryToLngLat(input.centerline) : null, properties }]),
  };
}
