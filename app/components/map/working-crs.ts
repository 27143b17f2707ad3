import proj4 from "proj4";
import type { Feature, FeatureCollection, Geometry, LineString, MultiPolygon, Polygon, Position } from "geojson";

export type LngLat = [number, number];
export type Xy = [number, number];

/** Converts between the project's working projected CRS and WGS84 longitude/latitude (PROJ's proj4 port). */
export interface WorkingCrs {
  toLngLat(xy: Xy): LngLat;
  toWorking(lngLat: LngLat): Xy;
  geometryToLngLat<G extends Polygon | MultiPolygon | LineString>(g: G): G;
}

/** `definition` is the proj4 string of the working CRS (the server reads it from the shipped EPSG list). */
export function createWorkingCrs(definition: string): WorkingCrs {
  const converter = proj4(definition, "EPSG:4326");
  const toLngLat = (xy: Xy): LngLat => converter.forward([xy[0], xy[1]]) as LngLat;
  const ring = (r: Position[]) => r.map((p) => toLngLat([p[0]!, p[1]!]));
  return {
    toLngLat,
    toWorking: (ll) => converter.inverse([ll[0], ll[1]]) as Xy,
    geometryToLngLat<G extends Polygon | MultiPolygon | LineString>(g: G): G {
      if (g.type === "LineString") return { type: "LineString", coordinates: ring(g.coordinates) } as unknown as G;
      if (g.type === "Polygon") return { type: "Polygon", coordinates: g.coordinates.map(ring) } as unknown as G;
      return { type: "MultiPolygon", coordinates: g.coordinates.map((poly) => poly.map(ring)) } as unknown as G;
    },
  };
}

export const EMPTY_COLLECTION: FeatureCollection = { type: "FeatureCollection", features: [] };

/** A FeatureCollection of the given geometries (already in WGS84) with their properties. */
export function collectionOf(items: { geometry: Geometry | null; properties?: Feature["properties"] }[]): FeatureCollection {
  return {
    type: "FeatureCollection",
    features: items.filter((i) => i.geometry !== null).map((i) => ({ type: "Feature", geometry: i.geometry!, properties: i.properties ?? {} })),
  };
}

/** [west, south, east, north] around WGS84 positions, or undefined for none. */
export function boundsOf(points: LngLat[]): [number, number, number, number] | undefined {
  if (points.length === 0) return undefined;
  const xs = points.map((p) => p[0]);
  const ys = points.map((p) => p[1]);
  return [Math.min(...xs), Math.min(...ys), Math.max(...xs), Math.max(...ys)];
}
