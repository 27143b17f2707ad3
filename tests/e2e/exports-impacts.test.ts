import { execFileSync } from "node:child_process";
import ExcelJS from "exceljs";
import { beforeAll, expect, test } from "vitest";
import { geosFacts, ogrinfoSummary, ogrToGeoJson, withTempDir, writeInto } from "../reference/exports-gdal";
import { get } from "./support/http";
import { bearer } from "./support/layer-uploads";
import { demoProject, readImpactsJson, type ApiImpacts } from "./exports-support";

let demo: Awaited<ReturnType<typeof demoProject>>;
let impacts: ApiImpacts;
beforeAll(async () => {
  demo = await demoProject();
  impacts = await readImpactsJson(demo.alternatives[0]!.id, demo.auth);
});

async function download(path: string, type: RegExp, extension: string): Promise<Uint8Array> {
  const res = await get(path, demo.auth);
  expect(res.status, path).toBe(200);
  expect(res.headers.get("content-type")).toMatch(type);
  expect(res.headers.get("content-disposition")).toMatch(new RegExp(`^attachment; filename="[a-z0-9-]+\\.${extension}"`));
  return new Uint8Array(await res.arrayBuffer());
}

const byId = () => new Map(impacts.parcels.map((p) => [p.parcelId, p]));

test("Shapefile export read back by GDAL: one feature per parcel, the JSON's attributes, EPSG:32617, and take polygons of the exact take area (GEOS)", async () => {
  const alt = demo.alternatives[0]!;
  const zip = await download(`/api/v1/alternatives/${alt.id}/impacts?format=shapefile`, /^application\/zip$/, "zip");
  await withTempDir((dir) => {
    const path = `/vsizip/${writeInto(dir, "takes.zip", zip)}`;
    expect(ogrinfoSummary(path)).toMatch(/Geometry: Polygon[\s\S]*ID\["EPSG",32617\]/);
    const fc = ogrToGeoJson(path);
    expect(fc.features).toHaveLength(impacts.parcels.length);
    const json = byId();
    const areas = geosFacts(fc.features.map((f) => f.geometry));
    fc.features.forEach((f, i) => {
      const p = f.properties as Record<string, unknown>;
      const mine = json.get(p.PARCEL_ID as string)!;
      expect(mine, String(p.PARCEL_ID)).toBeDefined();
      expect(p.ALT_NAME).toBe(alt.name);
      expect(p.TAKE_TYPE).toBe(mine.classification);
      expect(p.TAKE_AREA as number).toBeCloseTo(mine.takeArea, 3);
      expect(p.EASE_AREA as number).toBeCloseTo(mine.easementArea, 3);
      expect(p.REMAIN_AR as number).toBeCloseTo(mine.remainderArea, 3);
      // The polygon GDAL reads has the exact take area (arcs kept by equal-area chords), measured by GEOS.
      if (mine.takeArea > 0) expect(Math.abs(areas[i]!.area - mine.takeArea), mine.parcelId).toBeLessThan(0.01);
      else expect(f.geometry).toBeNull();
      if (areas[i]) expect(areas[i]!.valid).toBe(true);
    });
  });
});

/** Perimeter of (Multi)Polygon coordinates, for the bound on what coordinate rounding can do to an area. */
function perimeterOf(g: { coordinates: number[][][][] } | { coordinates: number[][][] }): number {
  const polys = (typeof g.coordinates[0]![0]![0] === "number" ? [g.coordinates] : g.coordinates) as number[][][][];
  let sum = 0;
  for (const rings of polys) for (const r of rings) for (let i = 1; i < r.length; i++) sum += Math.hypot(r[i]![0]! - r[i - 1]![0]!, r[i]![1]! - r[i - 1]![1]!);
  return sum;
}

test("GeoJSON export read back by ogr2ogr: same features and attributes; in the working CRS the areas are the take areas, through WGS 84 within the coordinates' rounding", async () => {
  const alt = demo.alternatives[0]!;
  const json = byId();
  const working = await download(`/api/v1/alternatives/${alt.id}/impacts?format=geojson&crs=working`, /^application\/geo\+json$/, "geojson");
  expect((JSON.parse(new TextDecoder().decode(working)) as { crs: { properties: { name: string } } }).crs.properties.name).toBe("urn:ogc:def:crs:EPSG::32617");
  const wgs84 = await download(`/api/v1/alternatives/${alt.id}/impacts?format=geojson`, /^application\/geo\+json$/, "geojson");
  await withTempDir((dir) => {
    const exact = ogrToGeoJson(writeInto(dir, "working.geojson", working));
    // RFC 7946 output reprojected back to the grid by GDAL (PROJ), independent of the app's proj4.
    const round = ogrToGeoJson(writeInto(dir, "wgs84.geojson", wgs84), ["-t_srs", "EPSG:32617"]);
    for (const fc of [exact, round]) expect(fc.features).toHaveLength(impacts.parcels.length);
    const exactAreas = geosFacts(exact.features.map((f) => f.geometry));
    const roundAreas = geosFacts(round.features.map((f) => f.geometry));
    exact.features.forEach((f, i) => {
      const p = f.properties as Record<string, unknown>;
      const mine = json.get(p.parcel_id as string)!;
      expect(p.alternative).toBe(alt.name);
      expect(p.take_area_m2 as number).toBeCloseTo(mine.takeArea, 4);
      expect(p.cost_total as number).toBeCloseTo(mine.estimatedCost, 2);
      expect(p.classification).toBe(mine.classification);
      if (!(mine.takeArea > 0)) return expect(f.geometry).toBeNull();
      expect(Math.abs(exactAreas[i]!.area - mine.takeArea), mine.parcelId).toBeLessThan(0.01);
      // Positions in WGS 84 are written to 1e-9° (≤ 0.06 mm of rounding per coordinate here): the area can move by at most perimeter × that.
      const g = round.features[i]!;
      expect((g.properties as Record<string, unknown>).parcel_id).toBe(p.parcel_id);
      expect(Math.abs(roundAreas[i]!.area - mine.takeArea), mine.parcelId).toBeLessThan(0.01 + perimeterOf(g.geometry as never) * 0.00006);
    });
  });
});

test("XLSX of the comparison read back by GDAL: its Summary figures and Total row equal the comparison API's summaries", async () => {
  const bytes = await download(`/api/v1/projects/${demo.projectId}/comparison?format=xlsx`, /spreadsheetml/, "xlsx");
  const comparison = (await (await get(`/api/v1/projects/${demo.projectId}/comparison`, demo.auth)).json()) as { alternatives: { name: string; summary: Record<string, number> }[] };
  const book = new ExcelJS.Workbook();
  await book.xlsx.load(bytes.buffer as ArrayBuffer);
  expect(book.worksheets.map((w) => w.name)).toEqual(["Summary", ...comparison.alternatives.map((a) => a.name)]);
  // GDAL's XLSX driver reads the saved results of the formulas.
  const rows = await withTempDir((dir) => ogrToGeoJson(writeInto(dir, "comparison.xlsx", bytes), ["-oo", "HEADERS=FORCE", "Summary"]).features.map((f) => f.properties as Record<string, number | string>));
  const byName = new Map(rows.map((r) => [r.Alternative, r]));
  const sum = (key: string) => comparison.alternatives.reduce((s, a) => s + a.summary[key]!, 0);
  for (const a of comparison.alternatives) {
    const r = byName.get(a.name)!;
    expect(r["Take area (m²)"] as number).toBeCloseTo(a.summary.takeArea!, 6);
    expect(r["Easement area (m²)"] as number).toBeCloseTo(a.summary.easementArea!, 6);
    expect(r["Estimated cost"] as number).toBeCloseTo(a.summary.estimatedCost!, 4);
    expect(r["Full takes"]).toBe(a.summary.fullTakes);
    expect(r["Buildings displaced"]).toBe(a.summary.displacements);
    expect(r["Corridor area (m²)"] as number).toBeCloseTo(a.summary.corridorArea!, 6);
  }
  const total = byName.get("Total")!;
  expect(total["Take area (m²)"] as number).toBeCloseTo(sum("takeArea"), 6);
  expect(total["Estimated cost"] as number).toBeCloseTo(sum("estimatedCost"), 4);
  expect(total["Parcels affected"]).toBe(sum("parcelsAffected"));
});

test("CSV of one alternative: a row per parcel with the JSON's figures; unknown formats are refused; JSON stays the default", async () => {
  const alt = demo.alternatives[0]!;
  const bytes = await download(`/api/v1/alternatives/${alt.id}/impacts?format=csv`, /^text\/csv/, "csv");
  // Python's csv module (RFC 4180 quoting) reads the file.
  const rows = JSON.parse(execFileSync("python3", ["-c", "import csv, json, sys; print(json.dumps(list(csv.DictReader(sys.stdin))))"], { input: bytes, encoding: "utf8" })) as Record<string, string>[];
  expect(rows).toHaveLength(impacts.parcels.length);
  const json = byId();
  for (const r of rows) {
    const mine = json.get(r.parcel_id!)!;
    expect(r.alternative).toBe(alt.name);
    expect(r.owner).toBe(mine.owner ?? "");
    expect(Number(r.take_area_m2)).toBeCloseTo(mine.takeArea, 4);
    expect(Number(r.cost_total)).toBeCloseTo(mine.estimatedCost, 2);
  }
  const bad = await get(`/api/v1/alternatives/${alt.id}/impacts?format=pdf`, demo.auth);
  expect(bad.status).toBe(400);
  expect(await bad.json()).toMatchObject({ error: { code: "bad_request" } });
  const plain = await get(`/api/v1/alternatives/${alt.id}/impacts`, demo.auth);
  expect(plain.headers.get("content-type")).toMatch(/application\/json/);
  expect((await get(`/api/v1/alternatives/${alt.id}/impacts?format=csv`, await bearer("agent@demo.test"))).status).toBe(403);
});

test("the comparison's CSV and Shapefile hold every alternative's rows", async () => {
  const counts = new Map<string, number>();
  for (const a of demo.alternatives) counts.set(a.name, (await readImpactsJson(a.id, demo.auth)).parcels.length);
  const csv = await download(`/api/v1/projects/${demo.projectId}/comparison?format=csv`, /^text\/csv/, "csv");
  const rows = JSON.parse(execFileSync("python3", ["-c", "import csv, json, sys; print(json.dumps(list(csv.DictReader(sys.stdin))))"], { input: csv, encoding: "utf8" })) as Record<string, string>[];
  const zip = await download(`/api/v1/projects/${demo.projectId}/comparison?format=shapefile`, /^application\/zip$/, "zip");
  const features = await withTempDir((dir) => ogrToGeoJson(`/vsizip/${writeInto(dir, "all.zip", zip)}`).features);
  for (const [name, n] of counts) {
    expect(rows.filter((r) => r.alternative === name)).toHaveLength(n);
    expect(features.filter((f) => (f.properties as Record<string, unknown>).ALT_NAME === name)).toHaveLength(n);
  }
});
