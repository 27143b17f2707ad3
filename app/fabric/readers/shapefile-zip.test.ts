import { execFileSync } from "node:child_process";
import { readFileSync, readdirSync, writeFileSync } from "node:fs";
import { join } from "node:path";
import { expect, test } from "vitest";
import { readShapefileZip } from "./shapefile-zip";
import { ogrFromRows, tempDir, zipFiles } from "../test-support/reference-tools.server";
import { QUILLMERE_ROWS } from "../test-support/quillmere-parcels";
import { isFabricInputError } from "../errors";

/** Builds a zipped Shapefile with GDAL's ogr2ogr (reference writer) and returns its bytes and files. */
function shapefileZip(opts: { rows?: typeof QUILLMERE_ROWS; layer?: string; extra?: string[]; srs?: string } = {}) {
  const { dir, cleanup } = tempDir();
  try {
    const layer = opts.layer ?? "parcels";
    ogrFromRows(dir, { rows: opts.rows ?? QUILLMERE_ROWS, driver: "ESRI Shapefile", out: `${layer}.shp`, srs: opts.srs ?? "EPSG:2229", layer, extra: opts.extra });
    const files = readdirSync(dir).filter((f) => f.startsWith(`${layer}.`)).map((f) => join(dir, f));
    const geojson = execFileSync("ogr2ogr", ["-f", "GeoJSON", "/vsistdout/", join(dir, `${layer}.shp`)], { encoding: "utf8" });
    return { bytes: zipFiles(files), files: files.map((f) => f.split("/").pop()!), gdal: JSON.parse(geojson), cpg: files.find((f) => f.endsWith(".cpg")) && readFileSync(files.find((f) => f.endsWith(".cpg"))!, "utf8") };
  } finally {
    cleanup();
  }
}

async function errorOf(p: Promise<unknown>): Promise<unknown> {
  try {
    await p;
  } catch (e) {
    return e;
  }
  throw new Error("expected a rejection");
}

test("reads a zipped Shapefile: valid parcels kept whole, bad rows rejected with reasons", async () => {
  const { bytes } = shapefileZip();
  const r = await readShapefileZip(bytes);
  expect(r.features.map((f) => f.properties.APN)).toEqual(["QM-001", "QM-002", "QM-004"]);
  expect(r.rejected).toEqual([
    { row: 3, reason: expect.stringMatching(/self-intersects/) },
    { row: 5, reason: "no geometry" },
  ]);
  expect(r.fieldNames).toEqual(["APN", "OWNER_NM", "SITUS", "LU", "LAND_VAL"]);
  // A one-part shape comes back as a Polygon, here with its hole.
  expect(r.features[0]!.geometry).toMatchObject({ type: "Polygon", coordinates: [expect.any(Array), expect.any(Array)] });
  expect(r.sourceCrsWkt).toMatch(/California_V/);
});

test("Shapefile vertices come through exactly as GDAL reads them", async () => {
  const { bytes, gdal } = shapefileZip();
  const r = await readShapefileZip(bytes);
  // Reference: GDAL's own reading of the same .shp, as GeoJSON.
  const vertexSet = (g: { coordinates: unknown }) => new Set((g.coordinates as unknown[]).flat(3).map(String));
  const byApn = new Map<string, { geometry: { coordinates: unknown } }>(gdal.features.map((f: { properties: { APN: string }; geometry: { coordinates: unknown } }) => [f.properties.APN, f]));
  for (const f of r.features) {
    expect(vertexSet(f.geometry)).toEqual(vertexSet(byApn.get(String(f.properties.APN))!.geometry));
  }
  expect(r.features[1]!.geometry.type).toBe("MultiPolygon");
});

test("the .cpg encoding is honoured for attribute text", async () => {
  const { bytes, cpg } = shapefileZip({ extra: ["-lco", "ENCODING=ISO-8859-1"] });
  expect(cpg).toMatch(/8859|1252/);
  const r = await readShapefileZip(bytes);
  expect(r.features.find((f) => f.properties.APN === "QM-004")!.properties.OWNER_NM).toBe("Åsa Ørnvik-Dalby");
});

test("without a .cpg, the dBASE language driver ID picks the encoding", async () => {
  // GDAL writes no .cpg by default, only language driver 0x57 (ISO-8859-1) in the .dbf header.
  const { bytes, files } = shapefileZip();
  expect(files.some((f) => f.endsWith(".cpg"))).toBe(false);
  const r = await readShapefileZip(bytes);
  expect(r.features.find((f) => f.properties.APN === "QM-004")!.properties.OWNER_NM).toBe("Åsa Ørnvik-Dalby");
  expect(r.warnings).toEqual([]);
});

test("records flagged deleted in the .dbf are rejected, not read as parcels", async () => {
  const { dir, cleanup } = tempDir();
  try {
    ogrFromRows(dir, { rows: QUILLMERE_ROWS, driver: "ESRI Shapefile", out: "parcels.shp", srs: "EPSG:2229", layer: "parcels" });
    const dbfPath = join(dir, "parcels.dbf");
    const dbf = readFileSync(dbfPath);
    // Flag record 2 (QM-002) deleted, as a dBASE editor would: "*" in its first byte.
    dbf[dbf.readUInt16LE(8) + dbf.readUInt16LE(10)] = 0x2a;
    writeFileSync(dbfPath, dbf);
    const r = await readShapefileZip(zipFiles(["shp", "shx", "dbf", "prj"].map((e) => join(dir, `parcels.${e}`))));
    expect(r.features.map((f) => f.properties.APN)).toEqual(["QM-001", "QM-004"]);
    expect(r.rejected).toContainEqual({ row: 2, reason: "record is marked deleted in the .dbf" });
  } finally {
    cleanup();
  }
});

test("a point or line layer is refused with no_polygon_layer", async () => {
  for (const wkt of ["POINT (6487000 1840000)", "LINESTRING (6487000 1840000, 6487100 1840050)"]) {
    const { bytes } = shapefileZip({ rows: [{ wkt, APN: "QM-900" }] });
    const e = await errorOf(readShapefileZip(bytes));
    expect(isFabricInputError(e, "no_polygon_layer")).toBe(true);
    expect((e as Error).message).toMatch(/points|lines/);
  }
});

test("several polygon layers in one zip are refused unless one is named; a lone polygon layer is picked", async () => {
  const { dir, cleanup } = tempDir();
  try {
    ogrFromRows(dir, { rows: QUILLMERE_ROWS, driver: "ESRI Shapefile", out: "parcels.shp", srs: "EPSG:2229", layer: "parcels" });
    ogrFromRows(dir, { rows: QUILLMERE_ROWS.slice(0, 1), driver: "ESRI Shapefile", out: "easements.shp", srs: "EPSG:2229", layer: "easements" });
    const bytes = zipFiles(readdirSync(dir).filter((f) => !/\.csvt?$/.test(f)).map((f) => join(dir, f)));
    const e = await errorOf(readShapefileZip(bytes));
    expect(isFabricInputError(e, "too_many_layers")).toBe(true);
    expect((e as { details: { layers: string[] } }).details.layers.sort()).toEqual(["easements", "parcels"]);
    expect((await readShapefileZip(bytes, { layer: "easements" })).features).toHaveLength(1);
    ogrFromRows(dir, { rows: [{ wkt: "POINT (6487000 1840000)", APN: "M-1" }], driver: "ESRI Shapefile", out: "marks.shp", srs: "EPSG:2229", layer: "marks" });
    const withPoints = zipFiles(readdirSync(dir).filter((f) => /^(parcels|marks)\./.test(f) && !/\.csvt?$/.test(f)).map((f) => join(dir, f)));
    const picked = await readShapefileZip(withPoints);
    expect(picked.features).toHaveLength(3);
    expect(picked.warnings.join(" ")).toMatch(/ignored non-polygon layers: marks/);
  } finally {
    cleanup();
  }
});

test("a zip without a .shp and bytes that are not a zip raise typed errors", async () => {
  const { dir, cleanup } = tempDir();
  try {
    execFileSync("sh", ["-c", `echo "APN" > ${join(dir, "notes.txt")}`]);
    expect(isFabricInputError(await errorOf(readShapefileZip(zipFiles([join(dir, "notes.txt")]))), "no_polygon_layer")).toBe(true);
  } finally {
    cleanup();
  }
  expect(isFabricInputError(await errorOf(readShapefileZip(new TextEncoder().encode("not a zip at all"))), "corrupt_file")).toBe(true);
});
