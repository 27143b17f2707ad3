import { statSync } from "node:fs";
import { fileURLToPath } from "node:url";
import { expect, test } from "vitest";
import { CRS_ENTRIES, findCrsByCode, parseEpsgCode, searchCrs } from "./epsg-list";
import { reprojectPoint } from "./reproject";
import { cs2cs } from "../test-support/reference-tools.server";

test("the shipped list covers the promised CRS families and stays under 2 MB", () => {
  const codes = new Set(CRS_ENTRIES.map((e) => e.code));
  for (const z of [1, 11, 33, 60]) {
    expect(codes.has(32600 + z) && codes.has(32700 + z)).toBe(true);
  }
  for (const c of [26910, 25832, 2229, 2227, 6423, 2222, 27700, 2157, 2193, 4326, 4269, 3857]) expect(codes.has(c)).toBe(true);
  const bytes = statSync(fileURLToPath(new URL("../../../public/crs/epsg.json", import.meta.url))).size;
  expect(bytes).toBeLessThan(2 * 1024 * 1024);
});

test("every shipped projected CRS round-trips the middle of its area of use", () => {
  const wgs84 = findCrsByCode(4326)!.proj4;
  for (const e of CRS_ENTRIES.filter((x) => x.kind === "projected" && x.areaOfUse)) {
    const [w, s, east, n] = e.areaOfUse!;
    const mid = [(w + east) / 2, (s + n) / 2];
    const back = reprojectPoint(reprojectPoint(mid, wgs84, e.proj4), e.proj4, wgs84);
    expect(Math.abs(back[0]! - mid[0]!) + Math.abs(back[1]! - mid[1]!), `EPSG:${e.code}`).toBeLessThan(1e-7);
  }
});

test("a sample of shipped State Plane zones projects like PROJ's own EPSG definitions", () => {
  const zones = CRS_ENTRIES.filter((e) => /^NAD83 \/ .*\(ftUS\)$/.test(e.name)).filter((_, i) => i % 15 === 0);
  expect(zones.length).toBeGreaterThan(5);
  const nad83 = findCrsByCode(4269)!.proj4;
  for (const e of zones) {
    const [w, s, east, n] = e.areaOfUse!;
    const mid: [number, number] = [(w + east) / 2, (s + n) / 2];
    const ours = reprojectPoint(mid, nad83, e.proj4);
    // Reference: PROJ cs2cs EPSG:4269 → EPSG:<zone>, lat,lon in; easting,northing out (US ft).
    const [ref] = cs2cs(4269, e.code, [[mid[1], mid[0]]]);
    expect(Math.abs(ours[0]! - ref![0]) + Math.abs(ours[1]! - ref![1]), `EPSG:${e.code}`).toBeLessThan(0.003);
  }
});

test("searchCrs finds by exact code first, then by name words in any order", () => {
  expect(searchCrs("EPSG:2229")[0]?.code).toBe(2229);
  expect(searchCrs("2229")[0]?.name).toBe("NAD83 / California zone 5 (ftUS)");
  expect(searchCrs("california 5 ftus").map((e) => e.code)).toContain(2229);
  expect(searchCrs("british national grid").map((e) => e.code)).toEqual([27700]);
  expect(searchCrs("utm zone 33n wgs").map((e) => e.code)).toContain(32633);
  expect(searchCrs("zzzz nothing")).toEqual([]);
  expect(searchCrs("utm", 5)).toHaveLength(5);
});

test("parseEpsgCode reads the usual spellings and refuses others", () => {
  expect(parseEpsgCode("EPSG:2229")).toBe(2229);
  expect(parseEpsgCode("urn:ogc:def:crs:EPSG::26911")).toBe(26911);
  expect(parseEpsgCode("urn:ogc:def:crs:OGC:1.3:CRS84")).toBe(4326);
  expect(parseEpsgCode("epsg 3857")).toBe(3857);
  expect(parseEpsgCode("State Plane")).toBeNull();
});
