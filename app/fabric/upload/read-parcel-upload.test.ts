import { execFileSync } from "node:child_process";
import { readFileSync, readdirSync } from "node:fs";
import { join } from "node:path";
import { expect, test } from "vitest";
import { readParcelUpload } from "./read-parcel-upload.server";
import { cs2cs, ogrFromRows, tempDir, zipFiles } from "../test-support/reference-tools.server";
import { QUILLMERE_ROWS } from "../test-support/quillmere-parcels";
import { isFabricInputError, type FabricErrorCode } from "../errors";
import { positionsOf } from "../geometry/bbox";

/** A Quillmere upload built by GDAL's ogr2ogr; `drop` leaves sidecar files out of the zip. */
function build(driver: "ESRI Shapefile" | "GPKG" | "GeoJSON", opts: { drop?: string[]; srs?: string; rows?: typeof QUILLMERE_ROWS; sql?: string } = {}) {
  const { dir, cleanup } = tempDir();
  try {
    const out = { "ESRI Shapefile": "parcels.shp", GPKG: "parcels.gpkg", GeoJSON: "parcels.geojson" }[driver];
    const extra = driver === "GPKG" ? ["-lco", "GEOMETRY_NAME=geom"] : [];
    const path = ogrFromRows(dir, { rows: opts.rows ?? QUILLMERE_ROWS, driver, out, srs: opts.srs ?? "EPSG:2229", layer: "parcels", extra });
    const sqlOut = opts.sql ? execFileSync("ogrinfo", ["-q", "-dialect", "SQLite", "-sql", opts.sql, path], { encoding: "utf8" }) : "";
    if (driver !== "ESRI Shapefile") return { bytes: readFileSync(path), sqlOut };
    const files = readdirSync(dir).filter((f) => f.startsWith("parcels.") && !(opts.drop ?? []).some((d) => f.endsWith(d)));
    return { bytes: zipFiles(files.map((f) => join(dir, f))), sqlOut };
  } finally {
    cleanup();
  }
}

async function codeOf(p: Promise<unknown>): Promise<FabricErrorCode | "none"> {
  try {
    await p;
    return "none";
  } catch (e) {
    if (isFabricInputError(e)) return e.code;
    throw e;
  }
}

test("a State Plane Shapefile upload is read, mapped, rejected by row and put in the UTM zone of its centre", async () => {
  const up = await readParcelUpload({ fileName: "quillmere.zip", bytes: build("ESRI Shapefile").bytes, kind: "parcels" });
  expect(up.format).toBe("shapefile-zip");
  expect(up.sourceCrs.epsg).toBe(2229);
  expect(up.workingCrs.epsg).toBe(32611);
  expect(up.featureCount).toBe(3);
  expect(up.features.map((f) => [f.parcelId, f.owner, f.landValue])).toEqual([
    ["QM-001", "Maradel Quonsey", 125000], ["QM-002", "Tobiah Vennerick", 88000.5], ["QM-004", "Åsa Ørnvik-Dalby", 1250],
  ]);
  expect(up.rejected.map((r) => r.row)).toEqual([3, 5]);
  expect(up.mapping).toEqual({ parcelId: "APN", owner: "OWNER_NM", address: "SITUS", landUse: "LU", landValue: "LAND_VAL" });
  expect(up.sampleRows).toHaveLength(3);
  const [w, s, e, n] = up.bbox;
  expect(w).toBeLessThan(e);
  expect(s).toBeLessThan(n);
  expect(w).toBeGreaterThan(-118.3);
  expect(n).toBeLessThan(34.1);
});

test("working-CRS and WGS84 vertices match PROJ cs2cs within 1 mm", async () => {
  const up = await readParcelUpload({ fileName: "quillmere.zip", bytes: build("ESRI Shapefile").bytes, kind: "parcels" });
  const source = QUILLMERE_ROWS[0]!.wkt.match(/-?\d+(\.\d+)?/g)!.map(Number);
  const pairs: [number, number][] = [];
  for (let i = 0; i < source.length; i += 2) pairs.push([source[i]!, source[i + 1]!]);
  // Reference: PROJ cs2cs EPSG:2229 → EPSG:32611 and → EPSG:4326 (lat, lon out).
  const utm = cs2cs(2229, 32611, pairs);
  const geo = cs2cs(2229, 4326, pairs).map(([lat, lon]) => [lon, lat]);
  const ours = positionsOf(up.features[0]!.geometry);
  const oursGeo = positionsOf(up.features[0]!.geometryWgs84);
  for (const [i, ref] of utm.entries()) {
    expect(Math.min(...ours.map((p) => Math.hypot(p[0]! - ref[0], p[1]! - ref[1]))), `vertex ${i}`).toBeLessThan(0.001);
    expect(Math.min(...oursGeo.map((p) => Math.hypot(p[0]! - geo[i]![0]!, p[1]! - geo[i]![1]!)))).toBeLessThan(1e-8);
  }
});

test("areas in the source CRS match GDAL/SQLite ST_Area, and convert to the project's unit", async () => {
  const built = build("GPKG", { sql: "SELECT APN, ST_Area(geom) AS a FROM parcels WHERE APN IN ('QM-001','QM-002','QM-004') ORDER BY APN" });
  const feet = await readParcelUpload({ fileName: "q.gpkg", bytes: built.bytes, kind: "parcels", workingCrs: "EPSG:2229" });
  // Reference: ogrinfo's SQLite dialect (SpatiaLite/GEOS) ST_Area, in US survey ft².
  const ref = [...built.sqlOut.matchAll(/a \(Real\) = ([\d.e+]+)/g)].map((m) => Number(m[1]));
  expect(ref).toHaveLength(3);
  feet.features.forEach((f, i) => expect(Math.abs(f.area - ref[i]!) / ref[i]!).toBeLessThan(1e-9));
  expect(feet.areaUnit).toBe("usft");
  const metres = await readParcelUpload({ fileName: "q.gpkg", bytes: built.bytes, kind: "parcels", workingCrs: "EPSG:2229", areaUnit: "m" });
  expect(Math.abs(metres.features[0]!.area - ref[0]! * (1200 / 3937) ** 2) / metres.features[0]!.area).toBeLessThan(1e-12);
});

test("a Shapefile without .prj needs a source CRS; with one picked it reads", async () => {
  const bytes = build("ESRI Shapefile", { drop: [".prj"] }).bytes;
  expect(await codeOf(readParcelUpload({ fileName: "q.zip", bytes, kind: "parcels" }))).toBe("missing_crs");
  const up = await readParcelUpload({ fileName: "q.zip", bytes, kind: "parcels", sourceCrs: "EPSG:2229" });
  expect(up.sourceCrs.epsg).toBe(2229);
  expect(up.featureCount).toBe(3);
});

test("a picked source CRS overrides the file's with a warning; a wrong pick far away is flagged", async () => {
  const bytes = build("ESRI Shapefile").bytes;
  const up = await readParcelUpload({ fileName: "q.zip", bytes, kind: "parcels", sourceCrs: "EPSG:2230" });
  expect(up.sourceCrs.epsg).toBe(2230);
  expect(up.warnings.join(" ")).toMatch(/using NAD83 \/ California zone 6/);
  const far = await readParcelUpload({ fileName: "q.zip", bytes, kind: "parcels", sourceCrs: "EPSG:2263" });
  expect(far.warnings.join(" ")).toMatch(/outside the area where NAD83 \/ New York Long Island/);
});

test("GeoJSON in lon/lat without a crs member is WGS84 (RFC 7946); projected numbers without one need a pick", async () => {
  const geo = build("GeoJSON", { srs: "EPSG:4326", rows: [{ wkt: "POLYGON ((-118.2437 34.0522, -118.2432 34.0522, -118.2432 34.0527, -118.2437 34.0522))", PIN: "QM-010" }] }).bytes;
  const up = await readParcelUpload({ fileName: "q.geojson", bytes: geo, kind: "parcels" });
  expect([up.sourceCrs.epsg, up.workingCrs.epsg, up.features[0]!.parcelId]).toEqual([4326, 32611, "QM-010"]);
  const noCrs = new TextEncoder().encode(JSON.stringify({ type: "FeatureCollection", features: [{ type: "Feature", properties: { PIN: "Q" }, geometry: { type: "Polygon", coordinates: [[[6487000, 1840000], [6487100, 1840000], [6487100, 1840100], [6487000, 1840000]]] } }] }));
  expect(await codeOf(readParcelUpload({ fileName: "q.json", bytes: noCrs, kind: "parcels" }))).toBe("missing_crs");
  expect(await codeOf(readParcelUpload({ fileName: "q.json", bytes: noCrs, kind: "parcels", sourceCrs: "EPSG:4326" }))).toBe("coordinates_outside_crs");
});

test("refusals are typed: unsupported format, empty layer, no parcel ID field, geographic working CRS, unknown field", async () => {
  const kml = new TextEncoder().encode("<kml></kml>");
  expect(await codeOf(readParcelUpload({ fileName: "parcels.kml", bytes: kml, kind: "parcels" }))).toBe("unsupported_format");
  expect(await codeOf(readParcelUpload({ fileName: "parcels.shp", bytes: new Uint8Array([0, 0, 39, 10]), kind: "parcels" }))).toBe("unsupported_format");
  const bad = build("ESRI Shapefile", { rows: [QUILLMERE_ROWS[2]!, QUILLMERE_ROWS[4]!] }).bytes;
  expect(await codeOf(readParcelUpload({ fileName: "q.zip", bytes: bad, kind: "parcels" }))).toBe("empty_layer");
  const anon = build("GPKG", { rows: [{ wkt: QUILLMERE_ROWS[0]!.wkt, COLOR: "red" }] }).bytes;
  expect(await codeOf(readParcelUpload({ fileName: "b.gpkg", bytes: anon, kind: "parcels" }))).toBe("missing_parcel_id_field");
  const good = build("GPKG").bytes;
  expect(await codeOf(readParcelUpload({ fileName: "q.gpkg", bytes: good, kind: "parcels", workingCrs: "EPSG:4269" }))).toBe("geographic_working_crs");
  expect(await codeOf(readParcelUpload({ fileName: "q.gpkg", bytes: good, kind: "parcels", fields: { owner: "OWNER_NAME" } }))).toBe("unknown_field");
});

test("building footprints need no parcel ID and may share one", async () => {
  const rows = [{ wkt: QUILLMERE_ROWS[0]!.wkt, APN: "QM-001", HGT: 7.5 }, { wkt: QUILLMERE_ROWS[3]!.wkt, APN: "QM-001", HGT: 4 }, { wkt: QUILLMERE_ROWS[1]!.wkt, APN: "", HGT: 3 }];
  const up = await readParcelUpload({ fileName: "bldg.gpkg", bytes: build("GPKG", { rows }).bytes, kind: "buildings" });
  expect(up.features.map((f) => f.parcelId)).toEqual(["QM-001", "QM-001", null]);
  expect(up.rejected).toEqual([]);
});

test("overlapping parcels are listed by row and parcel ID with the overlap's area, largest first, and warned about", async () => {
  // Invented lots in EPSG:32617 metres (legacy GeoJSON crs member): B overlaps A by 2 m × 30 m; C overlaps B by 0.01 m × 30 m (0.3 m², not reported).
  const lot = (id: string, x: number) => ({ type: "Feature", properties: { APN: id }, geometry: { type: "Polygon", coordinates: [[[x, 4_400_000], [x + 20, 4_400_000], [x + 20, 4_400_030], [x, 4_400_030], [x, 4_400_000]]] } });
  const doc = { type: "FeatureCollection", crs: { type: "name", properties: { name: "urn:ogc:def:crs:EPSG::32617" } }, features: [lot("QM-A", 540_000), lot("QM-B", 540_018), lot("QM-C", 540_037.99), lot("QM-D", 540_100), lot("QM-E", 540_100.5)] };
  const bytes = new TextEncoder().encode(JSON.stringify(doc));
  const up = await readParcelUpload({ fileName: "lots.geojson", bytes, kind: "parcels", workingCrs: "EPSG:32617", areaUnit: "m" });
  // Closed forms: D and E overlap by 19.5 × 30 = 585 m², A and B by 2 × 30 = 60 m².
  expect(up.overlapCount).toBe(2);
  expect(up.overlaps.map((o) => [o.rows, o.parcelIds])).toEqual([[[4, 5], ["QM-D", "QM-E"]], [[1, 2], ["QM-A", "QM-B"]]]);
  expect(up.overlaps[0]!.area).toBeCloseTo(585, 6);
  expect(up.overlaps[1]!.area).toBeCloseTo(60, 6);
  expect(up.warnings.join(" ")).toMatch(/^2 pairs of parcels overlap by more than 0\.5 m² \(largest: rows 4 and 5, 585\.00 m²\)/);
  const inFeet = await readParcelUpload({ fileName: "lots.geojson", bytes, kind: "parcels", workingCrs: "EPSG:32617", areaUnit: "usft" });
  // 1 US survey ft = 1200/3937 m (NIST SP 811 / NGS), so 60 m² = 60 / (1200/3937)² ft².
  expect(inFeet.overlaps[1]!.area).toBeCloseTo(60 / (1200 / 3937) ** 2, 6);
  const asBuildings = await readParcelUpload({ fileName: "lots.geojson", bytes, kind: "buildings", workingCrs: "EPSG:32617" });
  expect(asBuildings.overlapCount).toBe(0);
});
