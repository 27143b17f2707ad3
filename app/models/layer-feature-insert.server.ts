import type Database from "better-sqlite3";
import { getTableColumns } from "drizzle-orm";
import type { Position } from "geojson";
import { buildings, parcels } from "~/db/schema";
import type { AreaGeometry, UploadedFeature } from "~/fabric/index.server";
import type { Db } from "~/utils/db.server";
import type { LayerKind } from "./layers.server";

/**
 * Rows per INSERT statement. SQLite sets up the R*Tree trigger's work once per statement, so
 * 500 rows per statement stored 200,000 parcels about 4× faster than one row per statement;
 * 16 columns × 500 rows stays under SQLite's 32,766 bound-parameter limit.
 */
const BATCH = 500;

/** Bounds [minX, minY, maxX, maxY] of a polygon or multipolygon. */
export function boundsOf(geometry: AreaGeometry): [number, number, number, number] {
  let minX = Infinity, minY = Infinity, maxX = -Infinity, maxY = -Infinity;
  const rings: Position[][] = geometry.type === "Polygon" ? geometry.coordinates : geometry.coordinates.flat();
  for (const ring of rings) {
    for (const p of ring) {
      const x = p[0]!, y = p[1]!;
      if (x < minX) minX = x;
      if (x > maxX) maxX = x;
      if (y < minY) minY = y;
      if (y > maxY) maxY = y;
    }
  }
  return [minX, minY, maxX, maxY];
}

type Value = string | number | null;
const SHARED = ["layerId", "attributes", "geometry", "geometryWgs84", "area", "minX", "minY", "maxX", "maxY"] as const;
const COLUMNS = { parcels: [...SHARED, "parcelId", "owner", "address", "landUse", "landValue", "landValueBasis"], buildings: [...SHARED, "parcelId", "value"] } as const;

/** Pushes one feature's column values in COLUMNS order (JSON columns as text, as Drizzle stores them). */
function pushRow(out: Value[], layerId: number, kind: LayerKind, f: UploadedFeature): void {
  const [minX, minY, maxX, maxY] = boundsOf(f.geometry);
  out.push(layerId, JSON.stringify(f.attributes), JSON.stringify(f.geometry), JSON.stringify(f.geometryWgs84), f.area, minX, minY, maxX, maxY);
  // applyFieldMapping guarantees a unique, non-empty parcel ID for every parcel.
  if (kind === "parcels") out.push(f.parcelId!, f.owner, f.address, f.landUse, f.landValue, f.landValueBasis);
  else out.push(f.parcelId, f.landValue);
}

/**
 * The better-sqlite3 connection under a Drizzle database or transaction. Drizzle does not
 * publish it on transactions, so this reads its session and fails loudly if that changes.
 */
function clientOf(t: Db): Database.Database {
  const client = (t as unknown as { session?: { client?: Database.Database } }).session?.client;
  if (!client || typeof client.prepare !== "function") throw new Error("layer ingest needs Drizzle's better-sqlite3 session");
  return client;
}

function insertSql(kind: LayerKind, rows: number): string {
  const table = kind === "parcels" ? parcels : buildings;
  const all = getTableColumns(table) as Record<string, { name: string }>;
  const names = COLUMNS[kind].map((c) => `"${all[c]!.name}"`);
  const tuple = `(${names.map(() => "?").join(",")})`;
  return `INSERT INTO "${kind}" (${names.join(",")}) VALUES ${Array(rows).fill(tuple).join(",")}`;
}

/**
 * Inserts a layer's features inside the caller's transaction, BATCH rows per prepared
 * statement (R*Tree rows follow by trigger). Building each batch through Drizzle's query
 * builder cost more than SQLite's own work on a 200,000-parcel layer.
 */
export function insertLayerFeatures(t: Db, layerId: number, kind: LayerKind, features: UploadedFeature[]): void {
  const client = clientOf(t);
  const full = features.length >= BATCH ? client.prepare(insertSql(kind, BATCH)) : null;
  for (let start = 0; start < features.length; start += BATCH) {
    const end = Math.min(start + BATCH, features.length);
    const values: Value[] = [];
    for (let i = start; i < end; i++) pushRow(values, layerId, kind, features[i]!);
    (end - start === BATCH ? full! : client.prepare(insertSql(kind, end - start))).run(values);
  }
}
