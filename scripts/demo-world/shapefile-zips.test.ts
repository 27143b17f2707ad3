/**
 * The committed demo Shapefile zips, checked with GDAL's ogrinfo (Debian
 * gdal-bin) and SpatiaLite's ST_IsValid, GDAL's own ESRI WKT of EPSG:32617
 * (gdalsrsinfo), GEOS through shapely, and Takeline's readParcelUpload.
 * Zip members are listed with but-unzip, a zip reader independent of ours.
 */
import { execFileSync } from "node:child_process";
import { readFileSync } from "node:fs";
import { iter } from "but-unzip";
import { describe, expect, it } from "vitest";
import { readParcelUpload } from "~/fabric/index.server";
import { shapely } from "~/fabric/test-support/reference-tools.server";
import { demoFile } from "./test-paths";

const ogrinfo = (...args: string[]) => execFileSync("ogrinfo", ["-ro", ...args], { encoding: "utf8", maxBuffer: 64 * 1024 * 1024 });
const sql = (layer: string, query: string) => ogrinfo("-q", "-dialect", "SQLite", "-sql", query, `/vsizip/${demoFile(`${layer}.zip`)}`);
/** Members of a committed zip as name → bytes, read by but-unzip. */
async function members(layer: string): Promise<Map<string, Uint8Array>> {
  const out = new Map<string, Uint8Array>();
  for (const item of iter(new Uint8Array(readFileSync(demoFile(`${layer}.zip`))))) out.set(item.filename, await item.read());
  return out;
}
const firstNumber = (text: string) => Number(/=\s*(-?\d+)/.exec(text)?.[1]);

describe.each([
  { layer: "quillmere-parcels", fields: ["APN: String", "OWNER_NM: String", "SITUS: String", "LU_CODE: String", "LAND_VAL: Integer"], min: 2500 },
  { layer: "quillmere-buildings", fields: ["APN: String", "BLDG_VAL: Integer"], min: 2500 },
])("the $layer zip", ({ layer, fields, min }) => {
  it("holds .shp .shx .dbf .prj .cpg and reads back in GDAL (ogrinfo) with the expected fields and no invalid geometry (SpatiaLite ST_IsValid)", async () => {
    const listing = [...(await members(layer)).keys()].sort();
    expect(listing).toEqual(["cpg", "dbf", "prj", "shp", "shx"].map((e) => `${layer}.${e}`));
    const summary = ogrinfo("-so", `/vsizip/${demoFile(`${layer}.zip`)}`, layer);
    const count = Number(/Feature Count: (\d+)/.exec(summary)?.[1]);
    expect(count).toBeGreaterThanOrEqual(min);
    for (const f of fields) expect(summary).toContain(f);
    expect(summary).toMatch(/Geometry: (Multi )?Polygon/);
    expect(firstNumber(sql(layer, `SELECT count(*) AS n FROM "${layer}" WHERE NOT ST_IsValid(geometry)`))).toBe(0);
    expect(firstNumber(sql(layer, `SELECT count(*) AS n FROM "${layer}"`))).toBe(count);
  });

  it("has GDAL's ESRI WKT of EPSG:32617 as its .prj (gdalsrsinfo) and UTF-8 in its .cpg", async () => {
    const files = await members(layer);
    const prj = new TextDecoder().decode(files.get(`${layer}.prj`));
    const esri = execFileSync("gdalsrsinfo", ["-o", "wkt_esri", "--single-line", "EPSG:32617"], { encoding: "utf8" }).trim();
    expect(prj.trim()).toBe(esri);
    expect(new TextDecoder().decode(files.get(`${layer}.cpg`)).trim()).toBe("UTF-8");
  });
});

describe("quillmere-parcels.zip content", () => {
  it("has MultiPolygons (lots split by the creek) and polygons with holes (tracts around an enclave), per SpatiaLite", () => {
    const layer = "quillmere-parcels";
    expect(firstNumber(sql(layer, `SELECT count(*) AS n FROM "${layer}" WHERE ST_NumGeometries(geometry) > 1`))).toBeGreaterThanOrEqual(3);
    expect(firstNumber(sql(layer, `SELECT count(*) AS n FROM "${layer}" WHERE ST_NumGeometries(geometry) = 1 AND NumInteriorRings(geometry) > 0`))).toBeGreaterThanOrEqual(2);
    expect(firstNumber(sql(layer, `SELECT count(DISTINCT LU_CODE) AS n FROM "${layer}"`))).toBe(6);
    expect(firstNumber(sql(layer, `SELECT count(*) AS n FROM "${layer}" WHERE LAND_VAL <= 0 OR APN NOT LIKE 'OC-____-___'`))).toBe(0);
  });

  it("reads with Takeline's readParcelUpload: every row accepted, EPSG:32617 recognised, all five fields guessed", async () => {
    const up = await readParcelUpload({ fileName: "quillmere-parcels.zip", bytes: new Uint8Array(readFileSync(demoFile("quillmere-parcels.zip"))), kind: "parcels" });
    expect(up.rejected).toEqual([]);
    expect(up.sourceCrs.epsg).toBe(32617);
    expect(up.mapping).toEqual({ parcelId: "APN", owner: "OWNER_NM", address: "SITUS", landUse: "LU_CODE", landValue: "LAND_VAL" });
    const buildings = await readParcelUpload({ fileName: "quillmere-buildings.zip", bytes: new Uint8Array(readFileSync(demoFile("quillmere-buildings.zip"))), kind: "buildings" });
    expect(buildings.rejected).toEqual([]);
    const apns = new Set(up.features.map((f) => f.parcelId));
    expect(buildings.features.filter((b) => !apns.has(b.parcelId))).toEqual([]);
  });

  it("has no two parcels overlapping and every building inside its parcel (GEOS via shapely, on the committed GeoJSON)", () => {
    const parcels = JSON.parse(readFileSync(demoFile("quillmere-parcels.geojson"), "utf8")) as { features: { properties: { APN: string }; geometry: unknown }[] };
    const buildings = JSON.parse(readFileSync(demoFile("quillmere-buildings.geojson"), "utf8")) as typeof parcels;
    expect(parcels.features.length).toBeGreaterThanOrEqual(2500);
    const script = `
from shapely.strtree import STRtree
from shapely.ops import transform
# degrees to metres at the town's latitude (cos 39.93° ≈ 0.7668): plenty for a 0.5 m² overlap threshold
k = 111320.0
def m(g): return transform(lambda x, y, z=None: (x * k * 0.7668, y * k), shape(g))
P = [m(f["geometry"]) for f in data["parcels"]]
ids = {id(g): i for i, g in enumerate(P)}
tree = STRtree(P)
overlaps = 0
for i, g in enumerate(P):
    for q in tree.query(g):
        j = int(q) if hasattr(q, "__index__") else ids[id(q)]
        if j > i and g.intersection(P[j]).area > 0.5: overlaps += 1
by_apn = {f["properties"]["APN"]: P[i] for i, f in enumerate(data["parcels"])}
outside = sum(1 for b in data["buildings"] if not by_apn[b["properties"]["APN"]].buffer(0.05).contains(m(b["geometry"])))
print(json.dumps([overlaps, outside]))`;
    expect(shapely<[number, number]>(script, { parcels: parcels.features, buildings: buildings.features })).toEqual([0, 0]);
  });
});
