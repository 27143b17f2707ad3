import Database from "better-sqlite3";
import { mkdtempSync, rmSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { FabricInputError } from "../errors";
import type { ReadOptions, ReadResult } from "../types";
import { collectFeatures, type RawRow } from "./collect-features";
import { decodeGpkgGeometry } from "./gpkg-geometry.server";
import { pickGpkgLayer, readGpkgSrs, type GpkgLayer } from "./gpkg-catalog.server";

type Db = InstanceType<typeof Database>;

function quoteIdent(name: string): string {
  return `"${name.replace(/"/g, '""')}"`;
}

/** Attribute columns in table order, without the primary key and the geometry column. */
function attributeColumns(db: Db, layer: GpkgLayer): { pk: string | undefined; fields: string[] } {
  const cols = db.prepare(`PRAGMA table_info(${quoteIdent(layer.table)})`).all() as { name: string; pk: number }[];
  const pk = cols.find((c) => c.pk === 1)?.name;
  return { pk, fields: cols.map((c) => c.name).filter((n) => n !== pk && n !== layer.geometryColumn) };
}

/** Reads the layer's rows in primary-key order; blobs other than the geometry are described, not copied. */
function readRows(db: Db, layer: GpkgLayer, fields: string[], pk: string | undefined): RawRow[] {
  const order = pk ? ` ORDER BY ${quoteIdent(pk)}` : "";
  const rows = db.prepare(`SELECT * FROM ${quoteIdent(layer.table)}${order}`).all() as Record<string, unknown>[];
  return rows.map((r) => {
    const decoded = decodeGpkgGeometry((r[layer.geometryColumn] as Uint8Array | null) ?? null);
    const properties: Record<string, unknown> = {};
    for (const f of fields) {
      const v = r[f];
      properties[f] = v instanceof Uint8Array ? `(binary, ${v.byteLength} bytes)` : typeof v === "bigint" ? Number(v) : v;
    }
    if ("error" in decoded) return { geometry: null, properties, problem: decoded.error };
    return { geometry: "empty" in decoded ? null : decoded.geometry, properties };
  });
}

function openReadOnly(path: string): Db {
  try {
    return new Database(path, { readonly: true, fileMustExist: true });
  } catch (e) {
    throw new FabricInputError("corrupt_file", `The GeoPackage could not be opened: ${(e as Error).message}`, {});
  }
}

/**
 * Reads the polygon feature table of an OGC GeoPackage (1.2+) from bytes: the
 * file is written to a private temp folder, opened read-only with
 * better-sqlite3 and removed afterwards. The layer's SRS comes back as
 * `sourceEpsg` (organization EPSG) and/or `sourceCrsWkt` (its definition).
 */
export function readGeoPackage(bytes: Uint8Array, options: ReadOptions = {}): ReadResult {
  const dir = mkdtempSync(join(tmpdir(), "takeline-gpkg-"));
  const path = join(dir, "upload.gpkg");
  let db: Db | undefined;
  try {
    writeFileSync(path, bytes);
    db = openReadOnly(path);
    const warnings: string[] = [];
    const layer = pickGpkgLayer(db, options, warnings);
    const { pk, fields } = attributeColumns(db, layer);
    const rows = readRows(db, layer, fields, pk);
    const collected = collectFeatures(rows);
    const result: ReadResult = { ...collected, fieldNames: fields, warnings: [...warnings, ...collected.warnings] };
    Object.assign(result, readGpkgSrs(db, layer.srsId));
    return result;
  } finally {
    db?.close();
    rmSync(dir, { recursive: true, force: true });
  }
}
