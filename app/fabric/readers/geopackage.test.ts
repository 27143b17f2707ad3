import { execFileSync } from "node:child_process";
import { readFileSync } from "node:fs";
import { join } from "node:path";
import { expect, test } from "vitest";
import wkx from "wkx";
import { readGeoPackage } from "./geopackage.server";
import { decodeGpkgGeometry } from "./gpkg-geometry.server";
import { ogrFromRows, tempDir } from "../test-support/reference-tools.server";
import { QUILLMERE_ROWS } from "../test-support/quillmere-parcels";
import { isFabricInputError } from "../errors";

/** Builds a GeoPackage with GDAL's ogr2ogr (reference writer); `more` adds layers with -update. */
function gdalGpkg(more: { layer: string; wkt: string; type: string }[] = []): { bytes: Uint8Array; gdal: { features: { properties: { APN: string }; geometry: { coordinates: unknown } }[] } } {
  const { dir, cleanup } = tempDir();
  try {
    const out = ogrFromRows(dir, { rows: QUILLMERE_ROWS, driver: "GPKG", out: "fabric.gpkg", srs: "EPSG:2229", layer: "parcels" });
    for (const m of more) {
      ogrFromRows(dir, { rows: [{ wkt: m.wkt, APN: "QM-X" }], driver: "GPKG", out: "fabric.gpkg", srs: "EPSG:2229", layer: m.layer, extra: ["-update", "-nlt", m.type] });
    }
    const gdal = JSON.parse(execFileSync("ogr2ogr", ["-f", "GeoJSON", "/vsistdout/", join(dir, "fabric.gpkg"), "parcels"], { encoding: "utf8" }));
    return { bytes: readFileSync(out), gdal };
  } finally {
    cleanup();
  }
}

test("reads GDAL's GeoPackage: SRS from gpkg_spatial_ref_sys, rows in order, bad rows rejected", () => {
  const r = readGeoPackage(gdalGpkg().bytes);
  expect(r.sourceEpsg).toBe(2229);
  expect(r.sourceCrsWkt).toMatch(/California zone 5/);
  expect(r.features.map((f) => f.properties.APN)).toEqual(["QM-001", "QM-002", "QM-004"]);
  expect(r.rejected).toEqual([{ row: 3, reason: expect.stringMatching(/self-intersects/) }, { row: 5, reason: "no geometry" }]);
  expect(r.fieldNames).toEqual(["APN", "OWNER_NM", "SITUS", "LU", "LAND_VAL"]);
  expect(r.features[2]!.properties.OWNER_NM).toBe("Åsa Ørnvik-Dalby");
});

test("GeoPackage vertices come through exactly as GDAL reads them", () => {
  const { bytes, gdal } = gdalGpkg();
  const r = readGeoPackage(bytes);
  const vertexSet = (g: { coordinates: unknown }) => new Set((g.coordinates as unknown[]).flat(3).map(String));
  for (const f of r.features) {
    // Reference: GDAL's own reading of the same table.
    const ref = gdal.features.find((g) => g.properties.APN === f.properties.APN)!;
    expect(vertexSet(f.geometry)).toEqual(vertexSet(ref.geometry));
  }
});

test("the only polygon layer is read when others hold points; two polygon layers need a name", () => {
  const withPoints = readGeoPackage(gdalGpkg([{ layer: "survey_marks", wkt: "POINT (6487000 1840000)", type: "POINT" }]).bytes);
  expect(withPoints.features).toHaveLength(3);
  expect(withPoints.warnings.join(" ")).toMatch(/survey_marks/);
  const two = gdalGpkg([{ layer: "easements", wkt: "POLYGON ((6487000 1840000, 6487010 1840000, 6487010 1840010, 6487000 1840000))", type: "MULTIPOLYGON" }]).bytes;
  let caught: unknown;
  try {
    readGeoPackage(two);
  } catch (e) {
    caught = e;
  }
  expect(isFabricInputError(caught, "too_many_layers")).toBe(true);
  expect(readGeoPackage(two, { layer: "easements" }).features).toHaveLength(1);
});

test("GeoPackage binary headers: byte order, envelope sizes and the empty flag are honoured", () => {
  const wkb = new Uint8Array(wkx.Geometry.parseGeoJSON({ type: "Polygon", coordinates: [[[0, 0], [4, 0], [4, 3], [0, 0]]] }).toWkb());
  const blob = (flags: number, envelope: number) => {
    const header = new Uint8Array(8 + envelope);
    header.set([0x47, 0x50, 0, flags]);
    return new Uint8Array([...header, ...wkb]);
  };
  for (const [flags, env] of [[0x01, 0], [0x03, 32], [0x05, 48], [0x08, 64]] as const) {
    expect(decodeGpkgGeometry(blob(flags, env))).toEqual({ geometry: { type: "Polygon", coordinates: [[[0, 0], [4, 0], [4, 3], [0, 0]]] } });
  }
  expect(decodeGpkgGeometry(blob(0x11, 0))).toEqual({ empty: true });
  expect(decodeGpkgGeometry(new Uint8Array([1, 2, 3, 4, 5, 6, 7, 8, 9]))).toHaveProperty("error");
  expect(decodeGpkgGeometry(blob(0x0f, 0))).toHaveProperty("error");
});

test("a SQLite file that is not a GeoPackage and garbage bytes raise typed errors", () => {
  expect(() => readGeoPackage(new TextEncoder().encode("SQLite format 3\0 but not really"))).toThrow();
  const { dir, cleanup } = tempDir();
  try {
    execFileSync("ogr2ogr", ["-f", "SQLite", join(dir, "plain.sqlite"), ogrFromRows(dir, { rows: QUILLMERE_ROWS.slice(0, 1), driver: "GeoJSON", out: "one.geojson" })]);
    let caught: unknown;
    try {
      readGeoPackage(readFileSync(join(dir, "plain.sqlite")));
    } catch (e) {
      caught = e;
    }
    expect(isFabricInputError(caught, "unsupported_format")).toBe(true);
  } finally {
    cleanup();
  }
});
