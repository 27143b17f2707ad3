import { expect, test } from "vitest";
import { geosAreas } from "~/fabric/test-support/reference-tools.server";
import { QUILLMERE_ROWS } from "~/fabric/test-support/quillmere-parcels";
import { get } from "./support/http";
import { bearer, gdalReprojected, layerList, newProject, postLayer, shapefileZip } from "./support/layer-uploads";

// Invented parcels of Quillmere (Ostrand County) in WGS84 lon/lat; owners are made-up names.
const LON = 14.51;
const LAT = 47.82;
const sq = (x: number, y: number, w: number, h: number) => `(${x} ${y}, ${x + w} ${y}, ${x + w} ${y + h}, ${x} ${y + h}, ${x} ${y})`;
const LONLAT_ROWS = [
  { wkt: `POLYGON (${sq(LON, LAT, 0.0012, 0.0008)}, ${sq(LON + 0.0002, LAT + 0.0002, 0.0003, 0.0002)})`, APN: "QM-101", OWNER_NM: "Brenna Toldwick", SITUS: "5 Harlow Steps, Quillmere", LU_CODE: "RES", LAND_VAL: 64000 },
  { wkt: `MULTIPOLYGON ((${sq(LON + 0.002, LAT, 0.0005, 0.0005)}), (${sq(LON + 0.003, LAT, 0.0004, 0.0009)}))`, APN: "QM-102", OWNER_NM: "Orrin Faskelby", SITUS: "18 Moorgate, Quillmere", LU_CODE: "COM", LAND_VAL: 151000.25 },
  { wkt: `POLYGON ((${LON} ${LAT + 0.002}, ${LON + 0.0011} ${LAT + 0.002}, ${LON + 0.0005} ${LAT + 0.0027}, ${LON} ${LAT + 0.002}))`, APN: "QM-103", OWNER_NM: "Ysolde Marrowin", SITUS: "2 Tansy Walk, Quillmere", LU_CODE: "AGR", LAND_VAL: 9900 },
];
const FIELDS = JSON.stringify({ parcelId: "APN", owner: "OWNER_NM", address: "SITUS", landUse: "LU_CODE", landValue: "LAND_VAL" });

type Fc = { features: { id: number; geometry: { coordinates: unknown }; properties: Record<string, unknown> }[]; crs: string };
type Project = { crs: string | null; units: string };

async function features(layerId: number, auth: Record<string, string>, query = "") {
  const res = await get(`/api/v1/layers/${layerId}/features${query}`, auth);
  expect(res.status).toBe(200);
  return (await res.json()) as Fc;
}

test("a WGS84 Shapefile is stored in the UTM zone of its centre with attributes, and areas agree with GDAL + GEOS within 0.01 m²", async () => {
  const planner = await bearer("planner@demo.test");
  const projectId = await newProject(planner, { name: "Quillmere lon/lat", units: "m" });
  const res = await postLayer(projectId, planner, shapefileZip(LONLAT_ROWS, "EPSG:4326"), "quillmere-4326.zip", { fields: FIELDS });
  expect(res.status).toBe(201);
  const body = (await res.json()) as { id: number; kind: string; featureCount: number; rejected: unknown[]; sourceCrs: string; bbox: number[]; warnings: string[] };
  expect(body).toMatchObject({ kind: "parcels", featureCount: 3, rejected: [], sourceCrs: "EPSG:4326" });
  // The bbox is the corners of the invented rows themselves.
  [LON, LAT, LON + 0.0034, LAT + 0.0027].forEach((v, i) => expect(body.bbox[i]).toBeCloseTo(v, 9));
  // UTM zones are 6° wide counted from 180° W, 326zz in the north (EPSG's WGS 84 / UTM numbering; from memory).
  const zone = Math.floor((LON + 180) / 6) + 1;
  const project = (await (await get(`/api/v1/projects/${projectId}`, planner)).json()) as Project;
  expect(project.crs).toBe(`EPSG:${32600 + zone}`);
  const fc = await features(body.id, planner);
  expect(fc.features.map((f) => [f.properties.parcelId, f.properties.owner, f.properties.address, f.properties.landUse, f.properties.landValue])).toEqual(
    LONLAT_ROWS.map((r) => [r.APN, r.OWNER_NM, r.SITUS, r.LU_CODE, r.LAND_VAL]),
  );
  // Reference: GDAL/PROJ reprojects the same rows to the zone, GEOS (shapely) measures them.
  const reference = gdalReprojected(LONLAT_ROWS, "EPSG:4326", `EPSG:${32600 + zone}`);
  const geos = geosAreas(reference.features.map((f) => f.geometry));
  fc.features.forEach((f, i) => expect(Math.abs((f.properties.area as number) - geos[i]!)).toBeLessThan(0.01));
});

test("a State Plane (US ft) Shapefile: rejected rows named, areas in ft² agree with GDAL + GEOS within 0.01 m²", async () => {
  const planner = await bearer("planner@demo.test");
  const projectId = await newProject(planner, { name: "Quillmere State Plane", units: "usft" });
  const res = await postLayer(projectId, planner, shapefileZip(QUILLMERE_ROWS, "EPSG:2229"), "quillmere-2229.zip");
  expect(res.status).toBe(201);
  const body = (await res.json()) as { id: number; featureCount: number; rejected: { row: number; reason: string }[]; sourceCrs: string };
  expect(body.featureCount).toBe(3);
  expect(body.sourceCrs).toBe("EPSG:2229");
  // Row 3 is a bow tie, row 5 has no geometry (see the invented rows).
  expect(body.rejected.map((r) => r.row)).toEqual([3, 5]);
  expect(body.rejected.every((r) => r.reason.length > 0)).toBe(true);
  const project = (await (await get(`/api/v1/projects/${projectId}`, planner)).json()) as Project;
  expect(project.crs).toBe("EPSG:32611");
  const fc = await features(body.id, planner);
  expect(fc.features.map((f) => [f.properties.parcelId, f.properties.landValue])).toEqual([["QM-001", 125000], ["QM-002", 88000.5], ["QM-004", 1250]]);
  const kept = QUILLMERE_ROWS.filter((_, i) => ![2, 4].includes(i));
  const geos = geosAreas(gdalReprojected(kept, "EPSG:2229", "EPSG:32611").features.map((f) => f.geometry));
  // US survey foot = 1200/3937 m (NIST Handbook 44, Appendix C).
  const m2PerUsft2 = (1200 / 3937) ** 2;
  fc.features.forEach((f, i) => expect(Math.abs((f.properties.area as number) * m2PerUsft2 - geos[i]!)).toBeLessThan(0.01));
});

test("preview shows fields, sample rows and the guessed mapping and stores nothing; bbox queries pick single parcels", async () => {
  const planner = await bearer("planner@demo.test");
  const projectId = await newProject(planner, { name: "Quillmere preview", units: "m" });
  const zip = shapefileZip(LONLAT_ROWS, "EPSG:4326");
  const res = await postLayer(projectId, planner, zip, "q.zip", {}, true);
  expect(res.status).toBe(200);
  const preview = (await res.json()) as { fieldNames: string[]; sampleRows: Record<string, unknown>[]; mapping: unknown; featureCount: number; workingCrs: string };
  expect(preview.fieldNames).toEqual(["APN", "OWNER_NM", "SITUS", "LU_CODE", "LAND_VAL"]);
  expect(preview.sampleRows.map((r) => r.APN)).toEqual(["QM-101", "QM-102", "QM-103"]);
  expect(preview.mapping).toEqual(JSON.parse(FIELDS));
  expect(preview.featureCount).toBe(3);
  expect(await layerList(projectId, planner)).toEqual([]);
  expect(((await (await get(`/api/v1/projects/${projectId}`, planner)).json()) as Project).crs).toBeNull();

  const layer = (await (await postLayer(projectId, planner, zip, "q.zip")).json()) as { id: number };
  const inWgs84 = await features(layer.id, planner, `?crs=wgs84&bbox=${LON + 0.0021},${LAT + 0.0001},${LON + 0.0022},${LAT + 0.0002}`);
  expect(inWgs84.features.map((f) => f.properties.parcelId)).toEqual(["QM-102"]);
  const all = await features(layer.id, planner);
  const [x, y] = (all.features[2]!.geometry.coordinates as number[][][])[0]![0]!;
  const inWorking = await features(layer.id, planner, `?crs=working&bbox=${x! - 1},${y! - 1},${x! + 1},${y! + 1}`);
  expect(inWorking.features.map((f) => f.properties.parcelId)).toEqual(["QM-103"]);
  expect((await get(`/api/v1/layers/${layer.id}/features?bbox=1,2,3`, planner)).status).toBe(422);
});

test("a new upload replaces the old layer, which is kept as replaced", async () => {
  const planner = await bearer("planner@demo.test");
  const projectId = await newProject(planner, { name: "Quillmere replace", units: "m" });
  const zip = shapefileZip(LONLAT_ROWS, "EPSG:4326");
  const first = (await (await postLayer(projectId, planner, zip, "v1.zip")).json()) as { id: number };
  const second = await postLayer(projectId, planner, zip, "v2.zip", { replacesLayerId: String(first.id) });
  expect(second.status).toBe(201);
  const { id } = (await second.json()) as { id: number };
  expect((await layerList(projectId, planner)).map((l) => [l.id, l.status, l.featureCount])).toEqual([[id, "active", 3], [first.id, "replaced", 3]]);
  const wrong = await postLayer(projectId, planner, zip, "v3.zip", { replacesLayerId: String(first.id) });
  expect(wrong.status).toBe(409);
  expect(await layerList(projectId, planner)).toHaveLength(2);
});
