import proj4, { type Converter } from "proj4";
import type { Position } from "geojson";
import { FabricInputError } from "../errors";
import type { AreaGeometry } from "../types";
import { normalizeOrientation } from "../geometry/ring-orientation";
import { findCrsByCode } from "./epsg-list";

const converters = new Map<string, Converter>();

/** "EPSG:nnnn" for a shipped code becomes its proj4 string; anything else is a definition already. */
function definitionOf(def: string): string {
  const m = /^EPSG:(\d+)$/i.exec(def.trim());
  const entry = m ? findCrsByCode(Number(m[1])) : undefined;
  if (m && !entry) throw new FabricInputError("unknown_crs", `${def} is not in Takeline's coordinate system list.`, { crs: def });
  return entry ? entry.proj4 : def;
}

function converterFor(from: string, to: string): Converter {
  const key = `${from}\u0000${to}`;
  let c = converters.get(key);
  if (!c) {
    c = proj4(definitionOf(from), definitionOf(to));
    converters.set(key, c);
  }
  return c;
}

/** Converts one [x, y] (extra ordinates dropped) and refuses non-finite results. */
function convertPosition(c: Converter, p: Position): Position {
  const out = c.forward([p[0]!, p[1]!]);
  const x = out[0];
  const y = out[1];
  if (x === undefined || y === undefined || !Number.isFinite(x) || !Number.isFinite(y)) {
    throw new FabricInputError(
      "reprojection_failed",
      `Coordinate (${p[0]}, ${p[1]}) cannot be converted between these coordinate systems; check the source CRS.`,
      { position: [p[0], p[1]] },
    );
  }
  return [x, y];
}

/**
 * Reprojects every vertex exactly with proj4 (no densifying, no simplifying)
 * between proj4 definitions, WKTs or shipped "EPSG:nnnn" codes; geographic CRSs are [lon, lat] in
 * degrees, projected ones in their own unit. Winding is re-normalized after,
 * because some projections mirror the plane. Throws FabricInputError
 * `reprojection_failed` for points the projection cannot take.
 */
export function reproject<G extends AreaGeometry>(geometry: G, from: string, to: string): G {
  return geometryConverter(from, to)(geometry);
}

/** `reproject` between two fixed definitions, with the converter looked up once for many geometries. */
export function geometryConverter(from: string, to: string): <G extends AreaGeometry>(geometry: G) => G {
  if (from === to) return (geometry) => geometry;
  const c = converterFor(from, to);
  const ring = (r: Position[]) => r.map((p) => convertPosition(c, p));
  return <G extends AreaGeometry>(geometry: G): G => {
    const out =
      geometry.type === "Polygon"
        ? { ...geometry, coordinates: geometry.coordinates.map(ring) }
        : { ...geometry, coordinates: geometry.coordinates.map((part) => part.map(ring)) };
    return normalizeOrientation(out as G);
  };
}

/** Converts one [x, y] point between proj4 definitions (same rules as reproject). */
export function reprojectPoint(point: Position, from: string, to: string): Position {
  return from === to ? [point[0]!, point[1]!] : convertPosition(converterFor(from, to), point);
}

/**
 * A converter of [x, y] points between two proj4 definitions (same rules as reproject), looked
 * up once: for many points, cheaper than reprojectPoint's per-call lookup by definition text.
 */
export function pointConverter(from: string, to: string): (point: Position) => Position {
  if (from === to) return (p) => [p[0]!, p[1]!];
  const c = converterFor(from, to);
  return (p) => convertPosition(c, p);
}
