import { expect, test } from "vitest";
import { readParcelUpload } from "~/fabric/index.server";
import { shapely } from "~/fabric/test-support/reference-tools.server";
import { createUser } from "../../tests/factories/users";
import { ingestLayer } from "./layer-ingest.server";
import { layerWarningsOf, listProjectLayers, toLayerJson } from "./layers.server";
import { createProject } from "./projects.server";

// Three invented 100 m lots in WGS 84 / UTM zone 17N (EPSG:32617): QW-2 starts 10 m inside QW-1,
// so they overlap by a 10 m × 100 m strip = 1,000 m² (closed form); QW-3's ring is left open.
const X0 = 562_000;
const Y0 = 4_418_000;
const lot = (x: number, closed = true) => [[[x, Y0], [x + 100, Y0], [x + 100, Y0 + 100], [x, Y0 + 100], ...(closed ? [[x, Y0]] : [])]];
const LOTS = [lot(X0), lot(X0 + 90), lot(X0 + 300, false)];

function lotsGeoJson(): Uint8Array {
  const features = LOTS.map((coordinates, i) => ({ type: "Feature", properties: { APN: `QW-${i + 1}` }, geometry: { type: "Polygon", coordinates } }));
  return new TextEncoder().encode(JSON.stringify({ type: "FeatureCollection", features }));
}

async function readLots() {
  return readParcelUpload({ fileName: "lots.geojson", bytes: lotsGeoJson(), kind: "parcels", sourceCrs: "EPSG:32617", workingCrs: "EPSG:32617", areaUnit: "m", fields: { parcelId: "APN" } });
}

test("the warnings kept with a layer: the overlap by rows and parcel IDs with its area, the repaired row with its parcel ID", async () => {
  const upload = await readLots();
  const warnings = layerWarningsOf(upload);
  const overlap = warnings.find((w) => w.kind === "overlap")!;
  expect(overlap).toMatchObject({ rows: [1, 2], parcelIds: ["QW-1", "QW-2"], reason: "the two parcels overlap by 1000.00 m²" });
  // GEOS (shapely) on the same two lots agrees with the closed form 10 m × 100 m.
  const geos = shapely<number>("a, b = (shape(g) for g in data)\nprint(json.dumps(a.intersection(b).area))", LOTS.slice(0, 2).map((c) => ({ type: "Polygon", coordinates: c })));
  expect(geos).toBeCloseTo(1000, 9);
  expect(Math.abs(overlap.area! - 1000)).toBeLessThan(1e-6);
  expect(warnings.filter((w) => w.kind === "repair")).toEqual([{ kind: "repair", rows: [3], parcelIds: ["QW-3"], reason: expect.stringMatching(/closed 1 unclosed ring/) }]);
  expect(warnings.filter((w) => w.kind === "file").map((w) => w.reason).join(" ")).toMatch(/1 pair of parcels overlap/);
});

test("a stored layer keeps its warnings: written with the layer, read back after the database is reopened", async () => {
  const planner = await createUser({ role: "planner" });
  const project = createProject({ name: "Quillmere Wharf", description: "", units: "m", crs: "EPSG:32617" }, planner);
  const upload = await readLots();
  const layer = ingestLayer(project, planner, { name: "Wharf lots", kind: "parcels", sourceFileName: "lots.geojson" }, upload);
  expect(layer.warnings).toEqual(layerWarningsOf(upload));
  // Close the connection as a server stop would, then read through a fresh one.
  const g = globalThis as unknown as { takelineDb?: { sqlite: { close(): void } } };
  g.takelineDb?.sqlite.close();
  delete g.takelineDb;
  const [stored] = listProjectLayers(project.id).map(toLayerJson);
  expect(stored).toMatchObject({ id: layer.id, warningCount: layerWarningsOf(upload).length, warnings: layerWarningsOf(upload) });
  expect(stored!.warnings!.filter((w) => w.kind === "overlap").map((w) => w.parcelIds)).toEqual([["QW-1", "QW-2"]]);
});

test("a clean layer keeps an empty list (none found), not null (not recorded)", async () => {
  const upload = await readParcelUpload({
    fileName: "one.geojson",
    bytes: new TextEncoder().encode(JSON.stringify({ type: "FeatureCollection", features: [{ type: "Feature", properties: { APN: "QW-9" }, geometry: { type: "Polygon", coordinates: lot(X0) } }] })),
    kind: "parcels", sourceCrs: "EPSG:32617", workingCrs: "EPSG:32617", areaUnit: "m", fields: { parcelId: "APN" },
  });
  expect(layerWarningsOf(upload)).toEqual([]);
});
