import type { AreaGeometry, Properties, RejectedRow, RepairedRow } from "../types";
import type { FieldMapping } from "../attributes/field-mapping";
import type { LandValueBasis, MappedAttributes } from "../attributes/apply-mapping";
import type { ResolvedCrs } from "../crs/resolve-crs";
import type { LengthUnit } from "../crs/units";
import type { FabricFormat } from "./detect-format";
import type { ProgressSink } from "./progress";

/** What the upload route hands over: the file and the planner's choices. */
export interface ParcelUploadInput {
  fileName: string;
  bytes: Uint8Array;
  kind: "parcels" | "buildings";
  /** EPSG code like "EPSG:2229"; needed when the file names no CRS, and overrides it otherwise. */
  sourceCrs?: string;
  /** Planner's field choices; unset targets keep the guessed field. */
  fields?: Partial<FieldMapping>;
  /** EPSG code of the projected working CRS; default: WGS 84 UTM zone of the layer's centre. */
  workingCrs?: string;
  /** Layer to read when the file holds several. */
  layer?: string;
  /** Default "total". */
  landValueBasis?: LandValueBasis;
  /** Unit for reported areas (the project's unit); default: the working CRS's unit. */
  areaUnit?: LengthUnit;
  /** Told how far processing is; the work yields to the event loop between chunks so reports can be read. */
  onProgress?: ProgressSink;
}

/** One accepted parcel or footprint. */
export interface UploadedFeature extends MappedAttributes {
  /** 1-based row in the source layer. */
  sourceRow: number;
  /** GeoJSON feature.id when the file had one. */
  id?: string | number;
  /** Geometry in the working CRS, every vertex reprojected exactly. */
  geometry: AreaGeometry;
  /** Geometry in WGS84 lon/lat (RFC 7946), for maps and tiles. */
  geometryWgs84: AreaGeometry;
  /** Planar area in the working CRS, holes subtracted, in `areaUnit`². */
  area: number;
}

/** Two parcels whose interiors overlap, by source row and parcel ID, with the overlap's area in `areaUnit`². */
export interface ParcelOverlap {
  rows: [number, number];
  parcelIds: [string | null, string | null];
  area: number;
}

/** A read, checked upload, ready to store. */
export interface ParcelUpload {
  format: FabricFormat;
  features: UploadedFeature[];
  featureCount: number;
  rejected: RejectedRow[];
  /** Accepted rows whose geometry was safely repaired, with what was done. */
  repaired: RepairedRow[];
  /** Overlapping parcel pairs (largest first, at most MAX_LISTED_OVERLAPS); none for buildings. */
  overlaps: ParcelOverlap[];
  /** How many pairs overlap in all. */
  overlapCount: number;
  warnings: string[];
  sourceCrs: ResolvedCrs;
  workingCrs: ResolvedCrs;
  areaUnit: LengthUnit;
  /** [west, south, east, north] in WGS84 degrees over accepted features. */
  bbox: [number, number, number, number];
  fieldNames: string[];
  /** First 20 attribute rows as read, for the mapping screen. */
  sampleRows: Properties[];
  mapping: FieldMapping;
}
