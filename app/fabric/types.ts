import type { Feature, MultiPolygon, Polygon } from "geojson";

/** A parcel or footprint geometry: polygons with holes and multipolygons are kept whole. */
export type AreaGeometry = Polygon | MultiPolygon;

/** Attribute values as a reader found them (strings, numbers, booleans, dates as ISO text). */
export type Properties = Record<string, string | number | boolean | null>;

/**
 * A parcel as read. `sourceRow` (a GeoJSON foreign member) is its 1-based
 * row in the source layer, so later checks can report the row a planner sees.
 */
export type AreaFeature = Feature<AreaGeometry, Properties> & { sourceRow: number };

/** A source row that was left out, with its 1-based position in the layer. */
export interface RejectedRow {
  row: number;
  reason: string;
}

/** A source row kept after safe repairs, with what was done (e.g. "closed 1 unclosed ring"). */
export interface RepairedRow {
  row: number;
  repairs: string[];
}

/**
 * What every reader returns. Coordinates are in the file's own CRS, untouched
 * except for ring orientation (RFC 7946: exterior counter-clockwise, holes clockwise).
 */
export interface ReadResult {
  features: AreaFeature[];
  /** Attribute names in file order. */
  fieldNames: string[];
  /** The CRS the file declares, as WKT (Shapefile .prj, GeoPackage definition). */
  sourceCrsWkt?: string;
  /** The EPSG code the file declares (GeoPackage organization, GeoJSON legacy `crs`). */
  sourceEpsg?: number;
  rejected: RejectedRow[];
  /** Rows kept after safe geometry repairs, with the notes. */
  repaired: RepairedRow[];
  warnings: string[];
}

/** Options every reader accepts. */
export interface ReadOptions {
  /** Which layer to read when the file holds several. */
  layer?: string;
}
