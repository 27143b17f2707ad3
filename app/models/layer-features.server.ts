import { and, eq, gte, lte, sql } from "drizzle-orm";
import type { FeatureCollection } from "geojson";
import { buildings, parcels } from "~/db/schema";
import { findCrsByCode, parseEpsgCode, reprojectPoint, type AreaGeometry } from "~/fabric/index.server";
import { db, type Db } from "~/utils/db.server";
import { boundsOf } from "./layer-ingest.server";
import type { Layer } from "./layers.server";
import type { Project } from "./projects.server";

type Bbox = [number, number, number, number];
export type FeatureQuery = { crs: "working" | "wgs84"; bbox?: Bbox | undefined };

const WGS84 = findCrsByCode(4326)!.proj4;
const overlaps = (a: Bbox, b: Bbox) => a[0] <= b[2] && a[2] >= b[0] && a[1] <= b[3] && a[3] >= b[1];

/**
 * A WGS84 box as a working-CRS envelope: edges are sampled (not just corners) because
 * projected edges of a lon/lat box are curves; the envelope only narrows the R*Tree search,
 * the exact test is then done in WGS84.
 */
function envelopeInWorking(b: Bbox, workingProj4: string): Bbox {
  const out: Bbox = [Infinity, Infinity, -Infinity, -Infinity];
  for (let i = 0; i <= 16; i++) {
    const t = i / 16;
    const lon = b[0] + (b[2] - b[0]) * t;
    const lat = b[1] + (b[3] - b[1]) * t;
    for (const p of [[lon, b[1]], [lon, b[3]], [b[0], lat], [b[2], lat]]) {
      const [x, y] = reprojectPoint(p, WGS84, workingProj4);
      out[0] = Math.min(out[0], x!); out[1] = Math.min(out[1], y!); out[2] = Math.max(out[2], x!); out[3] = Math.max(out[3], y!);
    }
  }
  // Margin for the curvature between samples: 0.1 % of the span.
  const m = Math.max(out[2] - out[0], out[3] - out[1]) * 1e-3;
  return [out[0] - m, out[1] - m, out[2] + m, out[3] + m];
}

/** Rows of a geometry table inside a working-CRS box, found through its R*Tree then checked on the exact bounds. */
function inBox(table: typeof parcels | typeof buildings, rtree: "parcels_rtree" | "buildings_rtree", b: Bbox) {
  return and(
    sql`${table.id} IN (SELECT id FROM ${sql.identifier(rtree)} WHERE max_x >= ${b[0]} AND min_x <= ${b[2]} AND max_y >= ${b[1]} AND min_y <= ${b[3]})`,
    gte(table.maxX, b[0]), lte(table.minX, b[2]), gte(table.maxY, b[1]), lte(table.minY, b[3]),
  );
}

/**
 * A layer's features as GeoJSON in the working CRS or WGS84, optionally within a bbox given in
 * that CRS. Properties: parcelId, the mapped attributes, the source attributes and the planar
 * area in the project's units squared.
 */
export function listLayerFeatures(layer: Layer, project: Project, query: FeatureQuery, tx: Db = db()): FeatureCollection & Record<string, unknown> {
  const working = project.crs ? findCrsByCode(parseEpsgCode(project.crs) ?? 0) : undefined;
  const box = query.bbox && (query.crs === "working" || !working ? query.bbox : envelopeInWorking(query.bbox, working.proj4));
  const table = layer.kind === "parcels" ? parcels : buildings;
  const where = and(eq(table.layerId, layer.id), box ? inBox(table, layer.kind === "parcels" ? "parcels_rtree" : "buildings_rtree", box) : undefined);
  const rows = layer.kind === "parcels" ? tx.select().from(parcels).where(where).orderBy(parcels.id).all() : tx.select().from(buildings).where(where).orderBy(buildings.id).all();
  const features = rows.flatMap((row) => {
    const { id, geometry, geometryWgs84, layerId: _l, minX: _a, minY: _b, maxX: _c, maxY: _d, ...props } = row;
    const g = JSON.parse(query.crs === "wgs84" ? geometryWgs84 : geometry) as AreaGeometry;
    if (query.crs === "wgs84" && query.bbox && !overlaps(boundsOf(g), query.bbox)) return [];
    return [{ type: "Feature" as const, id, geometry: g, properties: props }];
  });
  return { type: "FeatureCollection", crs: query.crs === "wgs84" ? "EPSG:4326" : project.crs, areaUnit: `${project.units}²`, features };
}
