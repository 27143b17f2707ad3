import { readFileSync } from "node:fs";
import { expect, test } from "vitest";
import { readGeoJson } from "./geojson";
import { ogrFromRows, tempDir } from "../test-support/reference-tools.server";
import { QUILLMERE_ROWS } from "../test-support/quillmere-parcels";
import { isFabricInputError } from "../errors";
import { signedDoubleArea } from "../geometry/ring-orientation";

/** GeoJSON written by GDAL's ogr2ogr (reference writer) from the Quillmere rows. */
function gdalGeoJson(extra: string[] = []): Uint8Array {
  const { dir, cleanup } = tempDir();
  try {
    return readFileSync(ogrFromRows(dir, { rows: QUILLMERE_ROWS, driver: "GeoJSON", out: "parcels.geojson", srs: "EPSG:2229", extra }));
  } finally {
    cleanup();
  }
}

const utf8 = (o: unknown) => new TextEncoder().encode(JSON.stringify(o));

test("reads GDAL's GeoJSON: legacy crs member gives the EPSG code, feature ids are kept", () => {
  const r = readGeoJson(gdalGeoJson(["-lco", "ID_FIELD=APN"]));
  expect(r.sourceEpsg).toBe(2229);
  expect(r.features.map((f) => f.id)).toEqual(["QM-001", "QM-002", "QM-004"]);
  expect(r.rejected.map((x) => x.row)).toEqual([3, 5]);
  expect(r.fieldNames).toEqual(expect.arrayContaining(["OWNER_NM", "SITUS", "LU", "LAND_VAL"]));
});

test("RFC 7946 winding is applied: clockwise exteriors are turned counter-clockwise", () => {
  const cw = [[0, 0], [0, 1], [1, 1], [1, 0], [0, 0]];
  const r = readGeoJson(utf8({ type: "FeatureCollection", features: [{ type: "Feature", id: 7, properties: { PIN: "Q-7" }, geometry: { type: "Polygon", coordinates: [cw] } }] }));
  expect(signedDoubleArea(r.features[0]!.geometry.coordinates[0] as number[][])).toBeGreaterThan(0);
  expect(r.features[0]!.id).toBe(7);
  expect(r.sourceEpsg).toBeUndefined();
});

test("non-polygon, empty and malformed features are rejected by row", () => {
  const features = [
    { type: "Feature", properties: {}, geometry: { type: "Point", coordinates: [0, 0] } },
    { type: "Feature", properties: {}, geometry: { type: "Polygon", coordinates: [] } },
    { type: "Feature", properties: {}, geometry: { type: "Polygon", coordinates: [[[0, 0], [1, 0], [1, 0]]] } },
    { type: "Feature", properties: {}, geometry: null },
  ];
  const r = readGeoJson(utf8({ type: "FeatureCollection", features }));
  expect(r.rejected).toEqual([
    { row: 1, reason: "not a polygon (Point)" },
    { row: 2, reason: "empty geometry" },
    // Too few corners to close safely, so it stays unclosed and is refused.
    { row: 3, reason: expect.stringMatching(/not closed/) },
    { row: 4, reason: "no geometry" },
  ]);
});

test("a crs member that names no EPSG code is ignored with a warning", () => {
  const r = readGeoJson(utf8({ type: "FeatureCollection", crs: { type: "link", properties: { href: "x.prj" } }, features: [] }));
  expect(r.sourceEpsg).toBeUndefined();
  expect(r.warnings.join(" ")).toMatch(/names no EPSG code/);
});

test("bad JSON and non-collections raise typed errors", () => {
  expect(() => readGeoJson(new TextEncoder().encode("{oops"))).toThrow(/not valid JSON/);
  let caught: unknown;
  try {
    readGeoJson(utf8({ type: "Polygon", coordinates: [] }));
  } catch (e) {
    caught = e;
  }
  expect(isFabricInputError(caught, "unsupported_format")).toBe(true);
});

test("heights are dropped from 3D rings with one warning; 2D rows keep their vertices", () => {
  const flat = [[0, 0], [10, 0], [10, 10], [0, 10], [0, 0]];
  const tall = flat.map(([x, y]) => [x! + 20, y!, 101.5]);
  const r = readGeoJson(utf8({ type: "FeatureCollection", features: [flat, tall].map((ring, i) => ({ type: "Feature", properties: { PIN: `Q-${i}` }, geometry: { type: "Polygon", coordinates: [ring] } })) }));
  expect(r.features.map((f) => f.geometry.coordinates[0])).toEqual([flat, tall.map(([x, y]) => [x, y])]);
  expect(r.warnings).toEqual(["Heights (Z values) on 1 rows were dropped; areas are planar."]);
});

test("safe repairs keep a row and say what was done; a self-intersecting row is still refused by number", () => {
  const features = [
    { type: "Feature", properties: { PIN: "Q-1" }, geometry: { type: "Polygon", coordinates: [[[0, 0], [10, 0], [10, 10], [0, 10]]] } },
    { type: "Feature", properties: { PIN: "Q-2" }, geometry: { type: "Polygon", coordinates: [[[20, 0], [30, 0], [30, 10], [30, 14], [30, 10], [20, 10], [20, 0]]] } },
    { type: "Feature", properties: { PIN: "Q-3" }, geometry: { type: "Polygon", coordinates: [[[40, 0], [50, 10], [50, 0], [40, 10], [40, 0]]] } },
    { type: "Feature", properties: { PIN: "Q-4" }, geometry: { type: "Polygon", coordinates: [[[60, 0], [70, 0], [70, 10], [60, 10], [60, 0]]] } },
  ];
  const r = readGeoJson(utf8({ type: "FeatureCollection", features }));
  expect(r.features.map((f) => f.properties.PIN)).toEqual(["Q-1", "Q-2", "Q-4"]);
  expect(r.repaired).toEqual([
    { row: 1, repairs: ["closed 1 unclosed ring (first point repeated at the end)"] },
    { row: 2, repairs: ["removed 1 zero-area spike"] },
  ]);
  expect(r.rejected).toEqual([{ row: 3, reason: expect.stringMatching(/self-intersects/) }]);
  expect(r.features[1]!.geometry.coordinates[0]).toHaveLength(5);
});

test("rings wound against RFC 7946 are noted in RFC 7946 files, not in 2008-style files with a crs member", () => {
  const cw = [[0, 0], [0, 10], [10, 10], [10, 0], [0, 0]];
  const feature = { type: "Feature", properties: { PIN: "Q-9" }, geometry: { type: "Polygon", coordinates: [cw] } };
  expect(readGeoJson(utf8({ type: "FeatureCollection", features: [feature] })).repaired).toEqual([{ row: 1, repairs: ["turned 1 ring to RFC 7946 winding (exterior counter-clockwise, holes clockwise)"] }]);
  const legacy = { type: "FeatureCollection", crs: { type: "name", properties: { name: "EPSG:32617" } }, features: [feature] };
  expect(readGeoJson(utf8(legacy)).repaired).toEqual([]);
});
