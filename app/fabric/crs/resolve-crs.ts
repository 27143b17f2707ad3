import { FabricInputError } from "../errors";
import type { CrsEntry } from "./crs-entry";
import { findCrsByCode } from "./epsg-list";
import { authorityCode, identifyWkt, parseDefinition } from "./identify-crs";
import { unitFromMetresPerUnit, type LengthUnit } from "./units";

/** A coordinate system ready for reprojection. */
export interface ResolvedCrs {
  /** proj4 definition (a proj4 string, or the WKT itself when no EPSG entry matched). */
  proj4: string;
  /** EPSG code when it could be identified. */
  epsg?: number;
  /** Display name: EPSG name, or the WKT's own name. */
  name: string;
  kind: "projected" | "geographic";
  /** Linear unit of a projected CRS; null when geographic or a unit we do not convert. */
  unit: LengthUnit | null;
  /** Set when the shipped datum shift only approximates the official one. */
  datumNote?: string;
}

function fromEntry(e: CrsEntry): ResolvedCrs {
  const parsed = parseDefinition(e.proj4) as { to_meter?: number } | null;
  const resolved: ResolvedCrs = {
    proj4: e.proj4,
    epsg: e.code,
    name: e.name,
    kind: e.kind,
    unit: e.kind === "projected" ? unitFromMetresPerUnit(parsed?.to_meter ?? 1) : null,
  };
  if (e.datumNote) resolved.datumNote = e.datumNote;
  return resolved;
}

function fromCode(code: number): ResolvedCrs {
  const entry = findCrsByCode(code);
  if (!entry) {
    throw new FabricInputError("unknown_crs", `EPSG:${code} is not in Takeline's coordinate system list; pick another.`, { epsg: code });
  }
  return fromEntry(entry);
}

function fromWkt(wkt: string): ResolvedCrs {
  const code = authorityCode(wkt);
  if (code !== null && findCrsByCode(code)) return fromCode(code);
  const identified = identifyWkt(wkt);
  if (identified) return fromEntry(identified);
  const parsed = parseDefinition(wkt) as { projName?: string; to_meter?: number; title?: string; srsCode?: string } | null;
  if (!parsed) {
    throw new FabricInputError("unknown_crs", "The coordinate system description (.prj/WKT) could not be read; pick the CRS by EPSG code.", {});
  }
  const kind = parsed.projName === "longlat" ? "geographic" : "projected";
  return {
    proj4: wkt,
    name: parsed.srsCode ?? parsed.title ?? "unnamed CRS",
    kind,
    unit: kind === "projected" ? unitFromMetresPerUnit(parsed.to_meter ?? 1) : null,
  };
}

/**
 * Resolves a CRS from an EPSG code (wins when given) or a WKT (.prj, ESRI or
 * OGC flavour, WKT1 or WKT2). The WKT's own EPSG authority is trusted first;
 * without one, the shipped list is searched for an equivalent definition.
 * Throws FabricInputError `unknown_crs` or `missing_crs`.
 */
export function resolveCrs(input: { prjWkt?: string; epsg?: number }): ResolvedCrs {
  if (input.epsg !== undefined) return fromCode(input.epsg);
  if (input.prjWkt?.trim()) return fromWkt(input.prjWkt);
  throw new FabricInputError("missing_crs", "No coordinate system given; pick one (for example EPSG:2229).", {});
}

/** True when a proj4 definition or WKT describes a projected (planar) CRS. */
export function isProjected(def: string): boolean {
  const parsed = parseDefinition(def) as { projName?: string } | null;
  if (!parsed) throw new FabricInputError("unknown_crs", "Unreadable coordinate system definition.", {});
  return parsed.projName !== "longlat";
}
