import { beforeAll, expect, test } from "vitest";
import { inviteAndAccept } from "./support/accounts";
import { baseUrl } from "./support/browser";
import { get, postJson } from "./support/http";
import { bearer, newProject, postLayer, shapefileZip } from "./support/layer-uploads";

// Four invented 100 m × 100 m lots side by side (EPSG:32617, metres) and a straight 40 m corridor
// along their middle: every lot has a partial take of 4,000 m² (closed form), so each is charged
// the per-parcel cost once.
const X0 = 564_000;
const Y0 = 4_416_000;
const lot = (i: number) => `POLYGON ((${X0 + 100 * i} ${Y0}, ${X0 + 100 * (i + 1)} ${Y0}, ${X0 + 100 * (i + 1)} ${Y0 + 100}, ${X0 + 100 * i} ${Y0 + 100}, ${X0 + 100 * i} ${Y0}))`;
const ROWS = [0, 1, 2, 3].map((i) => ({ wkt: lot(i), APN: `QM-96${i}`, OWNER_NM: `Owner ${i}` }));
const straight = { units: "m", startStation: 0, points: [{ x: X0 - 50, y: Y0 + 50 }, { x: X0 + 450, y: Y0 + 50 }] };

type Rules = Record<string, number>;
type ProjectJson = { id: number; takeRules: Rules; resolvedTakeRules: Rules };
type Impacts = { summary: { estimatedCost: number }; parcels: { parcelId: string; takeArea: number; estimatedCost: number; cost: Record<string, number> }[] };

let planner: Record<string, string>;
let projectId: number;
let alternativeId: number;
beforeAll(async () => {
  const zip = shapefileZip(ROWS, "EPSG:32617");
  planner = await bearer("planner@demo.test");
  projectId = await newProject(planner, { name: "Quillmere Rules Strip", units: "m", crs: "EPSG:32617" });
  expect((await postLayer(projectId, planner, zip, "strip.zip")).status).toBe(201);
  const alt = await postJson(`/api/v1/projects/${projectId}/alternatives`, { name: "Rules line", alignment: straight, corridor: { left: 20, right: 20 } }, planner);
  expect(alt.status).toBe(201);
  alternativeId = ((await alt.json()) as { id: number }).id;
});

function patch(body: unknown, auth: Record<string, string>, id = projectId) {
  return fetch(`${baseUrl()}/api/v1/projects/${id}`, { method: "PATCH", headers: { "content-type": "application/json", ...auth }, body: JSON.stringify(body) });
}

async function impacts(): Promise<Impacts> {
  const res = await get(`/api/v1/alternatives/${alternativeId}/impacts`, planner);
  expect(res.status).toBe(200);
  return (await res.json()) as Impacts;
}

const byId = (i: Impacts) => new Map(i.parcels.map((p) => [p.parcelId, p]));

test("a new project shows no rules of its own and the defaults in effect", async () => {
  const project = (await (await get(`/api/v1/projects/${projectId}`, planner)).json()) as ProjectJson;
  expect(project.takeRules).toEqual({});
  expect(Object.keys(project.resolvedTakeRules).sort()).toEqual(["adminCostPerParcel", "buildingValue", "contingencyPercent", "easementRatePerArea", "landValuePerArea", "proximityDistance", "remnantMinArea", "remnantMinFraction", "severancePercent"]);
});

test("raising the per-parcel cost raises each acquired parcel's estimate by exactly the difference × (1 + contingency %), and null restores it", async () => {
  const before = await impacts();
  const start = (await (await get(`/api/v1/projects/${projectId}`, planner)).json()) as ProjectJson;
  const raised = start.resolvedTakeRules.adminCostPerParcel! + 2_500;
  const res = await patch({ takeRules: { adminCostPerParcel: raised } }, planner);
  expect(res.status).toBe(200);
  const project = (await res.json()) as ProjectJson;
  expect(project.takeRules).toEqual({ adminCostPerParcel: raised });
  expect(project.resolvedTakeRules).toEqual({ ...start.resolvedTakeRules, adminCostPerParcel: raised });
  const after = await impacts();
  // app/geometry/take-costs.ts: administrative is charged once per parcel with a take; contingency
  // is a percentage of the sum of all lines, so the total moves by Δ × (1 + contingency / 100).
  const perParcel = 2_500 * (1 + project.resolvedTakeRules.contingencyPercent! / 100);
  const old = byId(before);
  expect(after.parcels).toHaveLength(4);
  for (const p of after.parcels) {
    expect(p.takeArea).toBeCloseTo(4000, 6);
    expect(p.cost.administrative).toBe(raised);
    expect(p.cost.land).toBe(old.get(p.parcelId)!.cost.land);
    expect(p.estimatedCost - old.get(p.parcelId)!.estimatedCost).toBeCloseTo(perParcel, 6);
  }
  expect(after.summary.estimatedCost - before.summary.estimatedCost).toBeCloseTo(4 * perParcel, 6);
  const cleared = (await (await patch({ takeRules: { adminCostPerParcel: null } }, planner)).json()) as ProjectJson;
  expect(cleared.takeRules).toEqual({});
  expect(cleared.resolvedTakeRules).toEqual(start.resolvedTakeRules);
  expect((await impacts()).summary.estimatedCost).toBeCloseTo(before.summary.estimatedCost, 6);
});

test("rules merge key by key across saves; a key left out is kept", async () => {
  await patch({ takeRules: { contingencyPercent: 25 } }, planner);
  const res = await patch({ takeRules: { severancePercent: 10 } }, planner);
  expect(((await res.json()) as ProjectJson).takeRules).toEqual({ contingencyPercent: 25, severancePercent: 10 });
  const read = (await (await get(`/api/v1/projects/${projectId}`, planner)).json()) as ProjectJson;
  expect(read.takeRules).toEqual({ contingencyPercent: 25, severancePercent: 10 });
  await patch({ takeRules: { contingencyPercent: null, severancePercent: null } }, planner);
});

test("unknown keys, negative values, fractions over 1 and a missing takeRules are 422 in the error envelope; nothing changes", async () => {
  for (const [body, path] of [
    [{ takeRules: { adminCost: 5 } }, "takeRules"],
    [{ takeRules: { landValuePerArea: -1 } }, "takeRules.landValuePerArea"],
    [{ takeRules: { remnantMinFraction: 1.2 } }, "takeRules.remnantMinFraction"],
    [{ takeRules: { buildingValue: "lots" } }, "takeRules.buildingValue"],
    [{}, "takeRules"],
  ] as const) {
    const res = await patch(body, planner);
    expect(res.status).toBe(422);
    expect(await res.json()).toMatchObject({ error: { code: "unprocessable", message: expect.any(String), details: [expect.objectContaining({ path })] } });
  }
  const read = (await (await get(`/api/v1/projects/${projectId}`, planner)).json()) as ProjectJson;
  expect(read.takeRules).toEqual({});
});

test("only planners and admins may change rules: other roles 403, a planner who is not a member 404, no token 401, POST 405", async () => {
  for (const email of ["analyst@demo.test", "manager@demo.test"]) {
    const res = await patch({ takeRules: { contingencyPercent: 1 } }, await bearer(email));
    expect(res.status).toBe(403);
    expect(await res.json()).toMatchObject({ error: { code: "forbidden", details: { neededRoles: ["planner", "admin"] } } });
  }
  await inviteAndAccept("rules-outsider@demo.test", "planner", "rules-outsider-pw-1");
  const outsider = await fetch(`${baseUrl()}/api/v1/tokens`, { method: "POST", headers: { "content-type": "application/json" }, body: JSON.stringify({ email: "rules-outsider@demo.test", password: "rules-outsider-pw-1" }) });
  const outsiderAuth = { authorization: `Bearer ${((await outsider.json()) as { token: string }).token}` };
  expect((await patch({ takeRules: { contingencyPercent: 1 } }, outsiderAuth)).status).toBe(404);
  expect((await patch({ takeRules: { contingencyPercent: 1 } }, {})).status).toBe(401);
  const post = await postJson(`/api/v1/projects/${projectId}`, { takeRules: {} }, planner);
  expect(post.status).toBe(405);
  expect(post.headers.get("allow")).toBe("GET, PATCH");
  expect(((await (await get(`/api/v1/projects/${projectId}`, planner)).json()) as ProjectJson).takeRules).toEqual({});
  // An admin sees every project, so may change its rules.
  const admin = await patch({ takeRules: { contingencyPercent: 30 } }, await bearer("admin@demo.test"));
  expect(admin.status).toBe(200);
  expect(((await admin.json()) as ProjectJson).takeRules).toEqual({ contingencyPercent: 30 });
});
