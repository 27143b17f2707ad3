import { expect, test } from "vitest";
import { convertArea } from "../geometry";
import { cs2cs } from "../fabric/test-support/reference-tools.server";
import { createImpactSheet, QUILLMERE_EPSG, QUILLMERE_ORIGIN } from "../../tests/reference/exports-impact-rows";
import { geosFacts, ogrinfoSummary, ogrToGeoJson, withTempDir, writeInto } from "../../tests/reference/exports-gdal";
import { writeImpactGeoJson } from "./impact-geojson";

const [X0, Y0] = QUILLMERE_ORIGIN;
const sheets = () => [createImpactSheet("Northern option", "usft", X0, Y0), createImpactSheet("Southern option", "usft", X0 + 300, Y0 - 800, "QS")];
const rows = () => sheets().flatMap((s) => s.rows);

test("WGS 84 GeoJSON (RFC 7946) is read by GDAL with every feature, field and a WGS 84 SRS", async () => {
  const text = await writeImpactGeoJson(sheets(), { workingEpsg: QUILLMERE_EPSG });
  expect(JSON.parse(text).crs).toBeUndefined();
  await withTempDir((dir) => {
    const info = ogrinfoSummary(writeInto(dir, "impacts.geojson", text));
    expect(info).toMatch(/Feature Count: 10/);
    expect(info).toMatch(/Geometry: Multi Polygon/);
    expect(info).toMatch(/GEOGCRS\["WGS 84"/);
    expect(info).toMatch(/take_area_usft2: Real/);
    expect(info).toMatch(/remainder_pieces: Integer/);
    // Lists are JSON arrays; GDAL types string arrays with empty ones among them as String(JSON).
    expect(info).toMatch(/buildings_hit_ids: String(List|\(JSON\))/);
    expect(info).toMatch(/remainder_piece_areas_usft2: RealList/);
    expect(info).toMatch(/owner: String/);
  });
});

test("taken back to the working CRS by GDAL/PROJ, each take's GEOS area equals its takeArea within 0.01 m²", async () => {
  const text = await writeImpactGeoJson(sheets(), { workingEpsg: QUILLMERE_EPSG });
  const back = await withTempDir((dir) => ogrToGeoJson(writeInto(dir, "impacts.geojson", text), ["-t_srs", `EPSG:${QUILLMERE_EPSG}`]));
  const facts = geosFacts(back.features.map((f) => f.geometry));
  const tolerance = convertArea(0.01, "m2", "usft2");
  rows().forEach((r, i) => {
    const p = back.features[i]!.properties!;
    expect(p.parcel_id).toBe(r.parcelId);
    expect(p.owner).toBe(r.owner);
    expect(p.take_area_usft2).toBe(r.takeArea);
    expect(p.remainder_piece_areas_usft2).toEqual(r.remainderPieceAreas);
    if (r.geometry === null) return expect(facts[i]).toBeNull();
    expect(Math.abs(facts[i]!.area - r.takeArea)).toBeLessThan(tolerance);
    expect(facts[i]!.valid).toBe(true);
  });
});

test("WGS 84 vertices land within 1 mm of the working-CRS vertices when PROJ's cs2cs converts them back", async () => {
  const fc = JSON.parse(await writeImpactGeoJson(sheets(), { workingEpsg: QUILLMERE_EPSG }));
  const ring: number[][] = fc.features[1].geometry.coordinates[0][0];
  // cs2cs with EPSG:4326 takes latitude first (authority axis order).
  const projected = cs2cs(4326, QUILLMERE_EPSG, ring.map((p) => [p[1]!, p[0]!]));
  const original = rows()[1]!.geometry![0]![0]!;
  const mm = 0.001 / (1200 / 3937);
  for (const p of projected) expect(Math.min(...original.map((q) => Math.hypot(p[0] - q[0]!, p[1] - q[1]!)))).toBeLessThan(mm);
});

test("rings follow RFC 7946 §3.1.6 (exterior counter-clockwise, holes clockwise) even when the input does not", async () => {
  const sheet = createImpactSheet("Reversed", "usft", X0, Y0);
  const reversed = sheet.rows.map((r) => ({ ...r, geometry: r.geometry?.map((p) => p.map((ring) => [...ring].reverse())) ?? null }));
  const fc = JSON.parse(await writeImpactGeoJson([{ ...sheet, rows: reversed }], { workingEpsg: QUILLMERE_EPSG }));
  const facts = geosFacts(fc.features.map((f: { geometry: unknown }) => f.geometry));
  for (const f of facts.filter((x) => x !== null)) expect([f!.exteriorsCcw, f!.holesCw]).toEqual([true, true]);
});

test("working-CRS GeoJSON carries the legacy crs member that GDAL reads as EPSG:2229, with areas unchanged", async () => {
  const text = await writeImpactGeoJson(sheets(), { workingEpsg: QUILLMERE_EPSG, output: "working" });
  expect(JSON.parse(text).crs).toEqual({ type: "name", properties: { name: "urn:ogc:def:crs:EPSG::2229" } });
  await withTempDir((dir) => {
    const path = writeInto(dir, "impacts.geojson", text);
    expect(ogrinfoSummary(path)).toMatch(/ID\["EPSG",2229\]/);
    const facts = geosFacts(ogrToGeoJson(path).features.map((f) => f.geometry));
    rows().forEach((r, i) => {
      if (r.geometry === null) return expect(facts[i]).toBeNull();
      expect(Math.abs(facts[i]!.area - r.takeArea)).toBeLessThan(1e-6 * r.takeArea);
    });
  });
});
