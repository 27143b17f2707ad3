import { readdirSync } from "node:fs";
import { join } from "node:path";
import { VectorTile } from "@mapbox/vector-tile";
import { PbfReader as Pbf } from "pbf";
import { expect, test } from "vitest";
import { readParcelUpload, tileBoundsWgs84 } from "~/fabric/index.server";
import { QUILLMERE_ROWS } from "~/fabric/test-support/quillmere-parcels";
import { ogrFromRows, shapely, tempDir, zipFiles } from "~/fabric/test-support/reference-tools.server";
import { createUser } from "../../tests/factories/users";
import { ingestLayer } from "./layer-ingest.server";
import { listLayerFeatures } from "./layer-features.server";
import { forgetLayerTiles, OVERVIEW_MAX_ZOOM, readLayerTile } from "./layer-tiles.server";
import { createProject, findProjectForUser } from "./projects.server";

/** The invented Quillmere parcels (GDAL-written Shapefile, EPSG:2229) stored as a layer. */
async function storedLayer() {
  const planner = await createUser({ role: "planner" });
  const project = createProject({ name: `Tiles ${Math.random()}`, description: "", units: "usft" }, planner);
  const { dir, cleanup } = tempDir();
  try {
    ogrFromRows(dir, { rows: QUILLMERE_ROWS, driver: "ESRI Shapefile", out: "parcels.shp", srs: "EPSG:2229", layer: "parcels" });
    const bytes = zipFiles(readdirSync(dir).filter((f) => f.startsWith("parcels.")).map((f) => join(dir, f)));
    const upload = await readParcelUpload({ fileName: "q.zip", bytes, kind: "parcels", areaUnit: "usft" });
    const layer = ingestLayer(project, planner, { name: "Parcels", kind: "parcels", sourceFileName: "q.zip" }, upload);
    return { layer, project: findProjectForUser(project.id, planner)!, upload };
  } finally {
    cleanup();
  }
}

/** The XYZ tile holding a point (OpenStreetMap wiki, "Slippy map tilenames"). */
function tileOf(lon: number, lat: number, z: number): [number, number] {
  const n = 2 ** z;
  const r = (lat * Math.PI) / 180;
  return [Math.floor(((lon + 180) / 360) * n), Math.floor(((1 - Math.log(Math.tan(r) + 1 / Math.cos(r)) / Math.PI) / 2) * n)];
}

const decode = (bytes: Uint8Array) => {
  const layer = new VectorTile(new Pbf(bytes)).layers.parcels!;
  return Array.from({ length: layer.length }, (_, i) => layer.feature(i));
};

test("a detail tile holds exactly the parcels GEOS finds in the tile and its buffer, with the card's properties", async () => {
  const { layer, project, upload } = await storedLayer();
  const wgs = listLayerFeatures(layer, project, { crs: "wgs84" }).features;
  const [lon, lat] = upload.features[0]!.geometryWgs84.coordinates[0]![0] as number[];
  for (const z of [16, 18]) {
    const [x, y] = tileOf(lon!, lat!, z);
    const tile = readLayerTile(layer, project, z, x, y)!;
    const box = tileBoundsWgs84(z, x, y);
    const script = "from shapely.geometry import box\nb = box(*data['box'])\nprint(json.dumps([i for i, g in enumerate(data['g']) if b.intersects(shape(g))]))";
    const expected = shapely<number[]>(script, { box, g: wgs.map((f) => f.geometry) }).map((i) => wgs[i]!.id);
    expect(expected.length).toBeGreaterThan(0);
    const decoded = decode(tile.bytes);
    expect(decoded.map((f) => f.id).sort()).toEqual([...expected].sort());
    const qm1 = decoded.find((f) => f.properties.parcelId === "QM-001")!;
    expect(qm1.properties).toMatchObject({ owner: "Maradel Quonsey", address: "12 Fennick Row, Quillmere", landUse: "RES", landValue: 125000 });
  }
});

test("an overview tile accounts for every parcel once: drawn whole or counted in a cell", async () => {
  const { layer, project, upload } = await storedLayer();
  const [lon, lat] = upload.features[0]!.geometryWgs84.coordinates[0]![0] as number[];
  for (const z of [4, 9, OVERVIEW_MAX_ZOOM]) {
    const [x, y] = tileOf(lon!, lat!, z);
    const decoded = decode(readLayerTile(layer, project, z, x, y)!.bytes);
    const whole = decoded.filter((f) => f.properties.parcelId !== undefined);
    const cells = decoded.filter((f) => f.properties.count !== undefined);
    expect(whole.length + cells.length).toBe(decoded.length);
    // The three parcels are 65-250 ft across: coalesced at these zooms (under 64 tile units).
    const counted = cells.reduce((s, c) => s + Number(c.properties.count), 0) + whole.length;
    expect(counted).toBe(upload.features.length);
    const area = cells.reduce((s, c) => s + Number(c.properties.area), 0) + whole.reduce((s, f) => s + Number(f.properties.area), 0);
    expect(area).toBeCloseTo(upload.features.reduce((s, f) => s + f.area, 0), 6);
  }
});

test("tiles are cached until the layer is forgotten; an empty tile is null", async () => {
  const { layer, project, upload } = await storedLayer();
  const [lon, lat] = upload.features[0]!.geometryWgs84.coordinates[0]![0] as number[];
  const [x, y] = tileOf(lon!, lat!, 15);
  const first = readLayerTile(layer, project, 15, x, y);
  expect(readLayerTile(layer, project, 15, x, y)).toBe(first);
  forgetLayerTiles(layer.id);
  const rebuilt = readLayerTile(layer, project, 15, x, y);
  expect(rebuilt).not.toBe(first);
  expect(rebuilt!.etag).toBe(first!.etag);
  expect(readLayerTile(layer, project, 15, x + 5, y)).toBeNull();
  expect(readLayerTile(layer, project, 3, 8, 0)).toBeNull();
});

test("at overview zooms a large tract is drawn whole, clipped to each tile it crosses, beside the cells of small lots", async () => {
  const planner = await createUser({ role: "planner" });
  const created = createProject({ name: `Tract ${Math.random()}`, description: "", units: "m" }, planner);
  // Invented: a 0.05° square tract (about 4 km) and two 10 m lots beside it, in WGS84.
  const sq = (x: number, y: number, d: number) => [[[x, y], [x + d, y], [x + d, y + d], [x, y + d], [x, y]]];
  const features = [sq(14.40, 47.80, 0.05), sq(14.46, 47.80, 0.0001), sq(14.4602, 47.80, 0.0001)].map((coordinates, i) =>
    ({ type: "Feature", properties: { APN: `QM-T${i}` }, geometry: { type: "Polygon", coordinates } }));
  const bytes = new TextEncoder().encode(JSON.stringify({ type: "FeatureCollection", features }));
  const upload = await readParcelUpload({ fileName: "tract.geojson", bytes, kind: "parcels", areaUnit: "m" });
  const layer = ingestLayer(created, planner, { name: "Tract", kind: "parcels", sourceFileName: "tract.geojson" }, upload);
  const project = findProjectForUser(created.id, planner)!;
  const [x, y] = tileOf(14.42, 47.82, 12);
  const decoded = decode(readLayerTile(layer, project, 12, x, y)!.bytes);
  expect(decoded.filter((f) => f.properties.parcelId === "QM-T0")).toHaveLength(1);
  // Tile x 2212 starts at 2212/4096·360° − 180° = 14.4141°: the tract (from 14.40°) is cut at the buffer line, 64 units west.
  expect(x).toBe(2212);
  const ring = decoded.find((f) => f.properties.parcelId === "QM-T0")!.loadGeometry()[0]!;
  expect(Math.min(...ring.map((p) => p.x))).toBe(-64);
  const [lx, ly] = tileOf(14.46, 47.80, 12);
  const lots = decode(readLayerTile(layer, project, 12, lx, ly)!.bytes).filter((f) => f.properties.count !== undefined);
  expect(lots.reduce((s, c) => s + Number(c.properties.count), 0)).toBe(2);
});
