import { readdirSync } from "node:fs";
import { join } from "node:path";
import { expect, test } from "vitest";
import { readParcelUpload } from "~/fabric/index.server";
import { QUILLMERE_ROWS } from "~/fabric/test-support/quillmere-parcels";
import { ogrFromRows, shapely, tempDir, zipFiles } from "~/fabric/test-support/reference-tools.server";
import { createUser } from "../../tests/factories/users";
import { ingestLayer } from "./layer-ingest.server";
import { listLayerFeatures } from "./layer-features.server";
import { createProject, findProjectForUser } from "./projects.server";

async function storedQuillmere() {
  const planner = await createUser({ role: "planner" });
  const created = createProject({ name: `Search ${Math.random()}`, description: "", units: "usft" }, planner);
  const { dir, cleanup } = tempDir();
  try {
    ogrFromRows(dir, { rows: QUILLMERE_ROWS, driver: "ESRI Shapefile", out: "parcels.shp", srs: "EPSG:2229", layer: "parcels" });
    const bytes = zipFiles(readdirSync(dir).filter((f) => f.startsWith("parcels.")).map((f) => join(dir, f)));
    const upload = await readParcelUpload({ fileName: "q.zip", bytes, kind: "parcels", areaUnit: "usft" });
    const layer = ingestLayer(created, planner, { name: "Parcels", kind: "parcels", sourceFileName: "q.zip" }, upload);
    return { layer, project: findProjectForUser(created.id, planner)! };
  } finally {
    cleanup();
  }
}

test("a search finds parcels by ID, owner or address in any case, best match first, each with the bbox GEOS gives", async () => {
  const { layer, project } = await storedQuillmere();
  const ids = (q: string, limit?: number) => listLayerFeatures(layer, project, { crs: "wgs84", q, limit }).features.map((f) => f.properties!.parcelId);
  expect(ids("quonsey")).toEqual(["QM-001"]);
  expect(ids("fennick row")).toEqual(["QM-001"]);
  expect(ids("qm-00")).toEqual(["QM-001", "QM-002", "QM-004"]);
  expect(ids("QM-004")).toEqual(["QM-004"]);
  expect(ids("qm-00", 2)).toEqual(["QM-001", "QM-002"]);
  // LIKE's wildcards are searched for literally, not as patterns.
  expect(ids("QM_00")).toEqual([]);
  expect(ids("%")).toEqual([]);
  const hit = listLayerFeatures(layer, project, { crs: "wgs84", q: "Ostrand Pike" }).features[0]!;
  expect(hit.properties!.parcelId).toBe("QM-002");
  // Reference: GEOS bounds (shapely) of the same stored WGS84 geometry.
  const bounds = shapely<number[]>("print(json.dumps(list(shape(data).bounds)))", hit.geometry);
  expect(hit.bbox).toEqual(bounds);
  expect(listLayerFeatures(layer, project, { crs: "wgs84" }).features[0]).not.toHaveProperty("bbox");
});
