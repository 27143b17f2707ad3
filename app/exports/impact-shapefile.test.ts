import { execFileSync } from "node:child_process";
import { parseDbf, parseShp, parseZip } from "shpjs";
import { iter } from "but-unzip";
import { expect, test } from "vitest";
import type { FeatureCollection, MultiPolygon, Polygon } from "geojson";
import { convertArea } from "../geometry";
import { cs2cs } from "../fabric/test-support/reference-tools.server";
import { createImpactSheet, QUILLMERE_EPSG, QUILLMERE_ORIGIN } from "../../tests/reference/exports-impact-rows";
import { geosFacts, ogrinfoSql, ogrinfoSummary, ogrToGeoJson, withTempDir, writeInto } from "../../tests/reference/exports-gdal";
import { writeImpactGeoJson } from "./impact-geojson";
import { writeImpactShapefileZip } from "./impact-shapefile.server";

const [X0, Y0] = QUILLMERE_ORIGIN;
const sheets = () => [createImpactSheet("Northern option", "usft", X0, Y0), createImpactSheet("Southern, via Wexlow", "usft", X0 + 300, Y0 - 800, "QS")];
const rows = () => sheets().flatMap((s) => s.rows.map((r) => ({ ...r, alternative: s.alternativeName })));
const zipOf = (s = sheets()) => writeImpactShapefileZip(s, { workingEpsg: QUILLMERE_EPSG }).zip;

/** Zip members as Buffers (what shpjs's types accept), read with but-unzip. */
async function entries(zip: Uint8Array): Promise<Map<string, Buffer>> {
  const out = new Map<string, Buffer>();
  for (const e of iter(zip)) out.set(e.filename, Buffer.from(await e.read()));
  return out;
}

test("GDAL opens the zip: 10 polygons, the EPSG:2229 .prj, UTF-8 text and the documented fields", async () => {
  await withTempDir((dir) => {
    const path = `/vsizip/${writeInto(dir, "takes.zip", zipOf())}`;
    const info = ogrinfoSummary(path);
    expect(info).toMatch(/Feature Count: 10/);
    expect(info).toMatch(/Geometry: Polygon/);
    expect(info).toMatch(/ID\["EPSG",2229\]/);
    expect(info).toMatch(/TAKE_AREA: Real \(\d+\.4\)/);
    expect(info).toMatch(/COST_TOTAL: Real \(\d+\.2\)/);
    expect(info).toMatch(/REM_PIECES: Integer/);
    expect(info).toMatch(/OWNER: String/);
    const fc = ogrToGeoJson(path);
    rows().forEach((r, i) => {
      const p = fc.features[i]!.properties!;
      expect(p.ALT_NAME).toBe(r.alternative);
      expect(p.PARCEL_ID).toBe(r.parcelId);
      expect(p.OWNER).toBe(r.owner);
      expect(p.ADDRESS).toBe(r.address);
      expect(Math.abs(p.TAKE_AREA - r.takeArea)).toBeLessThanOrEqual(0.00005);
      expect(Math.abs(p.COST_TOTAL - r.cost.total)).toBeLessThanOrEqual(0.005);
      expect(p.HIT_IDS).toBe(r.buildingsHit.join(";") || null);
      expect(p.UNITS).toBe("usft");
    });
  });
});

// With OGR_ORGANIZE_POLYGONS=ONLY_CCW GDAL trusts ring order alone (only counter-clockwise rings
// are holes), so a wrongly wound hole would come back as a second polygon with the wrong area.
test("areas by GDAL (OGR_GEOM_AREA) and by GEOS equal each row's takeArea, holes and parts included", async () => {
  await withTempDir((dir) => {
    const path = `/vsizip/${writeInto(dir, "takes.zip", zipOf())}`;
    const sql = ogrinfoSql(path, "SELECT PARCEL_ID, OGR_GEOM_AREA AS AREA FROM takes");
    const gdalAreas = [...sql.matchAll(/AREA \(Real\) = ([\d.e+-]+)/g)].map((m) => Number(m[1]));
    const fc = JSON.parse(execFileSync("ogr2ogr", ["--config", "OGR_ORGANIZE_POLYGONS", "ONLY_CCW", "-f", "GeoJSON", "/vsistdout/", path], { encoding: "utf8" })) as FeatureCollection;
    const geos = geosFacts(fc.features.map((f) => f.geometry));
    const tol = convertArea(0.01, "m2", "usft2");
    rows().forEach((r, i) => {
      if (r.geometry === null) return expect(fc.features[i]!.geometry).toBeNull();
      expect(Math.abs(geos[i]!.area - r.takeArea)).toBeLessThan(tol);
      expect(geos[i]!.valid).toBe(true);
      expect(fc.features[i]!.geometry!.type).toBe(r.geometry!.length > 1 ? "MultiPolygon" : "Polygon");
    });
    // A null shape has OGR_GEOM_AREA 0, as has its row's takeArea.
    expect(gdalAreas).toHaveLength(rows().length);
    rows().forEach((r, i) => expect(Math.abs(gdalAreas[i]! - r.takeArea)).toBeLessThan(tol));
  });
});

test("shpjs reads the same features and attributes, and its .prj reprojection lands within 1 mm", async () => {
  const zip = zipOf();
  const files = await entries(zip);
  expect([...files.keys()].sort()).toEqual(["takes-fields.txt", "takes.cpg", "takes.dbf", "takes.prj", "takes.shp", "takes.shx"]);
  expect(new TextDecoder().decode(files.get("takes.cpg"))).toBe("UTF-8");
  const planar = parseShp(files.get("takes.shp")!) as (Polygon | MultiPolygon | null)[];
  const attrs = parseDbf(files.get("takes.dbf")!, files.get("takes.cpg")!) as Record<string, unknown>[];
  const wgs = (await parseZip(Buffer.from(zip))) as FeatureCollection;
  const facts = geosFacts(planar);
  const mm = 0.001 / (1200 / 3937);
  rows().forEach((r, i) => {
    expect(attrs[i]!.PARCEL_ID).toBe(r.parcelId);
    expect(attrs[i]!.OWNER).toBe(r.owner ?? "");
    expect(wgs.features[i]!.properties!.OWNER).toBe(r.owner ?? "");
    if (r.geometry === null) return expect(planar[i]).toBeNull();
    expect(Math.abs(facts[i]!.area - r.takeArea)).toBeLessThan(1e-9 * r.takeArea + 1e-9);
    const g = wgs.features[i]!.geometry as Polygon | MultiPolygon;
    const ring = (g.type === "Polygon" ? g.coordinates[0] : g.coordinates[0]![0])!;
    const back = cs2cs(4326, QUILLMERE_EPSG, ring.map((p) => [p[1]!, p[0]!]));
    const source = r.geometry![0]![0]!;
    for (const p of back) expect(Math.min(...source.map((q) => Math.hypot(p[0] - q[0]!, p[1] - q[1]!)))).toBeLessThan(mm);
  });
});

test("geometry given in WGS 84 is written in the working CRS, the areas still within 0.01 m²", async () => {
  const wgs = JSON.parse(await writeImpactGeoJson(sheets(), { workingEpsg: QUILLMERE_EPSG }));
  const fromWgs = sheets().map((s, k) => ({ ...s, rows: s.rows.map((r, i) => ({ ...r, geometry: wgs.features[k * 5 + i].geometry?.coordinates ?? null })) }));
  const { zip } = writeImpactShapefileZip(fromWgs, { workingEpsg: QUILLMERE_EPSG, geometryCrs: "wgs84" });
  const planar = parseShp((await entries(zip)).get("takes.shp")!) as (Polygon | MultiPolygon | null)[];
  const facts = geosFacts(planar);
  rows().forEach((r, i) => r.geometry && expect(Math.abs(facts[i]!.area - r.takeArea)).toBeLessThan(convertArea(0.01, "m2", "usft2")));
});

test("a metric project gets m² in the field list, a metre .prj, and over-long text is cut with a warning", async () => {
  const sheet = createImpactSheet("Metric", "m", 500_000, 4_200_000);
  const long = { ...sheet, rows: sheet.rows.map((r, i) => (i === 0 ? { ...r, owner: "Ø".repeat(200) } : r)) };
  const { zip, warnings } = writeImpactShapefileZip([long], { workingEpsg: 26911, layerName: "metric" });
  expect(warnings).toEqual(["Row 1: OWNER was cut to 254 bytes."]);
  const files = await entries(zip);
  expect(new TextDecoder().decode(files.get("metric-fields.txt"))).toMatch(/TAKE_AREA\s+take_area_m2\s+Take area \(m²\)/);
  await withTempDir((dir) => {
    const path = `/vsizip/${writeInto(dir, "m.zip", zip)}`;
    expect(ogrinfoSummary(path)).toMatch(/ID\["EPSG",26911\]/);
    expect(ogrToGeoJson(path).features[0]!.properties!.OWNER).toBe("Ø".repeat(127));
  });
});

test("Python's zipfile finds every member's CRC-32 correct (PKWARE APPNOTE layout)", async () => {
  await withTempDir((dir) => {
    const path = writeInto(dir, "takes.zip", zipOf());
    const script = "import sys, zipfile, json\nz = zipfile.ZipFile(sys.argv[1])\nprint(json.dumps([z.testzip(), [(i.filename, i.compress_type, i.file_size) for i in z.infolist()]]))";
    const [bad, infos] = JSON.parse(execFileSync("python3", ["-c", script, path], { encoding: "utf8" })) as [string | null, [string, number, number][]];
    expect(bad).toBeNull();
    expect(infos.find((i) => i[0] === "takes.dbf")![1]).toBe(8);
    expect(infos.find((i) => i[0] === "takes.cpg")).toEqual(["takes.cpg", 0, 5]);
  });
});
