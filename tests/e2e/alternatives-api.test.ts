import { beforeAll, expect, test } from "vitest";
import { baseUrl } from "./support/browser";
import { get, postJson } from "./support/http";
import { bearer, newProject, postLayer, shapefileZip } from "./support/layer-uploads";

// Four invented 100 m × 100 m lots side by side along y = 0..100 (EPSG:32617, metres), and a
// straight 40 m corridor (20 + 20) along y = 50 across all of them: each takes exactly
// 100 × 40 = 4 000 m² and leaves two 3 000 m² pieces (closed-form rectangle areas).
const X0 = 560000;
const Y0 = 4420000;
const lot = (i: number) => `POLYGON ((${X0 + 100 * i} ${Y0}, ${X0 + 100 * (i + 1)} ${Y0}, ${X0 + 100 * (i + 1)} ${Y0 + 100}, ${X0 + 100 * i} ${Y0 + 100}, ${X0 + 100 * i} ${Y0}))`;
const ROWS = [0, 1, 2, 3].map((i) => ({ wkt: lot(i), APN: `QM-90${i}`, OWNER_NM: `Owner ${i}` }));
const straight = { units: "m", startStation: 0, points: [{ x: X0 - 50, y: Y0 + 50 }, { x: X0 + 450, y: Y0 + 50 }] };

type Impacts = { summary: Record<string, number>; parcels: { parcelId: string; takeArea: number; remainderArea: number; remainderPieces: number; classification: string }[] };

let planner: Record<string, string>;
let projectId: number;
beforeAll(async () => {
  // Write the zip before any request: a slow first GDAL run can outlast the server's keep-alive
  // and the next request would then write into a closed socket.
  const zip = shapefileZip(ROWS, "EPSG:32617");
  planner = await bearer("planner@demo.test");
  projectId = await newProject(planner, { name: "Quillmere Test Strip", units: "m", crs: "EPSG:32617" });
  expect((await postLayer(projectId, planner, zip, "strip.zip")).status).toBe(201);
});

async function createAlternative(body: Record<string, unknown>) {
  const res = await postJson(`/api/v1/projects/${projectId}/alternatives`, { name: "Strip line", alignment: straight, corridor: { left: 20, right: 20 }, ...body }, planner);
  expect(res.status).toBe(201);
  return (await res.json()) as { id: number; version: number; summary: Record<string, number> };
}

function put(path: string, body: unknown, headers: Record<string, string>) {
  return fetch(`${baseUrl()}${path}`, { method: "PUT", headers: { "content-type": "application/json", ...headers }, body: JSON.stringify(body) });
}

test("a straight 40 m corridor through four 100 m lots takes 4 000 m² from each and cuts each in two", async () => {
  const alt = await createAlternative({});
  expect(alt.version).toBe(1);
  const impacts = (await (await get(`/api/v1/alternatives/${alt.id}/impacts`, planner)).json()) as Impacts;
  expect(impacts.parcels.map((p) => p.parcelId).sort()).toEqual(["QM-900", "QM-901", "QM-902", "QM-903"]);
  for (const p of impacts.parcels) {
    expect(p.takeArea).toBeCloseTo(4000, 6);
    expect(p.remainderArea).toBeCloseTo(6000, 6);
    expect(p.remainderPieces).toBe(2);
    expect(p.classification).toBe("partial");
  }
  // The corridor is 500 m × 40 m; 100 m of it at each end lies in no parcel.
  expect(impacts.summary.corridorArea).toBeCloseTo(20000, 6);
  expect(impacts.summary.unparcelledArea).toBeCloseTo(4000, 6);
  expect(impacts.summary.takeArea).toBeCloseTo(16000, 6);
});

test("two saves from the same version: the first wins, the second gets 409 and changes nothing", async () => {
  const alt = await createAlternative({ name: "Conflict line" });
  const first = await put(`/api/v1/alternatives/${alt.id}`, { version: 1, corridor: { left: 25, right: 25 } }, planner);
  expect(first.status).toBe(200);
  expect(((await first.json()) as { version: number }).version).toBe(2);
  const second = await put(`/api/v1/alternatives/${alt.id}`, { version: 1, corridor: { left: 10, right: 10 } }, planner);
  expect(second.status).toBe(409);
  expect(await second.json()).toMatchObject({ error: { code: "conflict", details: { yourVersion: 1, currentVersion: 2 } } });
  const now = (await (await get(`/api/v1/alternatives/${alt.id}`, planner)).json()) as { version: number; corridor: unknown; summary: Record<string, number> };
  expect(now).toMatchObject({ version: 2, corridor: { left: 25, right: 25 } });
  expect(now.summary.corridorArea).toBeCloseTo(500 * 50, 6);
});

test("bad geometry is refused with the engine's message; other roles and non-members are refused", async () => {
  const tooTight = await postJson(
    `/api/v1/projects/${projectId}/alternatives`,
    { name: "Too tight", alignment: { ...straight, points: [straight.points[0], { x: X0 + 200, y: Y0 + 50, curve: { type: "simple", radius: 15 } }, { x: X0 + 200, y: Y0 + 400 }] }, corridor: { left: 20, right: 20 } },
    planner,
  );
  expect(tooTight.status).toBe(422);
  expect(((await tooTight.json()) as { error: { message: string } }).error.message).toMatch(/radius|offset/i);
  const analyst = await postJson(`/api/v1/projects/${projectId}/alternatives`, { name: "x", alignment: straight, corridor: { left: 20, right: 20 } }, await bearer("analyst@demo.test"));
  expect(analyst.status).toBe(403);
  const alt = await createAlternative({ name: "Members only" });
  expect((await get(`/api/v1/alternatives/${alt.id}`, await bearer("manager@demo.test"))).status).toBe(404);
  const wrongUnits = await postJson(`/api/v1/projects/${projectId}/alternatives`, { name: "Feet", alignment: { ...straight, units: "ft" }, corridor: { left: 20, right: 20 } }, planner);
  expect(wrongUnits.status).toBe(422);
});

test("the comparison lists every alternative and which parcels each one takes", async () => {
  const res = await get(`/api/v1/projects/${projectId}/comparison`, planner);
  expect(res.status).toBe(200);
  const body = (await res.json()) as { alternatives: { id: number; summary: { takeArea: number } }[]; matrix: { parcelId: string; takes: { alternativeId: number; takeArea: number }[] }[] };
  expect(body.alternatives.length).toBeGreaterThanOrEqual(3);
  const row = body.matrix.find((r) => r.parcelId === "QM-901")!;
  expect(row.takes.length).toBe(body.alternatives.length);
  for (const alt of body.alternatives) {
    const sum = body.matrix.reduce((s, r) => s + (r.takes.find((t) => t.alternativeId === alt.id)?.takeArea ?? 0), 0);
    expect(sum).toBeCloseTo(alt.summary.takeArea, 6);
  }
});

test("a radius sweep at a PI reports take and cost per step and the design speed's minimum radius", async () => {
  const curved = { ...straight, points: [straight.points[0], { x: X0 + 200, y: Y0 + 50, curve: { type: "simple", radius: 300 } }, { x: X0 + 420, y: Y0 + 200 }] };
  const alt = await createAlternative({ name: "Sweep line", alignment: curved, designSpeed: 80, speedUnit: "km/h", emaxPercent: 8 });
  const res = await postJson(`/api/v1/alternatives/${alt.id}/sweep`, { pointIndex: 1, vary: "radius", from: 150, to: 450, steps: 7 }, planner);
  expect(res.status).toBe(200);
  const body = (await res.json()) as { steps: { value: number; takeArea: number; checks: { status: string } }[]; minimumRadius: number };
  expect(body.steps.map((s) => s.value)).toEqual([150, 200, 250, 300, 350, 400, 450]);
  // AASHTO Green Book 2018 Table 3-7: 80 km/h at emax 8 % → Rmin 229 m.
  expect(body.minimumRadius).toBe(229);
  expect(body.steps[0]!.checks.status).toBe("warnings");
  expect(body.steps[6]!.checks.status).toBe("pass");
  for (const s of body.steps) expect(s.takeArea).toBeGreaterThan(0);
});

test("POST /api/v1/takes: a 90° curve's corridor area is L·(wL + wR) + ½(wR² − wL²)·Δ and the takes add up to it", async () => {
  // Closed form: tangents of 500 m either side of an arc R = 500 m, Δ = 90° left, so
  // L = 1000 + 250π; left 15 m, right 25 m (annular sector ½Δ(Ro² − Ri²) on the arc).
  const rect = (x0: number, y0: number, x1: number, y1: number) => [[[x0, y0], [x1, y0], [x1, y1], [x0, y1], [x0, y0]]];
  const parcels = {
    type: "FeatureCollection",
    features: [
      { type: "Feature", id: "WEST", properties: { owner: "Invented West Farm" }, geometry: { type: "Polygon", coordinates: rect(-100, -100, 500, 1200) } },
      { type: "Feature", properties: { parcelId: "EAST" }, geometry: { type: "Polygon", coordinates: rect(500, -100, 1200, 1200) } },
    ],
  };
  const alignment = { startStation: 0, points: [{ x: 0, y: 0 }, { x: 1000, y: 0, curve: { type: "simple", radius: 500 } }, { x: 1000, y: 1000 }] };
  const res = await postJson("/api/v1/takes?geometry=true", { units: "m", alignment, corridor: { left: 15, right: 25 }, parcels }, planner);
  expect(res.status).toBe(200);
  const body = (await res.json()) as { corridorArea: number; parcels: { parcelId: string; takeArea: number; owner: string | null }[]; totals: Record<string, number>; geometry?: { corridor: unknown; takes: unknown[] } };
  const length = 1000 + 250 * Math.PI;
  const exact = length * 40 + 0.5 * (25 ** 2 - 15 ** 2) * (Math.PI / 2);
  expect(Math.abs(body.corridorArea - exact) / exact).toBeLessThan(1e-9);
  const west = body.parcels.find((p) => p.parcelId === "WEST")!;
  expect(west.takeArea).toBeCloseTo(500 * 40, 6);
  expect(west.owner).toBe("Invented West Farm");
  expect(body.parcels.find((p) => p.parcelId === "EAST")!.takeArea).toBeCloseTo(exact - 20000, 4);
  expect(body.totals.unparcelledArea).toBeCloseTo(0, 4);
  expect(body.totals).toMatchObject({ parcelsAffected: 2, partialTakes: 2, fullTakes: 0 });
  expect(body.geometry?.takes.length).toBe(2);
  const bad = await postJson("/api/v1/takes", { units: "m", alignment, corridor: { left: 15, right: 25 }, parcels: { type: "FeatureCollection", features: [{ type: "Feature", properties: {}, geometry: { type: "Point", coordinates: [0, 0] } }] } }, planner);
  expect(bad.status).toBe(422);
});
