import { execFileSync } from "node:child_process";
import { expect, test } from "vitest";
import { isProjected, resolveCrs } from "./resolve-crs";
import { isFabricInputError } from "../errors";

/** Reference: GDAL's gdalsrsinfo writes the WKT a .prj would hold (ESRI or OGC flavour). */
function gdalWkt(epsg: number, flavour: "wkt_esri" | "wkt1" | "wkt2"): string {
  const wkt = execFileSync("gdalsrsinfo", ["-o", flavour, `EPSG:${epsg}`], { encoding: "utf8" }).trim();
  if (!wkt.startsWith("PROJCS") && !wkt.startsWith("GEOGCS") && !wkt.startsWith("PROJCRS")) throw new Error(`gdalsrsinfo gave no WKT for EPSG:${epsg}`);
  return wkt;
}

test("ESRI-flavoured .prj files without authority codes are identified as their EPSG code", () => {
  for (const code of [2229, 32611, 26910, 27700, 2193, 6423]) {
    const wkt = gdalWkt(code, "wkt_esri");
    expect(wkt).not.toMatch(/AUTHORITY/);
    expect(resolveCrs({ prjWkt: wkt }).epsg).toBe(code);
  }
});

test("OGC WKT1 and WKT2 with an EPSG authority resolve to that code", () => {
  expect(resolveCrs({ prjWkt: gdalWkt(2229, "wkt1") }).epsg).toBe(2229);
  expect(resolveCrs({ prjWkt: gdalWkt(25832, "wkt2") }).epsg).toBe(25832);
});

test("geographic ESRI WKTs resolve to 4326 and 4269", () => {
  expect(resolveCrs({ prjWkt: gdalWkt(4326, "wkt_esri") }).epsg).toBe(4326);
  expect(resolveCrs({ prjWkt: gdalWkt(4269, "wkt_esri") }).epsg).toBe(4269);
});

test("resolved CRSs report their kind and linear unit", () => {
  expect(resolveCrs({ epsg: 2229 })).toMatchObject({ kind: "projected", unit: "usft" });
  expect(resolveCrs({ epsg: 2227 + 0 })).toMatchObject({ unit: "usft" });
  expect(resolveCrs({ epsg: 32611 })).toMatchObject({ kind: "projected", unit: "m" });
  expect(resolveCrs({ epsg: 2236 })).toMatchObject({ unit: "usft" });
  expect(resolveCrs({ epsg: 4326 })).toMatchObject({ kind: "geographic", unit: null });
  expect(isProjected(resolveCrs({ epsg: 3857 }).proj4)).toBe(true);
  expect(isProjected(resolveCrs({ epsg: 4269 }).proj4)).toBe(false);
});

test("an international-foot State Plane zone is told apart from US survey feet", () => {
  // EPSG:2222 NAD83 / Arizona East (ft) uses the international foot.
  expect(resolveCrs({ epsg: 2222 }).unit).toBe("ft");
  expect(resolveCrs({ prjWkt: gdalWkt(2222, "wkt_esri") }).epsg).toBe(2222);
});

test("an unknown code and an unreadable WKT raise typed errors", () => {
  let caught: unknown;
  try {
    resolveCrs({ epsg: 99999 });
  } catch (e) {
    caught = e;
  }
  expect(isFabricInputError(caught, "unknown_crs")).toBe(true);
  expect(() => resolveCrs({ prjWkt: "PROJCS[garbage" })).toThrow(/could not be read/);
  expect(() => resolveCrs({})).toThrow(/pick one/);
});
