import { expect, test } from "vitest";
import { findCrsByCode } from "~/fabric/crs/epsg-list";
import { cs2cs } from "~/fabric/test-support/reference-tools.server";
import { createWorkingCrs } from "./working-crs";

// Demo-area points in EPSG:32617 (the invented Quillmere fabric's working CRS) and one in EPSG:2229.
const UTM: [number, number][] = [[561150, 4417300], [562950, 4419250], [563250, 4421250]];

test("working CRS → WGS84 matches PROJ cs2cs to 1e-9°, and a map click comes back to the same metre coordinates to 1 mm", () => {
  const crs = createWorkingCrs(findCrsByCode(32617)!.proj4);
  // Reference: PROJ cs2cs EPSG:32617 → EPSG:4326 prints latitude then longitude.
  const reference = cs2cs(32617, 4326, UTM).map(([lat, lon]) => [lon, lat]);
  UTM.forEach((xy, i) => {
    const ll = crs.toLngLat(xy);
    expect(Math.abs(ll[0] - reference[i]![0]!)).toBeLessThan(1e-9);
    expect(Math.abs(ll[1] - reference[i]![1]!)).toBeLessThan(1e-9);
    const back = crs.toWorking(ll);
    expect(Math.hypot(back[0] - xy[0], back[1] - xy[1])).toBeLessThan(0.001);
  });
});

test("US-foot state plane (EPSG:2229) converts like cs2cs too, polygons ring by ring", () => {
  const crs = createWorkingCrs(findCrsByCode(2229)!.proj4);
  const ring: [number, number][] = [[6500000, 1850000], [6501000, 1850000], [6501000, 1851000], [6500000, 1850000]];
  const reference = cs2cs(2229, 4326, ring).map(([lat, lon]) => [lon, lat]);
  const polygon = crs.geometryToLngLat({ type: "Polygon", coordinates: [ring] });
  polygon.coordinates[0]!.forEach((p, i) => {
    expect(Math.abs(p[0]! - reference[i]![0]!)).toBeLessThan(1e-8);
    expect(Math.abs(p[1]! - reference[i]![1]!)).toBeLessThan(1e-8);
  });
});
