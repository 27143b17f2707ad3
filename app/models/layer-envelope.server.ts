import { and, gte, lte, sql } from "drizzle-orm";
import { buildings, parcels } from "~/db/schema";
import { findCrsByCode, parseEpsgCode, pointConverter } from "~/fabric/index.server";
import type { Layer } from "./layers.server";

export type Bbox = [number, number, number, number];

export const WGS84 = findCrsByCode(4326)!.proj4;

/** The proj4 definition of a project's working CRS, when it is a shipped EPSG code. */
export function workingProj4(project: { crs: string | null }): string | undefined {
  return project.crs ? findCrsByCode(parseEpsgCode(project.crs) ?? 0)?.proj4 : undefined;
}

/**
 * A WGS84 box as a working-CRS envelope: edges are sampled (not just corners) because
 * projected edges of a lon/lat box are curves; the envelope only narrows the R*Tree search,
 * the exact test is then done in WGS84.
 */
export function envelopeInWorking(b: Bbox, working: string): Bbox {
  const out: Bbox = [Infinity, Infinity, -Infinity, -Infinity];
  const toWorking = pointConverter(WGS84, working);
  for (let i = 0; i <= 16; i++) {
    const t = i / 16;
    const lon = b[0] + (b[2] - b[0]) * t;
    const lat = b[1] + (b[3] - b[1]) * t;
    for (const p of [[lon, b[1]], [lon, b[3]], [b[0], lat], [b[2], lat]]) {
      const [x, y] = toWorking(p);
      out[0] = Math.min(out[0], x!); out[1] = Math.min(out[1], y!); out[2] = Math.max(out[2], x!); out[3] = Math.max(out[3], y!);
    }
  }
  // Margin for the curvature between samples: 0.1 % of the span.
  const m = Math.max(out[2] - out[0], out[3] - out[1]) * 1e-3;
  return [out[0] - m, out[1] - m, out[2] + m, out[3] + m];
}

/**
 * Rows of one layer inside a working-CRS box: found through the R*Tree, then checked on the
 * exact bounds. The unary `+` keeps SQLite from scanning the whole layer through its
 * (layer_id, parcel_id) index and testing each row against the R*Tree list (162 ms instead of
 * 1.4 ms for one z16 tile of a 200,000-parcel layer); the R*Tree then drives the search.
 */
export function layerRowsInBox(table: typeof parcels | typeof buildings, layerId: number, b: Bbox) {
  const rtree = table === parcels ? "parcels_rtree" : "buildings_rtree";
  return and(
    sql`+${table.layerId} = ${layerId}`,
    sql`${table.id} IN (SELECT id FROM ${sql.identifier(rtree)} WHERE max_x >= ${b[0]} AND min_x <= ${b[2]} AND max_y >= ${b[1]} AND min_y <= ${b[3]})`,
    gte(table.maxX, b[0]), lte(table.minX, b[2]), gte(table.maxY, b[1]), lte(table.minY, b[3]),
  );
}
