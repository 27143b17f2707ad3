import { readdirSync } from "node:fs";
import { join } from "node:path";
import { count, eq, sql } from "drizzle-orm";
import { expect, test } from "vitest";
import { buildings, fabricChanges, layers, parcels } from "~/db/schema";
import { readParcelUpload, type ParcelUpload } from "~/fabric/index.server";
import { QUILLMERE_ROWS } from "~/fabric/test-support/quillmere-parcels";
import { ogrFromRows, shapely, tempDir, zipFiles } from "~/fabric/test-support/reference-tools.server";
import { db } from "~/utils/db.server";
import { createUser } from "../../tests/factories/users";
import { listProjectAuditEvents } from "./audit.server";
import { ingestLayer, LayerConflictError } from "./layer-ingest.server";
import { listLayerFeatures } from "./layer-features.server";
import { listProjectLayers } from "./layers.server";
import { createProject, findProjectForUser } from "./projects.server";

/** The invented Quillmere parcels as a zipped Shapefile written by GDAL's ogr2ogr, read as an upload. */
async function quillmereUpload(): Promise<ParcelUpload> {
  const { dir, cleanup } = tempDir();
  try {
    ogrFromRows(dir, { rows: QUILLMERE_ROWS, driver: "ESRI Shapefile", out: "parcels.shp", srs: "EPSG:2229", layer: "parcels" });
    const bytes = zipFiles(readdirSync(dir).filter((f) => f.startsWith("parcels.")).map((f) => join(dir, f)));
    return await readParcelUpload({ fileName: "quillmere.zip", bytes, kind: "parcels", areaUnit: "usft" });
  } finally {
    cleanup();
  }
}

async function setUp() {
  const planner = await createUser({ role: "planner" });
  const project = createProject({ name: `Quillmere ${Math.random()}`, description: "", units: "usft" }, planner);
  return { planner, project, upload: await quillmereUpload() };
}

const rtreeRows = () => db().all<{ id: number; min_x: number; max_x: number; min_y: number; max_y: number }>(sql`SELECT * FROM parcels_rtree ORDER BY id`);
const parcelCount = () => db().select({ n: count() }).from(parcels).get()!.n;

test("a layer is stored whole: rows, R*Tree entries, the project's first working CRS, the change time and the audit event", async () => {
  const { planner, project, upload } = await setUp();
  const before = rtreeRows().length;
  const layer = ingestLayer(project, planner, { name: "Parcels 2026", kind: "parcels", sourceFileName: "quillmere.zip" }, upload);
  expect(layer).toMatchObject({ kind: "parcels", featureCount: 3, status: "active", sourceCrs: "EPSG:2229", format: "shapefile-zip" });
  const stored = db().select().from(parcels).where(eq(parcels.layerId, layer.id)).all();
  expect(stored.map((p) => [p.parcelId, p.owner, p.landValue])).toEqual([["QM-001", "Maradel Quonsey", 125000], ["QM-002", "Tobiah Vennerick", 88000.5], ["QM-004", "Åsa Ørnvik-Dalby", 1250]]);
  // R*Tree boxes are 32-bit floats rounded outward (SQLite rtree.html §3.1): each must contain the exact bounds.
  const boxes = rtreeRows().slice(before);
  expect(boxes.map((b) => b.id)).toEqual(stored.map((p) => p.id));
  stored.forEach((p, i) => {
    const b = boxes[i]!;
    expect(b.min_x <= p.minX && b.max_x >= p.maxX && b.min_y <= p.minY && b.max_y >= p.maxY).toBe(true);
    expect(b.max_x - b.min_x).toBeCloseTo(p.maxX - p.minX, 0);
  });
  expect(findProjectForUser(project.id, planner)?.crs).toBe("EPSG:32611");
  expect(db().select().from(fabricChanges).where(eq(fabricChanges.projectId, project.id)).get()?.layerId).toBe(layer.id);
  expect(listProjectAuditEvents(project.id).map((e) => e.action)).toContain("layer.uploaded");
});

test("a failure half-way through leaves nothing: no layer, no parcels, no R*Tree rows, no working CRS", async () => {
  const { planner, project, upload } = await setUp();
  const before = { parcels: parcelCount(), rtree: rtreeRows().length };
  // A duplicate parcel ID breaks the unique index on the third row, after two rows went in.
  const broken = { ...upload, features: [...upload.features, { ...upload.features[0]! }] };
  expect(() => ingestLayer(project, planner, { name: "Broken", kind: "parcels", sourceFileName: "x.zip" }, broken)).toThrow(/UNIQUE/);
  expect(listProjectLayers(project.id)).toEqual([]);
  expect({ parcels: parcelCount(), rtree: rtreeRows().length }).toEqual(before);
  expect(findProjectForUser(project.id, planner)?.crs).toBeNull();
});

test("replacing keeps the old layer as `replaced`; replacing a layer of another kind stores nothing", async () => {
  const { planner, project, upload } = await setUp();
  const first = ingestLayer(project, planner, { name: "v1", kind: "parcels", sourceFileName: "a.zip" }, upload);
  const second = ingestLayer(project, planner, { name: "v2", kind: "parcels", sourceFileName: "b.zip", replacesLayerId: first.id }, upload);
  const listed = listProjectLayers(project.id);
  expect(listed.map((l) => [l.id, l.status, l.replacedByLayerId])).toEqual([[second.id, "active", null], [first.id, "replaced", second.id]]);
  expect(db().select({ n: count() }).from(parcels).where(eq(parcels.layerId, first.id)).get()!.n).toBe(3);
  expect(() => ingestLayer(project, planner, { name: "v3", kind: "buildings", sourceFileName: "c.zip", replacesLayerId: second.id }, upload)).toThrow(LayerConflictError);
  expect(listProjectLayers(project.id)).toHaveLength(2);
});

test("deleting a layer removes its parcels and, through the triggers, their R*Tree rows", async () => {
  const { planner, project, upload } = await setUp();
  const layer = ingestLayer(project, planner, { name: "temp", kind: "parcels", sourceFileName: "a.zip" }, upload);
  const ids = db().select({ id: parcels.id }).from(parcels).where(eq(parcels.layerId, layer.id)).all().map((r) => r.id);
  expect(rtreeRows().filter((r) => ids.includes(r.id))).toHaveLength(3);
  db().delete(layers).where(eq(layers.id, layer.id)).run();
  expect(rtreeRows().filter((r) => ids.includes(r.id))).toEqual([]);
});

test("bbox searches through the R*Tree find exactly the parcels whose envelopes GEOS says meet the box", async () => {
  const { planner, project, upload } = await setUp();
  const layer = ingestLayer(project, planner, { name: "search", kind: "parcels", sourceFileName: "a.zip" }, upload);
  const saved = findProjectForUser(project.id, planner)!;
  const all = listLayerFeatures(layer, saved, { crs: "working" });
  const wgs = listLayerFeatures(layer, saved, { crs: "wgs84" });
  for (const [crs, fc] of [["working", all], ["wgs84", wgs]] as const) {
    const geoms = fc.features.map((f) => f.geometry);
    // Boxes around each parcel's centroid (shapely), plus one that misses everything.
    const boxes = shapely<number[][]>("print(json.dumps([[*shape(g).envelope.centroid.coords[0]] for g in data]))", geoms).map(([x, y]) => {
      const d = crs === "working" ? 5 : 1e-5;
      return [x! - d, y! - d, x! + d, y! + d] as [number, number, number, number];
    });
    boxes.push(crs === "working" ? [0, 0, 1, 1] : [10, 10, 10.001, 10.001]);
    for (const [i, box] of boxes.entries()) {
      const script = "from shapely.geometry import box\nb = box(*data['box'])\nprint(json.dumps([i for i, g in enumerate(data['g']) if b.intersects(shape(g).envelope)]))";
      const expected = shapely<number[]>(script, { box, g: geoms }).map((k) => fc.features[k]!.id);
      // Every box but the last sits on a parcel, so an empty answer would be a failure, not agreement.
      expect(expected.length > 0).toBe(i < boxes.length - 1);
      expect(listLayerFeatures(layer, saved, { crs, bbox: box }).features.map((f) => f.id)).toEqual(expected);
    }
  }
});

test("a layer of more rows than one insert statement holds is stored row for row, with an R*Tree box for each", async () => {
  const { planner, project, upload } = await setUp();
  // 1,203 parcels: two full 500-row statements and a 203-row remainder; each copy shifted 100 ft east.
  const shift = (g: ParcelUpload["features"][number]["geometry"], dx: number) => JSON.parse(JSON.stringify(g).replace(/\[(-?[\d.e+-]+),/g, (_, x: string) => `[${Number(x) + dx},`));
  const features = Array.from({ length: 1203 }, (_, i) => {
    const f = upload.features[i % 3]!;
    return { ...f, parcelId: `QM-${i}`, geometry: shift(f.geometry, 100 * i) };
  });
  const layer = ingestLayer(project, planner, { name: "many", kind: "parcels", sourceFileName: "many.zip" }, { ...upload, features, featureCount: features.length });
  const stored = db().select().from(parcels).where(eq(parcels.layerId, layer.id)).orderBy(parcels.id).all();
  expect(stored.map((p) => p.parcelId)).toEqual(features.map((f) => f.parcelId));
  expect(stored.map((p) => JSON.parse(p.geometry))).toEqual(features.map((f) => f.geometry));
  expect(stored.map((p) => [p.owner, p.area, p.attributes])).toEqual(features.map((f) => [f.owner, f.area, f.attributes]));
  const boxes = new Map(rtreeRows().map((b) => [b.id, b]));
  for (const p of stored) {
    const b = boxes.get(p.id)!;
    expect(b.min_x <= p.minX && b.max_x >= p.maxX && b.min_y <= p.minY && b.max_y >= p.maxY).toBe(true);
  }
});

test("a buildings layer stores its footprints with the parcel ID and value they name", async () => {
  const { planner, project, upload } = await setUp();
  const layer = ingestLayer(project, planner, { name: "footprints", kind: "buildings", sourceFileName: "b.zip" }, upload);
  const stored = db().select().from(buildings).where(eq(buildings.layerId, layer.id)).orderBy(buildings.id).all();
  expect(stored.map((b) => [b.parcelId, b.value, b.area])).toEqual(upload.features.map((f) => [f.parcelId, f.landValue, f.area]));
  expect(stored.map((b) => JSON.parse(b.geometryWgs84))).toEqual(upload.features.map((f) => f.geometryWgs84));
});
