import { readFileSync } from "node:fs";
import { execFileSync } from "node:child_process";
import { afterAll, beforeAll, expect, test } from "vitest";
import { shapely } from "~/fabric/test-support/reference-tools.server";
import { launchBrowser, newPage, signIn } from "./support/browser";
import { bearer, layerList, newProject, postLayer, shapefileZip } from "./support/layer-uploads";
import { startRestartableServer, type RestartableServer } from "./support/restartable-server";

// Three invented 100 m lots of Quillmere in WGS 84 / UTM zone 17N (EPSG:32617): QM-952 starts 10 m
// inside QM-951, so the two overlap by a 10 m × 100 m strip, 1,000 m² (closed form); QM-953 stands apart.
const X0 = 563_000;
const Y0 = 4_417_000;
const square = (x: number) => `POLYGON ((${x} ${Y0}, ${x + 100} ${Y0}, ${x + 100} ${Y0 + 100}, ${x} ${Y0 + 100}, ${x} ${Y0}))`;
const ROWS = [X0, X0 + 90, X0 + 300].map((x, i) => ({ wkt: square(x), APN: `QM-95${i + 1}`, OWNER_NM: `Owner ${i + 1}` }));
const FIELDS = JSON.stringify({ parcelId: "APN", owner: "OWNER_NM" });

type Warning = { kind: string; rows: number[]; parcelIds: (string | null)[]; reason: string; area?: number };
type ApiLayer = { id: number; warnings: Warning[] | null; warningCount: number | null };

/** GEOS (shapely) area of the intersection of the first two lots, read from the WKT GDAL was given. */
function geosOverlapArea(): number {
  return shapely<number>("from shapely import wkt\na, b = (wkt.loads(w) for w in data)\nprint(json.dumps(a.intersection(b).area))", ROWS.slice(0, 2).map((r) => r.wkt));
}

function expectOverlapListed(layer: ApiLayer): void {
  const overlaps = (layer.warnings ?? []).filter((w) => w.kind === "overlap");
  expect(overlaps.map((w) => [w.rows, w.parcelIds])).toEqual([[[1, 2], ["QM-951", "QM-952"]]]);
  expect(Math.abs(overlaps[0]!.area! - 1000)).toBeLessThan(0.01);
  expect(Math.abs(overlaps[0]!.area! - geosOverlapArea())).toBeLessThan(0.01);
  expect(layer.warningCount).toBe(layer.warnings!.length);
}

let own: RestartableServer | undefined;
beforeAll(async () => {
  own = await startRestartableServer();
});
afterAll(async () => {
  await own?.dispose();
});

test("an upload's overlap warning is listed by the layers API afterwards, and again after the server restarts (it is stored)", async () => {
  const zip = shapefileZip(ROWS, "EPSG:32617");
  const call = (path: string, init: RequestInit = {}) => fetch(`${own!.baseUrl}${path}`, init);
  const tokenRes = await call("/api/v1/tokens", { method: "POST", headers: { "content-type": "application/json" }, body: JSON.stringify({ email: "planner@demo.test", password: "takeline-demo", label: "restart" }) });
  const auth = { authorization: `Bearer ${((await tokenRes.json()) as { token: string }).token}` };
  const created = await call("/api/v1/projects", { method: "POST", headers: { ...auth, "content-type": "application/json" }, body: JSON.stringify({ name: "Quillmere Overlaps", units: "m", crs: "EPSG:32617" }) });
  const projectId = ((await created.json()) as { id: number }).id;
  const form = new FormData();
  for (const [k, v] of Object.entries({ name: "Overlapping lots", kind: "parcels", fields: FIELDS })) form.set(k, v);
  form.set("file", new Blob([new Uint8Array(zip)]), "lots.zip");
  const upload = await call(`/api/v1/projects/${projectId}/layers`, { method: "POST", headers: auth, body: form });
  expect(upload.status).toBe(201);
  const layerId = ((await upload.json()) as { id: number }).id;
  const listed = async () => {
    const res = await call(`/api/v1/projects/${projectId}/layers`, { headers: auth });
    expect(res.status).toBe(200);
    return ((await res.json()) as { layers: ApiLayer[] }).layers.find((l) => l.id === layerId)!;
  };
  const before = await listed();
  expectOverlapListed(before);
  await own!.restart();
  const after = await listed();
  expectOverlapListed(after);
  expect(after.warnings).toEqual(before.warnings);
}, 120_000);

test("the project page shows the layer's warning count, lists the overlap in a disclosure and downloads the list as CSV", async () => {
  const zip = shapefileZip(ROWS, "EPSG:32617");
  const planner = await bearer("planner@demo.test");
  const projectId = await newProject(planner, { name: "Quillmere Overlap Page", units: "m", crs: "EPSG:32617" });
  const upload = await postLayer(projectId, planner, zip, "lots.zip", { name: "Overlapping lots", fields: FIELDS });
  expect(upload.status).toBe(201);
  const [layer] = (await layerList(projectId, planner)) as unknown as ApiLayer[];
  const browser = await launchBrowser();
  try {
    const page = await newPage(browser);
    await signIn(page, "planner@demo.test", "takeline-demo");
    await page.goto(`/projects/${projectId}`);
    const count = layer!.warningCount!;
    await expect.poll(() => page.getByTestId(`layer-warning-count-${layer!.id}`).textContent()).toBe(`${count} warning${count === 1 ? "" : "s"}`);
    const disclosure = page.getByTestId(`layer-warnings-${layer!.id}`);
    await disclosure.locator("summary").click();
    await expect.poll(() => disclosure.getByRole("row").filter({ hasText: "QM-951, QM-952" }).textContent()).toMatch(/overlap\s*1, 2\s*QM-951, QM-952\s*the two parcels overlap by 1000\.00 m²/);
    const [download] = await Promise.all([page.waitForEvent("download"), disclosure.getByRole("button", { name: "Download as CSV" }).click()]);
    expect(download.suggestedFilename()).toBe(`layer-${layer!.id}-warnings.csv`);
    // Python's csv module reads the file back: one line per warning the API lists, the overlap with both rows and IDs.
    const script = "import sys, csv, json\nprint(json.dumps(list(csv.DictReader(open(sys.argv[1], newline='')))))";
    const lines = JSON.parse(execFileSync("python3", ["-c", script, await download.path()], { encoding: "utf8" })) as Record<string, string>[];
    expect(lines).toHaveLength(count);
    expect(lines.find((l) => l.kind === "overlap")).toMatchObject({ row: "1", parcel_id: "QM-951", other_row: "2", other_parcel_id: "QM-952" });
    expect(Math.abs(Number(lines.find((l) => l.kind === "overlap")!.overlap_area) - 1000)).toBeLessThan(0.01);
    expect(readFileSync(await download.path(), "utf8").startsWith("kind,row,parcel_id,other_row,other_parcel_id,overlap_area,reason\r\n")).toBe(true);
  } finally {
    await browser.close();
  }
});
