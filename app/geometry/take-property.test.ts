import { expect, test } from "vitest";
import fc from "fast-check";
import type { AlignmentInput } from "./alignment-types";
import { buildCorridor } from "./corridor-build";
import { computeAlignmentGeometry } from "./compute-alignment-geometry";
import { computeTakes } from "./take-compute";
import type { TakeParcelInput, TakeRules } from "./take-types";

const RULES: TakeRules = { remnantMinArea: 100, remnantMinFraction: 0.1, landValuePerArea: 10, buildingValue: 0, severancePercent: 10, easementRatePerArea: 1, adminCostPerParcel: 100, contingencyPercent: 10, proximityDistance: 2 };

const legArb = fc.record({ length: fc.double({ min: 300, max: 800, noNaN: true }), turnDeg: fc.double({ min: 8, max: 50, noNaN: true }), left: fc.boolean(), curved: fc.boolean(), u: fc.double({ min: 0.15, max: 0.95, noNaN: true }) });
const caseArb = fc.record({
  legs: fc.array(legArb, { minLength: 1, maxLength: 4 }),
  origin: fc.tuple(fc.double({ min: -1e6, max: 1e6, noNaN: true }), fc.double({ min: 0, max: 5e6, noNaN: true })),
  left: fc.double({ min: 0, max: 40, noNaN: true }),
  right: fc.double({ min: 1, max: 40, noNaN: true }),
  easement: fc.constantFrom(0, 3.5),
  nx: fc.integer({ min: 3, max: 13 }),
  ny: fc.integer({ min: 3, max: 13 }),
  cuts: fc.array(fc.integer({ min: 0, max: 4 }), { minLength: 169, maxLength: 169 }),
});

type Case = typeof caseArb extends fc.Arbitrary<infer T> ? T : never;

/** PIs from legs: curves only where their tangents fit in half of each neighbouring leg and clear the widths. */
function alignmentOf(c: Case): AlignmentInput {
  const [x0, y0] = c.origin;
  const points: AlignmentInput["points"] = [{ x: x0, y: y0 }];
  let heading = 0;
  c.legs.forEach((leg, i) => {
    const prev = points[points.length - 1]!;
    points.push({ x: prev.x + leg.length * Math.cos(heading), y: prev.y + leg.length * Math.sin(heading) });
    const next = c.legs[i + 1];
    if (!next) return;
    const turn = (leg.turnDeg * Math.PI) / 180;
    heading += leg.left ? turn : -turn;
    const radius = (leg.u * Math.min(leg.length, next.length)) / 2 / Math.tan(turn / 2);
    if (leg.curved && radius > Math.max(c.left, c.right) + 3.5 + 5) points[points.length - 1]!.curve = { type: "simple", radius };
  });
  const last = points[points.length - 1]!;
  points.push({ x: last.x + 400 * Math.cos(heading), y: last.y + 400 * Math.sin(heading) });
  return { units: "m", startStation: 0, points };
}

/** Grid cells over `b`, each whole, cut into two triangles, into two concave halves, or holed around an inholding. */
function partition(b: number[], nx: number, ny: number, cuts: number[]): TakeParcelInput[] {
  const out: TakeParcelInput[] = [];
  const w = (b[2]! - b[0]!) / nx;
  const h = (b[3]! - b[1]!) / ny;
  for (let i = 0; i < nx; i++) {
    for (let j = 0; j < ny; j++) {
      const [x0, y0] = [b[0]! + i * w, b[1]! + j * h];
      const [x1, y1] = [i === nx - 1 ? b[2]! : x0 + w, j === ny - 1 ? b[3]! : y0 + h];
      const id = `${i}-${j}`;
      const ring = (pts: number[][]) => [[...pts, pts[0]!]];
      const kind = cuts[i * 13 + j]!;
      const mx = (x0 + x1) / 2;
      if (kind === 1) {
        out.push({ parcelId: `${id}a`, polygons: [ring([[x0, y0], [x1, y0], [x1, y1]])] }, { parcelId: `${id}b`, polygons: [ring([[x0, y0], [x1, y1], [x0, y1]])] });
      } else if (kind === 2) {
        const k = [mx + w / 4, (y0 + y1) / 2];
        out.push({ parcelId: `${id}a`, polygons: [ring([[x0, y0], [mx, y0], k, [mx, y1], [x0, y1]])] }, { parcelId: `${id}b`, polygons: [ring([[mx, y0], [x1, y0], [x1, y1], [mx, y1], k])] });
      } else if (kind === 3) {
        const hole = [[x0 + w / 3, y0 + h / 3], [x0 + w / 3, y0 + (2 * h) / 3], [x0 + (2 * w) / 3, y0 + (2 * h) / 3], [x0 + (2 * w) / 3, y0 + h / 3]];
        out.push({ parcelId: `${id}a`, polygons: [[...ring([[x0, y0], [x1, y0], [x1, y1], [x0, y1]]), [...hole, hole[0]!]]] }, { parcelId: `${id}b`, polygons: [ring([...hole].reverse())] });
      } else {
        out.push({ parcelId: id, polygons: [ring([[x0, y0], [x1, y0], [x1, y1], [x0, y1]])] });
      }
    }
  }
  return out;
}

test("over a full partition of the corridor's bounds, takes add up to the corridor and every area stays in range", () => {
  // Property (closed-form identity): Σ area(P ∩ C) over a partition of a region holding C is area(C).
  fc.assert(
    fc.property(caseArb, (c) => {
      const elements = computeAlignmentGeometry(alignmentOf(c)).elements;
      const corridor = { left: c.left, right: c.right, easement: c.easement };
      const built = buildCorridor(elements, corridor);
      const pieces = (built.easement ?? built).pieces;
      const b = pieces.reduce((a, p) => [Math.min(a[0]!, p.bounds[0]), Math.min(a[1]!, p.bounds[1]), Math.max(a[2]!, p.bounds[2]), Math.max(a[3]!, p.bounds[3])], [Infinity, Infinity, -Infinity, -Infinity]);
      const parcels = partition([b[0]! - 1, b[1]! - 1, b[2]! + 1, b[3]! + 1], c.nx, c.ny, c.cuts);
      const r = computeTakes({ elements, corridor, parcels, rules: RULES });
      for (const p of r.parcels) {
        expect(p.takeArea).toBeGreaterThanOrEqual(0);
        expect(p.easementArea).toBeGreaterThanOrEqual(0);
        expect(p.takeArea).toBeLessThanOrEqual(p.parcelArea);
        expect(p.remainderArea).toBeGreaterThanOrEqual(0);
        expect(p.remainderPieceAreas.reduce((s, a) => s + a, 0)).toBeLessThanOrEqual(p.remainderArea + 1e-6 * p.parcelArea);
        expect(p.stationFrom).toBeLessThanOrEqual(p.stationTo);
      }
      expect(Math.abs(r.totals.parcelTakeArea - r.corridorArea) / r.corridorArea).toBeLessThan(1e-6);
      expect(r.totals.unparcelledArea).toBeLessThan(1e-6 * r.corridorArea);
      if (c.easement > 0) expect(Math.abs(r.totals.parcelEasementArea - r.easementArea) / r.easementArea).toBeLessThan(1e-6);
    }),
    { numRuns: 40, seed: 20261201 },
  );
});
