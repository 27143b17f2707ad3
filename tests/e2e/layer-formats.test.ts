import { readFileSync } from "node:fs";
import { expect, test } from "vitest";
import { geosAreas, ogrFromRows, tempDir, type WktRow } from "~/fabric/test-support/reference-tools.server";
import { QUILLMERE_ROWS } from "~/fabric/test-support/quillmere-parcels";
import { get } from "./support/http";
import { bearer, gdalReprojected, layerList, newProject, postLayer } from "./support/layer-uploads";

type Upload = { id: number; kind: string; featureCount: number; rejected: { row: number; reason: string }[]; repaired: { row: number; repairs: string[] }[]; overlaps: { rows: number[]; parcelIds: string[]; area: number }[]; overlapCount: number; sourceCrs: string; workingCrs: string; warnings: string[] };
type Fc = { features: { properties: Record<string, unknown> }[] };

/** A reference file written by GDAL's ogr2ogr from WKT rows ("GeoJSON" or "GPKG"). */
function gdalFile(rows: WktRow[], driver: "GeoJSON" | "GPKG", srs: string): Uint8Array {
  const { dir, cleanup } = tempDir();
  try {
    const extra = driver === "GPKG" ? ["-lco", "GEOMETRY_NAME=geom"] : [];
    return new Uint8Array(readFileSync(ogrFromRows(dir, { rows, driver, out: driver === "GPKG" ? "parcels.gpkg" : "parcels.geojson", srs, layer: "parcels", extra })));
  } finally {
    cleanup();
  }
}

async function areasOf(layerId: number, auth: Record<string, string>): Promise<number[]> {
  const fc = (await (await get(`/api/v1/layers/${layerId}/features`, auth)).json()) as Fc;
  return fc.features.map((f) => f.properties.area as number);
}

// US survey foot = 1200/3937 m (NIST Handbook 44, Appendix C).
const M2_PER_USFT2 = (1200 / 3937) ** 2;
// QUILLMERE_ROWS: row 3 is a bow tie and row 5 has no geometry; the other three are kept.
const KEPT = QUILLMERE_ROWS.filter((_, i) => ![2, 4].includes(i));

for (const driver of ["GeoJSON", "GPKG"] as const) {
  test(`a ${driver} in State Plane (US ft) from GDAL: 201, counts, CRS, refused rows, areas as GDAL + GEOS give within 0.01 m²`, async () => {
    const planner = await bearer("planner@demo.test");
    const projectId = await newProject(planner, { name: `Quillmere ${driver}`, units: "usft" });
    const res = await postLayer(projectId, planner, gdalFile(QUILLMERE_ROWS, driver, "EPSG:2229"), driver === "GPKG" ? "quillmere.gpkg" : "quillmere.geojson");
    expect(res.status).toBe(201);
    const body = (await res.json()) as Upload;
    expect(body).toMatchObject({ kind: "parcels", featureCount: 3, sourceCrs: "EPSG:2229", workingCrs: "EPSG:32611", repaired: [], overlapCount: 0 });
    expect(body.rejected).toEqual([{ row: 3, reason: expect.stringMatching(/self-intersects/) }, { row: 5, reason: expect.stringMatching(/no geometry|empty/) }]);
    expect((await layerList(projectId, planner)).map((l) => [l.id, l.featureCount])).toEqual([[body.id, 3]]);
    const geos = geosAreas(gdalReprojected(KEPT, "EPSG:2229", "EPSG:32611").features.map((f) => f.geometry));
    (await areasOf(body.id, planner)).forEach((a, i) => expect(Math.abs(a * M2_PER_USFT2 - geos[i]!)).toBeLessThan(0.01));
  });
}

test("an RFC 7946 GeoJSON: unclosed rings are repaired and noted by row, overlapping parcels are warned about with their area", async () => {
  const planner = await bearer("planner@demo.test");
  const projectId = await newProject(planner, { name: "Quillmere repairs", units: "m" });
  // Invented lots near Quillmere in WGS84; QM-702 overlaps QM-701 by a 0.00005° strip; QM-703's ring is left open.
  const lot = (x: number, closed = true) => [[[x, 47.8], [x + 0.0003, 47.8], [x + 0.0003, 47.8002], [x, 47.8002], ...(closed ? [[x, 47.8]] : [])]];
  const features = [lot(14.5), lot(14.50025), lot(14.501, false)].map((coordinates, i) => ({ type: "Feature", properties: { APN: `QM-70${i + 1}` }, geometry: { type: "Polygon", coordinates } }));
  const res = await postLayer(projectId, planner, new TextEncoder().encode(JSON.stringify({ type: "FeatureCollection", features })), "lots.geojson");
  expect(res.status).toBe(201);
  const body = (await res.json()) as Upload;
  expect(body).toMatchObject({ featureCount: 3, rejected: [], sourceCrs: "EPSG:4326", repaired: [{ row: 3, repairs: ["closed 1 unclosed ring (first point repeated at the end)"] }], overlapCount: 1 });
  expect(body.overlaps.map((o) => [o.rows, o.parcelIds])).toEqual([[[1, 2], ["QM-701", "QM-702"]]]);
  // Reference: GEOS area of the same overlap strip, reprojected by GDAL/PROJ to the working CRS.
  const strip = [{ wkt: "POLYGON ((14.50025 47.8, 14.5003 47.8, 14.5003 47.8002, 14.50025 47.8002, 14.50025 47.8))", APN: "strip" }];
  const [geos] = geosAreas(gdalReprojected(strip, "EPSG:4326", body.workingCrs).features.map((f) => f.geometry));
  expect(Math.abs(body.overlaps[0]!.area - geos!)).toBeLessThan(0.01);
  expect(body.warnings.join(" ")).toMatch(/1 pair of parcels overlap by more than 0\.5 m²/);
});

test("a buildings layer through the API: footprints may share a parcel ID and carry a value; they are not checked for overlaps", async () => {
  const planner = await bearer("planner@demo.test");
  const projectId = await newProject(planner, { name: "Quillmere footprints", units: "m" });
  const box = (x: number, y: number) => `POLYGON ((${x} ${y}, ${x + 0.0001} ${y}, ${x + 0.0001} ${y + 0.0001}, ${x} ${y + 0.0001}, ${x} ${y}))`;
  const rows = [
    { wkt: box(14.5, 47.8), APN: "QM-801", BLDG_VAL: 210000 },
    { wkt: box(14.50005, 47.8), APN: "QM-801", BLDG_VAL: 18000 },
    { wkt: "POINT (14.5 47.8)", APN: "QM-802", BLDG_VAL: 5 },
  ];
  const { dir, cleanup } = tempDir();
  let bytes: Uint8Array;
  try {
    // GeoJSON keeps the point row, so the upload must refuse it by number.
    bytes = new Uint8Array(readFileSync(ogrFromRows(dir, { rows, driver: "GeoJSON", out: "b.geojson", srs: "EPSG:4326", layer: "b", extra: ["-nlt", "GEOMETRY"] })));
  } finally {
    cleanup();
  }
  const res = await postLayer(projectId, planner, bytes, "footprints.geojson", { kind: "buildings", name: "Footprints", fields: JSON.stringify({ parcelId: "APN", landValue: "BLDG_VAL" }) });
  expect(res.status).toBe(201);
  const body = (await res.json()) as Upload;
  expect(body).toMatchObject({ kind: "buildings", featureCount: 2, sourceCrs: "EPSG:4326", overlapCount: 0, rejected: [{ row: 3, reason: expect.stringMatching(/not a polygon/) }] });
  const fc = (await (await get(`/api/v1/layers/${body.id}/features`, planner)).json()) as Fc;
  expect(fc.features.map((f) => [f.properties.parcelId, f.properties.value])).toEqual([["QM-801", 210000], ["QM-801", 18000]]);
  expect((await layerList(projectId, planner)).map((l) => [l.id, l.featureCount])).toEqual([[body.id, 2]]);
});
