import { expect, test } from "vitest";
import type { Polygon } from "geojson";
import { cs2cs } from "../test-support/reference-tools.server";
import { pointConverter, reproject, reprojectPoint } from "./reproject";
import { resolveCrs } from "./resolve-crs";
import { signedDoubleArea } from "../geometry/ring-orientation";

const def = (epsg: number) => resolveCrs({ epsg }).proj4;

/** Max distance between two point lists, per axis, in the output unit. */
function maxDiff(a: number[][], b: number[][]): number {
  return Math.max(...a.map((p, i) => Math.max(Math.abs(p[0]! - b[i]![0]!), Math.abs(p[1]! - b[i]![1]!))));
}

const LA: [number, number][] = [[-118.2437, 34.0522], [-118.9, 34.6], [-117.31, 33.95]];

test("geographic to WGS 84 / UTM 11N matches PROJ cs2cs within 1 mm", () => {
  const ours = LA.map((p) => reprojectPoint(p, def(4326), def(32611)));
  // Reference: PROJ cs2cs, EPSG:4326 in lat,lon order; output easting,northing.
  const ref = cs2cs(4326, 32611, LA.map(([lon, lat]) => [lat, lon]));
  expect(maxDiff(ours, ref)).toBeLessThan(0.001);
});

test("NAD83 to California zone 5 in US survey feet matches PROJ cs2cs within 1 mm", () => {
  const ours = LA.map((p) => reprojectPoint(p, def(4269), def(2229)));
  // Reference: PROJ cs2cs EPSG:4269 → EPSG:2229 (easting, northing in US ft); 1 mm = 0.00328 ft.
  const ref = cs2cs(4269, 2229, LA.map(([lon, lat]) => [lat, lon]));
  expect(maxDiff(ours, ref)).toBeLessThan(0.001 / (1200 / 3937));
});

test("national Transverse Mercator grids (NZTM, British National Grid) match PROJ cs2cs within 1 mm", () => {
  const nz: [number, number][] = [[174.776, -41.2865], [172.6362, -43.5321], [175.28, -37.79]];
  const oursNz = nz.map((p) => reprojectPoint(p, def(4167), def(2193)));
  // Reference: PROJ cs2cs EPSG:4167 → EPSG:2193, whose EPSG axis order is northing, easting.
  const refNz = cs2cs(4167, 2193, nz.map(([lon, lat]) => [lat, lon])).map(([n, e]) => [e, n]);
  expect(maxDiff(oursNz, refNz)).toBeLessThan(0.001);
  const gb: [number, number][] = [[-1.5491, 53.8008], [-3.1883, 55.9533], [0.1218, 52.2053]];
  // Same datum (OSGB36) on both sides, so this checks the projection alone.
  const oursGb = gb.map((p) => reprojectPoint(p, def(4277), def(27700)));
  const refGb = cs2cs(4277, 27700, gb.map(([lon, lat]) => [lat, lon]));
  expect(maxDiff(oursGb, refGb)).toBeLessThan(0.001);
});

test("State Plane feet back to NAD83 degrees matches PROJ cs2cs within 1e-8 degrees", () => {
  const feet: [number, number][] = [[6487000.25, 1840000.5], [6400000, 1900000]];
  const ours = feet.map((p) => reprojectPoint(p, def(2229), def(4269)));
  // Reference: PROJ cs2cs EPSG:2229 → EPSG:4269, output lat, lon.
  const ref = cs2cs(2229, 4269, feet).map(([lat, lon]) => [lon, lat]);
  expect(maxDiff(ours, ref)).toBeLessThan(1e-8);
});

test("reproject converts every vertex, keeps holes and re-normalizes winding", () => {
  const square: Polygon = {
    type: "Polygon",
    coordinates: [
      [[-118.25, 34.05], [-118.24, 34.05], [-118.24, 34.06], [-118.25, 34.06], [-118.25, 34.05]],
      [[-118.248, 34.052], [-118.248, 34.054], [-118.246, 34.054], [-118.246, 34.052], [-118.248, 34.052]],
    ],
  };
  const out = reproject(square, def(4326), def(32611));
  const flat = square.coordinates.flat() as [number, number][];
  // Reference: PROJ cs2cs for each vertex.
  const ref = cs2cs(4326, 32611, flat.map(([lon, lat]) => [lat, lon]));
  expect(maxDiff(out.coordinates.flat(), ref)).toBeLessThan(0.001);
  expect(signedDoubleArea(out.coordinates[0]!)).toBeGreaterThan(0);
  expect(signedDoubleArea(out.coordinates[1]!)).toBeLessThan(0);
});

test("shipped EPSG codes can be named directly", () => {
  expect(reprojectPoint([-118.2437, 34.0522], "EPSG:4326", "EPSG:32611")).toEqual(reprojectPoint([-118.2437, 34.0522], def(4326), def(32611)));
  expect(() => reprojectPoint([0, 0], "EPSG:99999", "EPSG:4326")).toThrow(/not in Takeline/);
});

test("a point outside the projection's domain raises reprojection_failed, not NaN coordinates", () => {
  expect(() => reprojectPoint([0, 90], def(4326), def(3857))).toThrow(/cannot be converted/);
});

test("a point converter gives what reprojectPoint gives, and PROJ's cs2cs agrees within 1 mm", () => {
  const toUtm = pointConverter(def(4326), def(32611));
  const ours = LA.map((p) => toUtm(p));
  expect(ours).toEqual(LA.map((p) => reprojectPoint(p, def(4326), def(32611))));
  // Reference: PROJ cs2cs, EPSG:4326 in lat,lon order.
  expect(maxDiff(ours, cs2cs(4326, 32611, LA.map(([lon, lat]) => [lat, lon])))).toBeLessThan(0.001);
  expect(pointConverter(def(32611), def(32611))([1, 2, 3])).toEqual([1, 2]);
});
