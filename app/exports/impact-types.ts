import type { LengthUnit } from "../geometry";
import type { ParcelTake, PolygonCoords } from "../geometry/take-types";

/** One parcel's row: its take as computed, and for the geo exports the take polygon. */
export interface ImpactExportRow extends ParcelTake {
  /**
   * The take polygon as GeoJSON MultiPolygon coordinates (each polygon: exterior ring, then
   * holes), in the CRS named by the export's `geometryCrs`. Null or empty = no geometry.
   */
  geometry?: PolygonCoords[] | null;
}

/** The rows of one alternative. Lengths in `units`, areas in `units` squared, stations internal. */
export interface ImpactExportSheet {
  alternativeName: string;
  units: LengthUnit;
  rows: readonly ImpactExportRow[];
  /** Figures of the take result that are not sums of rows (shown in the XLSX summary when given). */
  corridorArea?: number;
  unparcelledArea?: number;
}

/** Rows that may come one by one (e.g. from a database cursor), for the streamed CSV. */
export type ImpactRowSource = Iterable<ImpactExportRow> | AsyncIterable<ImpactExportRow>;

/** An alternative whose rows are streamed. */
export interface StreamedImpactSheet {
  alternativeName: string;
  units: LengthUnit;
  rows: ImpactRowSource;
}

/** Where the geo exports' coordinates are. `workingEpsg` is the project's projected CRS ("EPSG:nnnn" → nnnn). */
export interface GeoExportOptions {
  workingEpsg: number;
  /** The CRS of each row's `geometry`: the working CRS (default) or WGS 84 longitude/latitude. */
  geometryCrs?: "working" | "wgs84";
}
