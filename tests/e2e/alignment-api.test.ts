import { beforeAll, expect, test } from "vitest";
import { postJson } from "./support/http";

let auth: Record<string, string>;
beforeAll(async () => {
  const res = await postJson("/api/v1/tokens", { email: "planner@demo.test", password: "takeline-demo" });
  auth = { authorization: `Bearer ${((await res.json()) as { token: string }).token}` };
});

type Geometry = {
  length: number;
  stations: { label: string; station: number; x: number; y: number }[];
  elements: { type: string; length: number }[];
  centerline: { type: string; coordinates: [number, number][] };
  checks: { id: string; severity: string; source: string }[];
};

test("a 90° left turn with R = 500 m: T = R, L = πR/2, stations add up (closed form, T = R tan(Δ/2))", async () => {
  const alignment = { units: "m", startStation: "1+000.000", points: [{ x: 0, y: 0 }, { x: 1000, y: 0, curve: { type: "simple", radius: 500 } }, { x: 1000, y: 1000 }] };
  const res = await postJson("/api/v1/alignments/geometry", { alignment, design: { designSpeed: 80, speedUnit: "km/h", emaxPercent: 6 } }, auth);
  expect(res.status).toBe(200);
  const g = (await res.json()) as Geometry;
  const L = (Math.PI / 2) * 500;
  expect(g.length).toBeCloseTo(500 + L + 500, 9);
  const pc = g.stations.find((s) => s.label === "PC")!;
  const pt = g.stations.find((s) => s.label === "PT")!;
  expect(pc.station).toBeCloseTo(1500, 9);
  expect(pc.x).toBeCloseTo(500, 9);
  expect(pc.y).toBeCloseTo(0, 9);
  expect(pt.station).toBeCloseTo(1500 + L, 9);
  expect(pt.x).toBeCloseTo(1000, 9);
  expect(pt.y).toBeCloseTo(500, 9);
  expect(g.elements.map((e) => e.type)).toEqual(["tangent", "arc", "tangent"]);
  expect(g.centerline.type).toBe("LineString");
  expect(g.centerline.coordinates.at(0)).toEqual([0, 0]);
  expect(g.centerline.coordinates.at(-1)![1]).toBeCloseTo(1000, 9);
  // AASHTO 2018 Table 3-7: 80 km/h at emax 6 % needs R ≥ 252 m, so R 500 m passes and names its source.
  const radiusCheck = g.checks.find((c) => c.id.startsWith("min-radius"))!;
  expect(radiusCheck.severity).toBe("ok");
  expect(radiusCheck.source).toMatch(/AASHTO/);
});

test("a curve whose tangents overrun the neighbouring PI is a 422 naming the PI, not a wrong alignment", async () => {
  const alignment = { units: "m", startStation: 0, points: [{ x: 0, y: 0 }, { x: 1000, y: 0, curve: { type: "simple", radius: 2000 } }, { x: 1000, y: 1000 }] };
  const res = await postJson("/api/v1/alignments/geometry", { alignment }, auth);
  expect(res.status).toBe(422);
  const body = (await res.json()) as { error: { code: string; message: string } };
  expect(body.error.code).toBe("tangent_overrun");
  expect(body.error.message).toMatch(/tangent/i);
});

test("a malformed alignment is a 422 with field details", async () => {
  const res = await postJson("/api/v1/alignments/geometry", { alignment: { units: "yards", points: [{ x: 0 }] } }, auth);
  expect(res.status).toBe(422);
  const body = (await res.json()) as { error: { details: { path: string }[] } };
  expect(body.error.details.map((d) => d.path)).toEqual(expect.arrayContaining(["alignment.units"]));
});

test("a failed radius check can be accepted with a reason, and comes back marked accepted", async () => {
  // AASHTO 2018 Table 3-7: 100 km/h at emax 6 % needs R ≥ 437 m; R 300 m fails.
  const alignment = { units: "m", startStation: 0, points: [{ x: 0, y: 0 }, { x: 1000, y: 0, curve: { type: "simple", radius: 300 } }, { x: 1500, y: 500 }] };
  const first = (await (await postJson("/api/v1/alignments/geometry", { alignment, design: { designSpeed: 100, speedUnit: "km/h", emaxPercent: 6 } }, auth)).json()) as Geometry;
  const failed = first.checks.find((c) => c.severity === "warning" && c.id.startsWith("min-radius"))!;
  expect(failed).toBeDefined();
  const res = await postJson(
    "/api/v1/alignments/geometry",
    { alignment, design: { designSpeed: 100, speedUnit: "km/h", emaxPercent: 6 }, acceptedChecks: [{ id: failed.id, reason: "Posted 70 km/h zone through the river crossing" }] },
    auth,
  );
  const body = (await res.json()) as { checks: { id: string; accepted?: { reason: string } }[]; staleAcceptances: unknown[] };
  expect(body.checks.find((c) => c.id === failed.id)?.accepted?.reason).toMatch(/70 km\/h/);
  expect(body.staleAcceptances).toEqual([]);
});
