import { beforeAll, expect, test } from "vitest";
import { postJson } from "./support/http";

let auth: Record<string, string>;
beforeAll(async () => {
  const res = await postJson("/api/v1/tokens", { email: "analyst@demo.test", password: "takeline-demo" });
  auth = { authorization: `Bearer ${((await res.json()) as { token: string }).token}` };
});

test("simple curve from a degree of curve: Mahun OASL Horizontal Curves Set 2, problem 1", async () => {
  // D = 7°09'43.1" (arc, 100 ft), Δ = 45°49'45", PI 54+23.15 → R 800.00, T 338.17, L 639.90, LC 622.97, PC 50+84.98, PT 57+24.88.
  const res = await postJson("/api/v1/curves/simple", { units: "ft", degree: "7-09-43.1", definition: "arc", delta: "45°49'45\"", piStation: "54+23.15" }, auth);
  expect(res.status).toBe(200);
  const c = (await res.json()) as Record<string, number> & { stations: { PC: number; PT: number } };
  expect(c.radius).toBeCloseTo(800.0, 2);
  expect(c.tangent).toBeCloseTo(338.17, 2);
  expect(c.length).toBeCloseTo(639.9, 1);
  expect(c.longChord).toBeCloseTo(622.97, 2);
  expect(c.external).toBeCloseTo(68.54, 2);
  expect(c.middleOrdinate).toBeCloseTo(63.13, 2);
  expect(c.stations.PC).toBeCloseTo(5084.98, 1);
  expect(c.stations.PT).toBeCloseTo(5724.88, 1);
});

test("compound curve from R1, R2, Δ1, Δ2 with a PC station (REFERENCES check value 6; closed form of Schofield & Breach §10.3)", async () => {
  const res = await postJson("/api/v1/curves/compound", { units: "m", given: { radius1: 400, delta1: 36, radius2: 300, delta2: 50 }, pcStation: "4+509.000" }, auth);
  expect(res.status).toBe(200);
  const { solutions } = (await res.json()) as { solutions: { tangentPC: number; tangentPT: number; stations: { PC: number; PCC: number; PT: number } }[] };
  expect(solutions).toHaveLength(1);
  expect(solutions[0]!.tangentPC).toBeCloseTo(337.198, 3);
  expect(solutions[0]!.tangentPT).toBeCloseTo(298.899, 3);
  expect(solutions[0]!.stations.PCC).toBeCloseTo(4760.327, 3);
  expect(solutions[0]!.stations.PT).toBeCloseTo(5022.127, 3);
});

test("too few knowns, contradictory knowns and non-angles are 422 with a message, never a number", async () => {
  const few = await postJson("/api/v1/curves/compound", { units: "m", given: { radius1: 400, delta: 60 } }, auth);
  expect(few.status).toBe(422);
  expect(((await few.json()) as { error: { message: string } }).error.message).toMatch(/need|missing/i);
  const notAngle = await postJson("/api/v1/curves/simple", { units: "m", radius: 300, delta: "north-ish" }, auth);
  expect(notAngle.status).toBe(422);
  const negative = await postJson("/api/v1/curves/simple", { units: "m", radius: -5, delta: 30 }, auth);
  expect(negative.status).toBe(422);
  const flat = await postJson("/api/v1/curves/simple", { units: "m", radius: 300, delta: 180 }, auth);
  expect(flat.status).toBe(422);
  const chordInMetres = await postJson("/api/v1/curves/simple", { units: "m", degree: 5, definition: "chord", delta: 30 }, auth);
  expect(chordInMetres.status).toBe(422);
});
