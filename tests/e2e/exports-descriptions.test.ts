import { beforeAll, expect, test } from "vitest";
import { get } from "./support/http";
import { bearer } from "./support/layer-uploads";
import { demoProject, readImpactsJson, walkCourses, type ApiDescription } from "./exports-support";

let demo: Awaited<ReturnType<typeof demoProject>>;
beforeAll(async () => {
  demo = await demoProject();
});

const descriptionPath = (alternativeId: number, parcelId: string) => `/api/v1/alternatives/${alternativeId}/parcels/${encodeURIComponent(parcelId)}/description`;

test("every take of the three demo alternatives: the courses close within 1 mm and enclose the take area of the impacts within 0.01 m²", async () => {
  let described = 0;
  let arcs = 0;
  let worst = { misclosure: 0, area: 0 };
  for (const alt of demo.alternatives.slice(0, 3)) {
    const impacts = await readImpactsJson(alt.id, demo.auth);
    for (const take of impacts.parcels.filter((p) => p.takeArea > 0)) {
      const res = await get(descriptionPath(alt.id, take.parcelId), demo.auth);
      expect(res.status, take.parcelId).toBe(200);
      const d = (await res.json()) as ApiDescription;
      // Walked here from the reported bearings, distances and curve elements (not the server's own sums).
      let area = 0;
      for (const part of d.parts) {
        for (const ring of part.rings) {
          const w = walkCourses(ring.courses);
          worst = { misclosure: Math.max(worst.misclosure, w.misclosure), area: Math.max(worst.area, Math.abs(w.area - ring.area)) };
          area += ring.hole ? -w.area : w.area;
        }
      }
      expect(Math.abs(area - take.takeArea), `${alt.name} ${take.parcelId}`).toBeLessThan(0.01);
      expect(Math.abs(d.area - take.takeArea), `${alt.name} ${take.parcelId}`).toBeLessThan(0.01);
      expect(d.closure).toBeLessThan(0.001);
      expect(d.text).toContain("licensed professional land surveyor");
      expect(d.text).toContain(`PARCEL ${take.parcelId}`);
      expect(d.text).toMatch(/POINT OF BEGINNING/);
      described++;
      arcs += d.courses.filter((c) => c.kind === "arc").length;
    }
  }
  expect(worst.misclosure).toBeLessThan(0.001);
  expect(described).toBeGreaterThan(50);
  // The demo's curves cut parcels: arc courses with their exact radius come out.
  expect(arcs).toBeGreaterThan(10);
}, 300_000);

test("an arc course states radius, central angle, arc length, chord bearing and chord, consistent with each other", async () => {
  const alt = demo.alternatives[0]!;
  const impacts = await readImpactsJson(alt.id, demo.auth);
  for (const take of impacts.parcels.filter((p) => p.takeArea > 0)) {
    const d = (await (await get(descriptionPath(alt.id, take.parcelId), demo.auth)).json()) as ApiDescription;
    const arc = d.courses.find((c) => c.kind === "arc");
    if (!arc) continue;
    const delta = (arc.deltaDeg! * Math.PI) / 180;
    // L = R·Δ and C = 2R·sin(Δ/2) (Schofield & Breach, Engineering Surveying, 6th ed., §10.1).
    expect(arc.arcLength!).toBeCloseTo(arc.radius! * delta, 6);
    expect(arc.chordDistance!).toBeCloseTo(2 * arc.radius! * Math.sin(delta / 2), 6);
    expect(Math.hypot(arc.to[0] - arc.from[0], arc.to[1] - arc.from[1])).toBeCloseTo(arc.chordDistance!, 6);
    // The arc is on the right-of-way line: a centreline radius R ∓ the half-width (Takeline's engine README: offsets of arcs).
    const a = (await (await get(`/api/v1/alternatives/${alt.id}`, demo.auth)).json()) as { alignment: { points: { curve?: { radius?: number; radius1?: number; radius2?: number } }[] }; corridor: { left: number; right: number } };
    const radii = a.alignment.points.flatMap((p) => [p.curve?.radius, p.curve?.radius1, p.curve?.radius2]).filter((r): r is number => r !== undefined);
    const lines = radii.flatMap((r) => [r - a.corridor.left, r + a.corridor.left, r - a.corridor.right, r + a.corridor.right]);
    expect(Math.min(...lines.map((r) => Math.abs(r - arc.radius!)))).toBeLessThan(1e-6);
    expect(d.text).toContain(`having a radius of ${arc.radius!.toFixed(3)} m, a central angle of ${arc.delta}`);
    return;
  }
  throw new Error("no arc course in the first demo alternative");
}, 120_000);

test("no right-of-way take, another role or another project's member: 404, 403, 404", async () => {
  const alt = demo.alternatives[0]!;
  const impacts = await readImpactsJson(alt.id, demo.auth);
  const easementOnly = impacts.parcels.find((p) => p.takeArea === 0);
  const missing = await get(descriptionPath(alt.id, easementOnly?.parcelId ?? "NO-SUCH-PARCEL"), demo.auth);
  expect(missing.status).toBe(404);
  expect(await missing.json()).toMatchObject({ error: { code: "not_found" } });
  const taken = impacts.parcels.find((p) => p.takeArea > 0)!;
  expect((await get(descriptionPath(alt.id, taken.parcelId), await bearer("agent@demo.test"))).status).toBe(403);
  expect((await get(descriptionPath(alt.id, taken.parcelId))).status).toBe(401);
  expect((await get(descriptionPath(999_999, taken.parcelId), demo.auth)).status).toBe(404);
});
