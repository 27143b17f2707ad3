/**
 * EPSG:32617 → WGS 84 lon/lat for the basemap tiles (tiles are always in
 * Web Mercator tile space from lon/lat). Uses proj4, already a dependency.
 */
import proj4 from "proj4";
import type { Xy } from "./warp";

const UTM17N = "+proj=utm +zone=17 +datum=WGS84 +units=m +no_defs";
const converter = proj4(UTM17N, "WGS84");

/** Lon/lat rounded to 1e-7° (about 1 cm), so tiles do not depend on the last floating-point bit. */
export function lonLat(p: Xy): [number, number] {
  const [lon, lat] = converter.forward([p[0], p[1]]);
  return [Math.round(lon! * 1e7) / 1e7, Math.round(lat! * 1e7) / 1e7];
}

export const lonLatPath = (path: Xy[]): [number, number][] => path.map(lonLat);
