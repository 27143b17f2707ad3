import { FabricInputError } from "../errors";
import type { AreaFeature, ReadResult } from "../types";
import { parseEpsgCode } from "../crs/epsg-list";
import { resolveCrs, type ResolvedCrs } from "../crs/resolve-crs";
import { utmZoneFor } from "../crs/utm-zone";
import { positionsOf } from "../geometry/bbox";

function codeOf(text: string, what: string): number {
  const code = parseEpsgCode(text);
  if (code === null) throw new FabricInputError("unknown_crs", `${what} "${text}" is not an EPSG code like "EPSG:2229".`, { value: text });
  return code;
}

/** True when every vertex could be WGS84 longitude/latitude. */
function allLonLat(features: AreaFeature[]): boolean {
  return features.every((f) => positionsOf(f.geometry).every((p) => Math.abs(p[0]!) <= 180 && Math.abs(p[1]!) <= 90));
}

function declaredCrs(read: ReadResult, format: string): ResolvedCrs | null {
  if (read.sourceEpsg !== undefined) return resolveCrs({ epsg: read.sourceEpsg });
  if (read.sourceCrsWkt) return resolveCrs({ prjWkt: read.sourceCrsWkt });
  // RFC 7946 §4: GeoJSON without a crs member is WGS84 lon/lat, if the numbers allow it.
  if (format === "geojson" && allLonLat(read.features)) return resolveCrs({ epsg: 4326 });
  return null;
}

/**
 * The source CRS: the one the user picked (`sourceCrs`, it overrides the
 * file, with a warning when they differ), else the file's own. Throws
 * `missing_crs` when there is neither, and `coordinates_outside_crs` when a
 * geographic CRS meets numbers that cannot be degrees.
 */
export function chooseSourceCrs(read: ReadResult, format: string, sourceCrs: string | undefined, warnings: string[]): ResolvedCrs {
  const declared = declaredCrs(read, format);
  const picked = sourceCrs ? resolveCrs({ epsg: codeOf(sourceCrs, "Source CRS") }) : null;
  if (picked && declared && picked.epsg !== declared.epsg) {
    warnings.push(`The file says its coordinates are in ${declared.name}; using ${picked.name} as chosen.`);
  }
  const crs = picked ?? declared;
  if (!crs) {
    throw new FabricInputError("missing_crs", "The file does not say which coordinate system it uses (no .prj or CRS entry). Pick one, for example EPSG:2229.", {});
  }
  if (crs.kind === "geographic" && !allLonLat(read.features)) {
    throw new FabricInputError("coordinates_outside_crs", `The coordinates are not longitude/latitude degrees, so they cannot be in ${crs.name}. Pick the projected CRS they are in.`, { crs: crs.epsg });
  }
  if (crs.datumNote) warnings.push(`${crs.name}: ${crs.datumNote}.`);
  return crs;
}

/**
 * The working CRS for areas and geometry: the one given, else the WGS 84 UTM
 * zone of the layer's centre (middle of its WGS84 bounding box). Must be
 * projected with a metre or foot unit.
 */
export function chooseWorkingCrs(workingCrs: string | undefined, bboxWgs84: [number, number, number, number]): ResolvedCrs {
  const [w, s, e, n] = bboxWgs84;
  const code = workingCrs ? codeOf(workingCrs, "Working CRS") : utmZoneFor((w + e) / 2, (s + n) / 2);
  const crs = resolveCrs({ epsg: code });
  if (crs.kind !== "projected") {
    throw new FabricInputError("geographic_working_crs", `${crs.name} is not projected; areas and offsets need a projected working CRS.`, { crs: code });
  }
  if (!crs.unit) throw new FabricInputError("unknown_crs", `${crs.name} uses a unit Takeline does not convert; pick a metre or foot CRS.`, { crs: code });
  return crs;
}
