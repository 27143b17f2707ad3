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
import { forgetLayerTiles, OVERVIEW_EXACT_BUDGET, OVERVIEW_MAX_ZOOM, readLayerTile } from "./layer-tiles.server";
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

test("an overview tile under the feature budget draws parcels of a pixel or more exactly and counts the rest in cells", async () => {
  const { layer, project, upload } = await storedLayer();
  const [lon, lat] = upload.features[0]!.geometryWgs84.coordinates[0]![0] as number[];
  // Widest spans: QM-001 250.25 ft (76.3 m), QM-002 190.75 ft (58.1 m), QM-004 101.5 ft (30.9 m). A tile unit at
  // latitude 34.05° is 40,075,017 m · cos φ / (2^z · 4096) (spherical Web Mercator): 507 m at z4, 7.92 m at z10,
  // 1.98 m at z12 — so 8 units or more: none at z4, QM-001 only at z10 (9.6), all three at z12 (15.6 and up).
  const expected: Record<number, { whole: number; counted: number }> = { 4: { whole: 0, counted: 3 }, 10: { whole: 1, counted: 2 }, 12: { whole: 3, counted: 0 } };
  for (const z of [4, 10, OVERVIEW_MAX_ZOOM]) {
    const [x, y] = tileOf(lon!, lat!, z);
    const decoded = decode(readLayerTile(layer, project, z, x, y)!.bytes);
    const whole = decoded.filter((f) => f.properties.parcelId !== undefined);
    const counted = decoded.filter((f) => f.properties.count !== undefined).reduce((s, c) => s + Number(c.properties.count), 0);
    expect(whole.length + counted).toBe(3);
    expect({ whole: whole.length, counted }).toEqual(expected[z]);
    const area = decoded.reduce((s, f) => s + Number(f.properties.area), 0);
    expect(area).toBeCloseTo(upload.features.reduce((s, f) => s + f.area, 0), 6);
  }
});

/** A layer of `OVERVIEW_EXACT_BUDGET + 1000` invented 0.0001° lots in one z12 tile, plus `extra` features, in WGS84. */
async function denseLayer(extra: object[] = []) {
  const planner = await createUser({ role: "planner" });
  const created = createProject({ name: `Dense ${Math.random()}`, description: "", units: "m" }, planner);
  const n = OVERVIEW_EXACT_BUDGET + 1000;
  const lots = Array.from({ length: n }, (_, i) => {
    const x = 14.43 + (i % 100) * 0.00012, y = 47.80 + Math.floor(i / 100) * 0.00012;
    return { type: "Feature", properties: { APN: `QM-D${i}`, LU: i % 3 === 0 ? "COM" : "RES", VAL: 1000 }, geometry: { type: "Polygon", coordinates: [[[x, y], [x + 0.0001, y], [x + 0.0001, y + 0.0001], [x, y + 0.0001], [x, y]]] } };
  });
  const bytes = new TextEncoder().encode(JSON.stringify({ type: "FeatureCollection", features: [...lots, ...extra] }));
  const upload = await readParcelUpload({ fileName: "dense.geojson", bytes, kind: "parcels", areaUnit: "m", fields: { landUse: "LU", landValue: "VAL" } });
  const layer = ingestLayer(created, planner, { name: "Dense", kind: "parcels", sourceFileName: "dense.geojson" }, upload);
  return { layer, project: findProjectForUser(created.id, planner)!, upload, lots: n };
}

test("an overview tile over the budget coalesces small parcels into cells that account for each once", async () => {
  const { layer, project, upload, lots } = await denseLayer();
  // Precondition: the grid's corners (14.43°–14.442°, 47.80°–47.8119°) fall in one z12 tile.
  const [x, y] = tileOf(14.43, 47.80, OVERVIEW_MAX_ZOOM);
  expect(tileOf(14.4421, 47.8120, OVERVIEW_MAX_ZOOM)).toEqual([x, y]);
  for (const z of [9, OVERVIEW_MAX_ZOOM]) {
    const [tx, ty] = tileOf(14.43, 47.80, z);
    const decoded = decode(readLayerTile(layer, project, z, tx, ty)!.bytes);
    expect(decoded.every((f) => f.properties.count !== undefined)).toBe(true);
    expect(decoded.length).toBeLessThan(lots / 2);
    expect(decoded.reduce((s, c) => s + Number(c.properties.count), 0)).toBe(lots);
    expect(decoded.reduce((s, c) => s + Number(c.properties.area), 0)).toBeCloseTo(upload.features.reduce((s, f) => s + f.area, 0), 3);
    expect(decoded.reduce((s, c) => s + Number(c.properties.landValue), 0)).toBe(1000 * lots);
    // One lot in three is commercial: no cell of whole lots can have commercial as the land use covering most.
    expect(new Set(decoded.map((c) => c.properties.landUse))).toContain("RES");
  }
  // One zoom deeper the same parcels are drawn exactly.
  const [dx, dy] = tileOf(14.4305, 47.8005, OVERVIEW_MAX_ZOOM + 1);
  expect(decode(readLayerTile(layer, project, OVERVIEW_MAX_ZOOM + 1, dx, dy)!.bytes).every((f) => typeof f.properties.parcelId === "string")).toBe(true);
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
  // Invented: a 0.05° square tract (about 4 km) west of the dense lots, in WGS84.
  const tract = { type: "Feature", properties: { APN: "QM-T0" }, geometry: { type: "Polygon", coordinates: [[[14.37, 47.80], [14.42, 47.80], [14.42, 47.85], [14.37, 47.85], [14.37, 47.80]]] } };
  const { layer, project, lots } = await denseLayer([tract]);
  const [x, y] = tileOf(14.43, 47.80, 12);
  const decoded = decode(readLayerTile(layer, project, 12, x, y)!.bytes);
  const whole = decoded.filter((f) => f.properties.parcelId === "QM-T0");
  expect(whole).toHaveLength(1);
  // Tile x 2212 starts at 2212/4096·360° − 180° = 14.4141°: the tract (from 14.37°) is cut at the buffer line, 64 units west.
  expect(x).toBe(2212);
  expect(Math.min(...whole[0]!.loadGeometry()[0]!.map((p) => p.x))).toBe(-64);
  expect(decoded.filter((f) => f.properties.count !== undefined).reduce((s, c) => s + Number(c.properties.count), 0)).toBe(lots);
});
