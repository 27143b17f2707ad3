import { and, asc, eq } from "drizzle-orm";
import type { FeatureCollection } from "geojson";
import { buildings, parcels } from "~/db/schema";
import type { AreaGeometry } from "~/fabric/index.server";
import { db, type Db } from "~/utils/db.server";
import { envelopeInWorking, layerRowsInBox, workingProj4, type Bbox } from "./layer-envelope.server";
import { boundsOf } from "./layer-ingest.server";
import { MAX_SEARCH_HITS, searchCondition, searchOrder } from "./layer-search.server";
import type { Layer } from "./layers.server";
import type { Project } from "./projects.server";

/** `q` searches parcel IDs, owners and addresses of the whole layer (at most `limit` hits, each with its `bbox`). */
export type FeatureQuery = { crs: "working" | "wgs84"; bbox?: Bbox | undefined; q?: string | undefined; limit?: number | undefined };

const overlaps = (a: Bbox, b: Bbox) => a[0] <= b[2] && a[2] >= b[0] && a[1] <= b[3] && a[3] >= b[1];

/**
 * A layer's features as GeoJSON in the working CRS or WGS84, optionally within a bbox given in
 * that CRS and/or matching a search text (best matches first). Properties: parcelId, the mapped
 * attributes, the source attributes and the planar area in the project's units squared.
 */
export function listLayerFeatures(layer: Layer, project: Project, query: FeatureQuery, tx: Db = db()): FeatureCollection & Record<string, unknown> {
  const working = workingProj4(project);
  const box = query.bbox && (query.crs === "working" || !working ? query.bbox : envelopeInWorking(query.bbox, working));
  const table = layer.kind === "parcels" ? parcels : buildings;
  const searched = query.q?.trim() ? query.q : undefined;
  const where = and(box ? layerRowsInBox(table, layer.id, box) : eq(table.layerId, layer.id), searched ? searchCondition(layer, searched) : undefined);
  const order = searched ? searchOrder(layer, searched) : [asc(table.id)];
  const limit = searched ? Math.min(query.limit ?? MAX_SEARCH_HITS, MAX_SEARCH_HITS) : -1;
  const rows = layer.kind === "parcels" ? tx.select().from(parcels).where(where).orderBy(...order).limit(limit).all() : tx.select().from(buildings).where(where).orderBy(...order).limit(limit).all();
  const features = rows.flatMap((row) => {
    const { id, geometry, geometryWgs84, layerId: _l, minX: _a, minY: _b, maxX: _c, maxY: _d, ...props } = row;
    const g = JSON.parse(query.crs === "wgs84" ? geometryWgs84 : geometry) as AreaGeometry;
    const bounds = boundsOf(g);
    if (query.crs === "wgs84" && query.bbox && !overlaps(bounds, query.bbox)) return [];
    // RFC 7946 §5: a feature may carry its bbox; search hits do, so a map can fly to them.
    return [{ type: "Feature" as const, id, geometry: g, properties: props, ...(searched ? { bbox: bounds } : {}) }];
  });
  return { type: "FeatureCollection", crs: query.crs === "wgs84" ? "EPSG:4326" : project.crs, areaUnit: `${project.units}²`, features };
}
