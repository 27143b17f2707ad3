import { and, eq, inArray, type SQL } from "drizzle-orm";
import type { Feature, FeatureCollection } from "geojson";
import { buildings, parcels } from "~/db/schema";
import { pointConverter, worldXY, type AreaGeometry, type OverviewItem, type OverviewProperties } from "~/fabric/index.server";
import type { Db } from "~/utils/db.server";
import { envelopeInWorking, layerRowsInBox, WGS84, type Bbox } from "./layer-envelope.server";
import type { Layer } from "./layers.server";

/** MVT values are typed and cannot be null (MVT 2.1 §4.5.1), so absent values are left out. */
function withoutNulls(props: Record<string, string | number | null>): OverviewProperties {
  const out: Record<string, string | number> = {};
  for (const k in props) if (props[k] !== null) out[k] = props[k]!;
  return out as OverviewProperties;
}

type Row = { id: number; g: string } & Record<string, string | number | null>;
const toFeature = ({ id, g, ...props }: Row): Feature<AreaGeometry, OverviewProperties> => ({ type: "Feature", id, geometry: JSON.parse(g) as AreaGeometry, properties: withoutNulls(props) });

type Table = typeof parcels | typeof buildings;

/** The rows of a layer matching `where`, with the properties its tiles carry (the map's parcel card reads them). */
function selectTileRows(layer: Layer, tx: Db, where: (table: Table) => SQL | undefined): Row[] {
  if (layer.kind === "parcels") {
    return tx.select({ id: parcels.id, g: parcels.geometryWgs84, parcelId: parcels.parcelId, owner: parcels.owner, address: parcels.address, landUse: parcels.landUse, landValue: parcels.landValue, area: parcels.area })
      .from(parcels).where(where(parcels)).all();
  }
  return tx.select({ id: buildings.id, g: buildings.geometryWgs84, parcelId: buildings.parcelId, value: buildings.value, area: buildings.area })
    .from(buildings).where(where(buildings)).all();
}

/** A layer's features (WGS84) whose working-CRS bounds meet a WGS84 box, through the R*Tree; every feature without a working CRS. */
export function tileFeaturesInBox(layer: Layer, working: string | undefined, boxWgs84: Bbox, tx: Db): FeatureCollection {
  const envelope = working ? envelopeInWorking(boxWgs84, working) : undefined;
  return { type: "FeatureCollection", features: selectTileRows(layer, tx, (t) => (envelope ? layerRowsInBox(t, layer.id, envelope) : eq(t.layerId, layer.id))).map(toFeature) };
}

/** A layer's features (WGS84) by row id, in chunks that stay under SQLite's bound-parameter limit. */
export function tileFeaturesById(layer: Layer, ids: number[], tx: Db): FeatureCollection {
  const features: Feature[] = [];
  for (let i = 0; i < ids.length; i += 5000) {
    const chunk = ids.slice(i, i + 5000);
    for (const row of selectTileRows(layer, tx, (t) => and(eq(t.layerId, layer.id), inArray(t.id, chunk)))) features.push(toFeature(row));
  }
  return { type: "FeatureCollection", features };
}

/**
 * Every feature of a layer as an overview item: its stored working-CRS bounds, two opposite
 * corners taken to Web Mercator through WGS84. In a conformal working CRS the grid turns by a
 * few degrees at most against Mercator, so this box is off by a few percent of the parcel's
 * size: it only decides which 4-px cell a small parcel is counted in, or whether it is drawn whole.
 */
export function overviewItems(layer: Layer, working: string | undefined, tx: Db): OverviewItem[] {
  const rows: ({ id: number; minX: number; minY: number; maxX: number; maxY: number } & Record<string, string | number | null>)[] = layer.kind === "parcels"
    ? tx.select({ id: parcels.id, minX: parcels.minX, minY: parcels.minY, maxX: parcels.maxX, maxY: parcels.maxY, area: parcels.area, landUse: parcels.landUse, landValue: parcels.landValue }).from(parcels).where(eq(parcels.layerId, layer.id)).all()
    : tx.select({ id: buildings.id, minX: buildings.minX, minY: buildings.minY, maxX: buildings.maxX, maxY: buildings.maxY, area: buildings.area }).from(buildings).where(eq(buildings.layerId, layer.id)).all();
  const toWgs84 = working ? pointConverter(working, WGS84) : (p: number[]) => p;
  return rows.map(({ id, minX, minY, maxX, maxY, ...props }) => {
    const [ax, ay] = toWgs84([minX, minY]);
    const [bx, by] = toWgs84([maxX, maxY]);
    const [x0, y1] = worldXY(ax!, ay!);
    const [x1, y0] = worldXY(bx!, by!);
    return { id, x0: Math.min(x0, x1), y0: Math.min(y0, y1), x1: Math.max(x0, x1), y1: Math.max(y0, y1), properties: withoutNulls(props) };
  });
}
