import type Database from "better-sqlite3";
import { FabricInputError } from "../errors";
import type { ReadOptions } from "../types";

type Db = InstanceType<typeof Database>;

/** A feature table as gpkg_contents and gpkg_geometry_columns describe it. */
export interface GpkgLayer {
  table: string;
  geometryColumn: string;
  geometryType: string;
  srsId: number;
}

/** Geometry type names that can hold polygons (OGC 12-128r18 Annex G; GEOMETRY is "any"). */
const AREA_TYPES = new Set(["POLYGON", "MULTIPOLYGON", "CURVEPOLYGON", "MULTISURFACE", "SURFACE", "GEOMETRY"]);

function listLayers(db: Db): GpkgLayer[] {
  const hasContents = db.prepare("SELECT 1 FROM sqlite_master WHERE type = 'table' AND name = 'gpkg_contents'").get();
  if (!hasContents) throw new FabricInputError("unsupported_format", "The SQLite file is not a GeoPackage (no gpkg_contents table).", {});
  return db.prepare(
    `SELECT c.table_name AS "table", g.column_name AS geometryColumn, upper(g.geometry_type_name) AS geometryType, g.srs_id AS srsId
       FROM gpkg_contents c JOIN gpkg_geometry_columns g ON g.table_name = c.table_name
      WHERE c.data_type = 'features' ORDER BY c.table_name`,
  ).all() as GpkgLayer[];
}

/**
 * The one polygon feature table to read: the named one, else the only one
 * with a polygon geometry type (other layers are ignored with a warning).
 */
export function pickGpkgLayer(db: Db, options: ReadOptions, warnings: string[]): GpkgLayer {
  const layers = listLayers(db);
  const names = layers.map((l) => l.table);
  if (options.layer !== undefined) {
    const named = layers.find((l) => l.table === options.layer);
    if (!named) throw new FabricInputError("no_polygon_layer", `The GeoPackage has no feature table named "${options.layer}".`, { layers: names });
    return named;
  }
  const areas = layers.filter((l) => AREA_TYPES.has(l.geometryType));
  if (areas.length === 0) {
    const kinds = layers.map((l) => `${l.table} (${l.geometryType.toLowerCase()})`);
    throw new FabricInputError("no_polygon_layer", layers.length ? `The GeoPackage has no polygon layer, only: ${kinds.join(", ")}.` : "The GeoPackage has no feature tables.", { layers: names });
  }
  if (areas.length > 1) {
    const areaNames = areas.map((l) => l.table);
    throw new FabricInputError("too_many_layers", `The GeoPackage has ${areas.length} polygon layers (${areaNames.join(", ")}); name the one to read.`, { layers: areaNames });
  }
  const ignored = names.filter((n) => n !== areas[0]!.table);
  if (ignored.length) warnings.push(`Read layer "${areas[0]!.table}"; ignored non-polygon layers: ${ignored.join(", ")}.`);
  return areas[0]!;
}

/** The layer's SRS: EPSG code when the organization is EPSG, WKT when a definition is given. */
export function readGpkgSrs(db: Db, srsId: number): { sourceEpsg?: number; sourceCrsWkt?: string } {
  const row = db.prepare("SELECT organization, organization_coordsys_id AS code, definition FROM gpkg_spatial_ref_sys WHERE srs_id = ?").get(srsId) as
    | { organization: string | null; code: number | null; definition: string | null }
    | undefined;
  // srs_id -1 and 0 are the spec's "undefined Cartesian" and "undefined geographic" systems.
  if (!row || srsId === -1 || srsId === 0) return {};
  const out: { sourceEpsg?: number; sourceCrsWkt?: string } = {};
  if (row.organization?.toUpperCase() === "EPSG" && row.code && row.code > 0) out.sourceEpsg = Number(row.code);
  if (row.definition && row.definition.trim().toLowerCase() !== "undefined") out.sourceCrsWkt = row.definition.trim();
  return out;
}
