import { eq } from "drizzle-orm";
import type { FeatureCollection } from "geojson";
import { buildings, parcels } from "~/db/schema";
import type { AreaGeometry } from "~/fabric/index.server";
import { db, type Db } from "~/utils/db.server";
import { envelopeInWorking, layerRowsInBox, workingProj4, type Bbox } from "./layer-envelope.server";
import { boundsOf } from "./layer-ingest.server";
import type { Layer } from "./layers.server";
import type { Project } from "./projects.server";

export type FeatureQuery = { crs: "working" | "wgs84"; bbox?: Bbox | undefined };

const overlaps = (a: Bbox, b: Bbox) => a[0] <= b[2] && a[2] >= b[0] && a[1] <= b[3] && a[3] >= b[1];

/**
 * A layer's features as GeoJSON in the working CRS or WGS84, optionally within a bbox given in
 * that CRS. Properties: parcelId, the mapped attributes, the source attributes and the planar
 * area in the project's units squared.
 */
export function listLayerFeatures(layer: Layer, project: Project, query: FeatureQuery, tx: Db = db()): FeatureCollection & Record<string, unknown> {
  const working = workingProj4(project);
  const box = query.bbox && (query.crs === "working" || !working ? query.bbox : envelopeInWorking(query.bbox, working));
  const table = layer.kind === "parcels" ? parcels : buildings;
  const where = box ? layerRowsInBox(table, layer.id, box) : eq(table.layerId, layer.id);
  const rows = layer.kind === "parcels" ? tx.select().from(parcels).where(where).orderBy(parcels.id).all() : tx.select().from(buildings).where(where).orderBy(buildings.id).all();
  const features = rows.flatMap((row) => {
    const { id, geometry, geometryWgs84, layerId: _l, minX: _a, minY: _b, maxX: _c, maxY: _d, ...props } = row;
    const g = JSON.parse(query.crs === "wgs84" ? geometryWgs84 : geometry) as AreaGeometry;
    if (query.crs === "wgs84" && query.bbox && !overlaps(boundsOf(g), query.bbox)) return [];
    return [{ type: "Feature" as const, id, geometry: g, properties: props }];
  });
  return { type: "FeatureCollection", crs: query.crs === "wgs84" ? "EPSG:4326" : project.crs, areaUnit: `${project.units}²`, features };
}
