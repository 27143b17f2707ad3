import { beforeAll, expect, test } from "vitest";
import { baseUrl } from "./support/browser";
import { get, postJson, sessionCookie } from "./support/http";
import { bearer, newProject, postLayer, shapefileZip } from "./support/layer-uploads";

// Invented Quillmere parcels (Ostrand County), NAD83 / California zone 5 (ftUS).
const ROWS = [{ wkt: "POLYGON ((6487000 1840000, 6487090 1840000, 6487090 1840060, 6487000 1840060, 6487000 1840000))", APN: "QM-401", OWNER_NM: "Tamsin Orrowby" }];

let planner: Record<string, string>;
beforeAll(async () => {
  planner = await bearer("planner@demo.test");
});

/** Adds a member through the project page's own form, as the planner would. */
async function addMember(projectId: number, email: string, role: string) {
  const res = await fetch(`${baseUrl()}/projects/${projectId}`, {
    method: "POST",
    headers: { cookie: await sessionCookie("planner@demo.test") },
    body: new URLSearchParams({ intent: "add-member", email, role }),
    redirect: "manual",
  });
  expect(res.status).toBe(200);
}

test("POST /api/v1/projects: planner 201 with the fields; the working CRS must be a shipped projected EPSG code", async () => {
  const res = await postJson("/api/v1/projects", { name: "Quillmere Ring Road", units: "usft", crs: "epsg:2229", scaleFactor: 0.99995 }, planner);
  expect(res.status).toBe(201);
  expect(await res.json()).toMatchObject({ id: expect.any(Number), name: "Quillmere Ring Road", description: "", units: "usft", crs: "EPSG:2229", scaleFactor: 0.99995 });
  // EPSG:4326 is geographic (degrees), not projected: EPSG registry, "WGS 84" is a geographic 2D CRS.
  for (const crs of ["EPSG:4326", "EPSG:999999", "UTM 11"]) {
    const bad = await postJson("/api/v1/projects", { name: "Bad CRS", units: "m", crs }, planner);
    expect(bad.status).toBe(422);
    expect(((await bad.json()) as { error: { details: { path: string }[] } }).error.details.map((d) => d.path)).toEqual(["crs"]);
  }
  const badUnits = await postJson("/api/v1/projects", { name: "Bad units", units: "chains" }, planner);
  expect(badUnits.status).toBe(422);
  const analyst = await postJson("/api/v1/projects", { name: "Not mine", units: "m" }, await bearer("analyst@demo.test"));
  expect(analyst.status).toBe(403);
  expect(await analyst.json()).toMatchObject({ error: { code: "forbidden", details: { neededRoles: ["planner"] } } });
});

test("members see a project, non-members get 404 everywhere, admins see all", async () => {
  const projectId = await newProject(planner, { name: "Quillmere Mill Spur", units: "m" });
  const layer = (await (await postLayer(projectId, planner, shapefileZip(ROWS, "EPSG:2229"), "q.zip")).json()) as { id: number };
  const listed = (await (await get("/api/v1/projects", planner)).json()) as { projects: { id: number }[] };
  expect(listed.projects.map((p) => p.id)).toContain(projectId);
  const manager = await bearer("manager@demo.test");
  expect(((await (await get("/api/v1/projects", manager)).json()) as { projects: { id: number }[] }).projects.map((p) => p.id)).not.toContain(projectId);
  for (const path of [`/api/v1/projects/${projectId}`, `/api/v1/projects/${projectId}/layers`, `/api/v1/layers/${layer.id}/features`]) {
    const res = await get(path, manager);
    expect(res.status).toBe(404);
    expect(((await res.json()) as { error: { code: string } }).error.code).toBe("not_found");
  }
  expect((await postLayer(projectId, await bearer("planner@demo.test"), shapefileZip(ROWS, "EPSG:2229"), "q.zip")).status).toBe(201);
  const admin = await bearer("admin@demo.test");
  expect((await get(`/api/v1/projects/${projectId}`, admin)).status).toBe(200);
  expect(((await (await get("/api/v1/projects", admin)).json()) as { projects: { id: number }[] }).projects.map((p) => p.id)).toContain(projectId);
  expect((await get("/api/v1/projects/not-a-number", planner)).status).toBe(404);
});

test("analyst and manager members may read layers and features but not upload; agents are refused", async () => {
  const projectId = await newProject(planner, { name: "Quillmere Water Lane", units: "m" });
  await addMember(projectId, "analyst@demo.test", "analyst");
  await addMember(projectId, "manager@demo.test", "manager");
  const layer = (await (await postLayer(projectId, planner, shapefileZip(ROWS, "EPSG:2229"), "q.zip")).json()) as { id: number };
  for (const email of ["analyst@demo.test", "manager@demo.test"]) {
    const auth = await bearer(email);
    expect((await get(`/api/v1/projects/${projectId}/layers`, auth)).status).toBe(200);
    const fc = (await (await get(`/api/v1/layers/${layer.id}/features?crs=wgs84`, auth)).json()) as { features: { properties: { parcelId: string } }[] };
    expect(fc.features.map((f) => f.properties.parcelId)).toEqual(["QM-401"]);
    const upload = await postLayer(projectId, auth, shapefileZip(ROWS, "EPSG:2229"), "q.zip");
    expect(upload.status).toBe(403);
    expect(await upload.json()).toMatchObject({ error: { code: "forbidden", details: { neededRoles: ["planner"] } } });
    expect((await postLayer(projectId, auth, shapefileZip(ROWS, "EPSG:2229"), "q.zip", {}, true)).status).toBe(403);
  }
  const agent = await bearer("agent@demo.test");
  expect((await get(`/api/v1/projects/${projectId}/layers`, agent)).status).toBe(403);
  expect((await get(`/api/v1/projects/${projectId}/layers`)).status).toBe(401);
});
