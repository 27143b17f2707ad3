import { execFileSync } from "node:child_process";
import { afterAll, beforeAll, expect, test } from "vitest";
import type { Browser } from "playwright-core";
import { launchBrowser, newPage, signIn } from "./support/browser";
import { get } from "./support/http";
import { bearer, newProject, postLayer, shapefileZip } from "./support/layer-uploads";

type Hit = { id: number; bbox: number[]; properties: { parcelId: string; owner: string; address: string } };

/** Row 2,999 of the shipped demo fabric as GDAL reads it, reprojected to WGS84 by ogr2ogr: the reference parcel. */
function gdalDemoParcel(): { apn: string; owner: string; address: string; bbox: number[] } {
  const out = execFileSync("ogr2ogr", ["-f", "GeoJSON", "/vsistdout/", "-t_srs", "EPSG:4326", "-lco", "COORDINATE_PRECISION=10", "-fid", "2999", "/vsizip/data/demo/quillmere-parcels.zip", "quillmere-parcels"], { encoding: "utf8" });
  const f = (JSON.parse(out) as { features: { properties: Record<string, string>; geometry: { coordinates: unknown } }[] }).features[0]!;
  const pts = (f.geometry.coordinates as unknown[]).flat(3) as number[];
  const xs = pts.filter((_, i) => i % 2 === 0), ys = pts.filter((_, i) => i % 2 === 1);
  return { apn: f.properties.APN!, owner: f.properties.OWNER_NM!, address: f.properties.SITUS!, bbox: [Math.min(...xs), Math.min(...ys), Math.max(...xs), Math.max(...ys)] };
}

let manager: Record<string, string>;
let layerId: number;
let projectId: number;
beforeAll(async () => {
  manager = await bearer("manager@demo.test");
  const projects = ((await (await get("/api/v1/projects", manager)).json()) as { projects: { id: number; name: string }[] }).projects;
  projectId = projects.find((p) => p.name === "Quillmere Eastern Bypass")!.id;
  const layers = ((await (await get(`/api/v1/projects/${projectId}/layers`, manager)).json()) as { layers: { id: number; kind: string; status: string }[] }).layers;
  layerId = layers.find((l) => l.kind === "parcels" && l.status === "active")!.id;
});

test("?q= searches the whole demo layer by owner, address or ID, and the hit's bbox is GDAL's within 1e-7°", async () => {
  const ref = gdalDemoParcel();
  for (const q of [ref.owner, ref.address.toUpperCase(), ref.apn.toLowerCase()]) {
    const res = await get(`/api/v1/layers/${layerId}/features?crs=wgs84&q=${encodeURIComponent(q)}`, manager);
    expect(res.status).toBe(200);
    const hits = ((await res.json()) as { features: Hit[] }).features;
    const hit = hits.find((h) => h.properties.parcelId === ref.apn)!;
    expect(hit.properties).toMatchObject({ owner: ref.owner, address: ref.address });
    hit.bbox.forEach((v, i) => expect(Math.abs(v - ref.bbox[i]!)).toBeLessThan(1e-7));
  }
  // An exact ID comes first even when others contain it.
  const byId = ((await (await get(`/api/v1/layers/${layerId}/features?crs=wgs84&q=${ref.apn}&limit=5`, manager)).json()) as { features: Hit[] }).features;
  expect(byId[0]!.properties.parcelId).toBe(ref.apn);
});

test("a search needs 2 characters, a limit of 1-50, and membership of the layer's project", async () => {
  const short = await get(`/api/v1/layers/${layerId}/features?q=O`, manager);
  expect(short.status).toBe(422);
  expect(((await short.json()) as { error: { details: { path: string }[] } }).error.details.map((d) => d.path)).toEqual(["q"]);
  expect((await get(`/api/v1/layers/${layerId}/features?q=OC&limit=51`, manager)).status).toBe(422);
  // A project the manager is not a member of: its layer's search is 404, as its features are.
  const planner = await bearer("planner@demo.test");
  const other = await newProject(planner, { name: "Quillmere search elsewhere", units: "m" });
  const rows = [{ wkt: "POLYGON ((14.51 47.82, 14.511 47.82, 14.511 47.8207, 14.51 47.8207, 14.51 47.82))", APN: "QM-901", OWNER_NM: "Ysolde Farrowmere" }];
  const created = (await (await postLayer(other, planner, shapefileZip(rows, "EPSG:4326"), "other.zip")).json()) as { id: number };
  expect((await get(`/api/v1/layers/${created.id}/features?q=Farrowmere`, planner)).status).toBe(200);
  expect((await get(`/api/v1/layers/${created.id}/features?q=Farrowmere`, manager)).status).toBe(404);
  // agent@demo.test is a member of the demo project, but agents may not read layers.
  expect((await get(`/api/v1/layers/${layerId}/features?q=OC`, await bearer("agent@demo.test"))).status).toBe(403);
});

let browser: Browser;
beforeAll(async () => {
  browser = await launchBrowser();
});
afterAll(async () => {
  await browser?.close();
});

test("the map's search box finds a parcel anywhere in the layer and opens its card", async () => {
  const ref = gdalDemoParcel();
  const page = await newPage(browser);
  await signIn(page, "manager@demo.test", "takeline-demo");
  await page.goto(`/projects/${projectId}`);
  await page.waitForFunction(() => (window as unknown as { __takelineMapReady?: boolean }).__takelineMapReady === true, null, { timeout: 30_000 });
  await page.getByLabel("Find a parcel by ID, owner or address").fill(ref.address);
  await page.getByRole("button", { name: "Find" }).click();
  await page.getByRole("button", { name: new RegExp(ref.apn) }).click();
  const card = page.getByTestId("parcel-card");
  await expect(card.textContent()).resolves.toContain(ref.apn);
  await expect(card.textContent()).resolves.toContain(ref.owner);
  await page.context().close();
});
