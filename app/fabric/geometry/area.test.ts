import { expect, test } from "vitest";
import type { MultiPolygon, Polygon } from "geojson";
import { polygonArea, ringArea } from "./area";
import { convertArea } from "../crs/units";
import { geosAreas } from "../test-support/reference-tools.server";

// Invented parcels near Quillmere, Ostrand County, in UTM-sized coordinates
// (large offsets are where a naive shoelace loses precision).
const E = 512345.678;
const N = 4178901.234;
const lot: Polygon = {
  type: "Polygon",
  coordinates: [
    [[E, N], [E + 30.05, N + 0.4], [E + 29.7, N + 40.31], [E + 0.2, N + 39.9], [E, N]],
    [[E + 5, N + 5], [E + 5, N + 10.5], [E + 12.25, N + 10.5], [E + 12.25, N + 5], [E + 5, N + 5]],
  ],
};
const twoPart: MultiPolygon = {
  type: "MultiPolygon",
  coordinates: [
    [[[E + 100, N], [E + 100.013, N + 0.007], [E + 100.02, N + 0.019], [E + 100, N]]],
    [[[E + 200, N], [E + 260.5, N], [E + 260.5, N + 15.25], [E + 230.1, N + 30.7], [E + 200, N + 15.25], [E + 200, N]]],
  ],
};

test("polygonArea subtracts holes and matches GEOS to 1e-9 relative", () => {
  const [refLot, refMulti] = geosAreas([lot, twoPart]); // Reference: GEOS via shapely .area
  expect(Math.abs(polygonArea(lot) - refLot!) / refLot!).toBeLessThan(1e-9);
  expect(Math.abs(polygonArea(twoPart) - refMulti!) / refMulti!).toBeLessThan(1e-9);
});

test("ringArea is the same whichever way the ring winds", () => {
  const ring = lot.coordinates[0]!;
  expect(ringArea([...ring].reverse())).toBe(ringArea(ring));
  const [refHole] = geosAreas([{ type: "Polygon", coordinates: [lot.coordinates[1]] }]);
  expect(Math.abs(ringArea(lot.coordinates[1]!) - refHole!) / refHole!).toBeLessThan(1e-9);
});

test("areas convert between m², international ft² and US survey ft²", () => {
  expect(convertArea(1, "m", "ft")).toBeCloseTo(1 / 0.3048 ** 2, 12);
  expect(convertArea(43560, "usft", "m")).toBeCloseTo(43560 * (1200 / 3937) ** 2, 9);
  expect(convertArea(convertArea(12345.678, "ft", "usft"), "usft", "ft")).toBeCloseTo(12345.678, 9);
  // One US survey acre is 4046.872609874252 m² (NIST SP 811 / NGS).
  expect(convertArea(43560, "usft", "m")).toBeCloseTo(4046.872609874252, 9);
});
