/** One shipped EPSG definition (see `public/crs/epsg.json`). */
export interface CrsEntry {
  /** EPSG code, e.g. 2229. */
  code: number;
  /** EPSG name, e.g. "NAD83 / California zone 5 (ftUS)". */
  name: string;
  kind: "projected" | "geographic";
  /** Axis unit name as EPSG states it ("metre", "US survey foot", "degree"). */
  unit: string;
  /** proj4 definition string. */
  proj4: string;
  /** Area of use in WGS84 degrees: [west, south, east, north]. */
  areaOfUse?: [number, number, number, number];
  /** Set when the datum shift is an approximation of the official one. */
  datumNote?: string;
}
