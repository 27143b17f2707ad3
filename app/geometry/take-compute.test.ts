import { expect, test } from "vitest";
import { computeAlignmentGeometry } from "./compute-alignment-geometry";
import { computeTakes } from "./take-compute";
import type { TakeBuildingInput, TakeParcelInput, TakeRules } from "./take-types";

// Hand-checkable cases on a straight line along y = 0 from x = 0 to 1000, right-of-way 10 + 10 m,
// easement 5 m each side. Numbers below are worked out by hand from rectangles.
const elements = computeAlignmentGeometry({ units: "m", startStation: 0, points: [{ x: 0, y: 0 }, { x: 1000, y: 0 }] }).elements;
const corridor = { left: 10, right: 10, easement: 5 };
const rules: TakeRules = { remnantMinArea: 250, remnantMinFraction: 0.1, landValuePerArea: 50, buildingValue: 200_000, severancePercent: 15, easementRatePerArea: 4, adminCostPerParcel: 10_000, contingencyPercent: 20, proximityDistance: 3 };
const rect = (x0: number, y0: number, x1: number, y1: number) => [[[x0, y0], [x1, y0], [x1, y1], [x0, y1], [x0, y0]]];
const parcels: TakeParcelInput[] = [
  { parcelId: "A", owner: "Quillmere Holdings", address: "1 Ostrand Rd", polygons: [rect(100, -50, 200, 5)] },
  { parcelId: "B", polygons: [rect(300, -12, 320, 12)], landValuePerArea: 80 },
  { parcelId: "C", polygons: [rect(400, -100, 500, 100)] },
  { parcelId: "D", polygons: [rect(800, 10, 900, 50)] },
  { parcelId: "E", polygons: [rect(600, 12, 700, 40)] },
  { parcelId: "F", polygons: [[...rect(520, -100, 580, 100), ...rect(530, 50, 540, 60)]] },
];
const buildings: TakeBuildingInput[] = [
  { buildingId: "hit-A", polygons: [rect(150, -5, 160, 0)] },
  { buildingId: "near-A", polygons: [rect(120, -12.5, 130, -11)] },
  { buildingId: "far-A", polygons: [rect(170, -20, 180, -14)] },
  { buildingId: "hit-C", polygons: [rect(440, 5, 460, 30)], value: 350_000 },
  { buildingId: "named", parcelId: "C", polygons: [rect(470, -60, 480, -50)] },
  { buildingId: "orphan", polygons: [rect(240, -3, 250, 3)] },
];

function run() {
  return computeTakes({ elements, corridor, parcels, buildings, rules });
}

test("take, easement, remainder and station span of a parcel the line clips", () => {
  const a = run().parcels.find((p) => p.parcelId === "A")!;
  // 100 m × (5 − (−10)) in the right-of-way; 100 m × 5 m of easement below it (y −15 to −10).
  expect(a.takeArea).toBeCloseTo(1500, 9);
  expect(a.easementArea).toBeCloseTo(500, 9);
  expect(a.parcelArea).toBeCloseTo(5500, 9);
  expect(a.remainderArea).toBeCloseTo(4000, 9);
  expect(a.takeFraction).toBeCloseTo(1500 / 5500, 12);
  expect(a.remainderPieces).toBe(1);
  expect(a.classification).toBe("partial");
  expect([a.stationFrom, a.stationTo]).toEqual([100, 200]);
  expect([a.owner, a.address]).toEqual(["Quillmere Holdings", "1 Ostrand Rd"]);
});

test("a parcel left with two strips below the remnant size is a full take; one cut in two is a severance", () => {
  const r = run();
  const b = r.parcels.find((p) => p.parcelId === "B")!;
  // 20 × 20 taken; two 20 × 2 strips of 40 m² left, both under 250 m².
  expect(b.takeArea).toBeCloseTo(400, 9);
  expect(b.remainderPieceAreas.map((x) => Number(x.toFixed(9)))).toEqual([40, 40]);
  expect(b.classification).toBe("full");
  const c = r.parcels.find((p) => p.parcelId === "C")!;
  expect(c.takeArea).toBeCloseTo(2000, 9);
  expect(c.remainderPieces).toBe(2);
  expect(c.remainderPieceAreas.map((x) => Number(x.toFixed(9)))).toEqual([9000, 9000]);
  expect(c.classification).toBe("partial");
  // Cut in two with a 10 × 10 hole in the upper part: 60 × 90 below, 60 × 90 − 100 above.
  const f = r.parcels.find((p) => p.parcelId === "F")!;
  expect(f.takeArea).toBeCloseTo(1200, 9);
  expect(f.remainderPieceAreas.map((x) => Number(x.toFixed(6)))).toEqual([5400, 5300]);
});

test("touching the right-of-way line is not a take; the easement alone lists the parcel without land cost", () => {
  const r = run();
  expect(r.parcels.find((p) => p.parcelId === "D")!.takeArea).toBe(0); // D touches y = 10, lies in the easement y 10–15
  const e = r.parcels.find((p) => p.parcelId === "E")!;
  expect(e.takeArea).toBe(0);
  expect(e.easementArea).toBeCloseTo(100 * 3, 9); // y 12 to 15
  expect(e.cost.land).toBe(0);
  expect(e.cost.administrative).toBe(0);
  expect(e.cost.easement).toBeCloseTo(4 * 300, 9);
});

test("buildings hit, near (within 3 m of the line) and beyond it; owner by parcelId or by containment", () => {
  const r = run();
  const a = r.parcels.find((p) => p.parcelId === "A")!;
  expect(a.buildingsHit).toEqual(["hit-A"]);
  expect(a.buildingsNear).toEqual(["near-A"]); // 1 m from y = −10; far-A is 4 m away
  const c = r.parcels.find((p) => p.parcelId === "C")!;
  expect(c.buildingsHit).toEqual(["hit-C"]);
  expect(c.buildingsNear).toEqual([]); // "named" is 40 m from the line
  expect(r.totals.displacements).toBe(3); // hit-A, hit-C and the orphan
  expect(r.totals.proximityImpacts).toBe(1);
  expect(r.warnings.some((w) => w.includes("orphan") && w.includes("no parcel"))).toBe(true);
});

test("cost lines by hand: land, buildings, severance, easement, administration, contingency", () => {
  const r = run();
  const a = r.parcels.find((p) => p.parcelId === "A")!.cost;
  // Partial: land 1500 × 50; severance 15 % of it; one building at the default value; easement 500 × 4.
  expect(a.land).toBeCloseTo(75_000, 6);
  expect(a.severance).toBeCloseTo(11_250, 6);
  expect(a.buildings).toBe(200_000);
  expect(a.easement).toBeCloseTo(2000, 6);
  expect(a.administrative).toBe(10_000);
  const sumA = 75_000 + 11_250 + 200_000 + 2000 + 10_000;
  expect(a.contingency).toBeCloseTo(0.2 * sumA, 6);
  expect(a.total).toBeCloseTo(1.2 * sumA, 6);
  // Full take of B: the whole 480 m² at its own value 80, no severance, no easement cost.
  const b = r.parcels.find((p) => p.parcelId === "B")!.cost;
  expect(b.land).toBeCloseTo(480 * 80, 6);
  expect([b.severance, b.easement, b.buildings]).toEqual([0, 0, 0]);
  expect(b.total).toBeCloseTo(1.2 * (480 * 80 + 10_000), 6);
  expect(r.totals.estimatedCost).toBeCloseTo(r.parcels.reduce((s, p) => s + p.cost.total, 0), 6);
});

test("totals: corridor area, unparcelled land, counts; parcels in station order", () => {
  const r = run();
  expect(r.corridorArea).toBeCloseTo(20_000, 9);
  expect(r.easementArea).toBeCloseTo(10_000, 9);
  expect(r.totals.parcelTakeArea).toBeCloseTo(1500 + 400 + 2000 + 1200, 9);
  expect(r.totals.unparcelledArea).toBeCloseTo(20_000 - 5100, 9);
  expect([r.totals.parcelsAffected, r.totals.fullTakes, r.totals.partialTakes]).toEqual([6, 1, 3]);
  expect(r.parcels.map((p) => p.parcelId)).toEqual(["A", "B", "C", "F", "E", "D"]);
});

test("parcels that overlap inside the corridor are warned about", () => {
  const overlapping = [...parcels, { parcelId: "A2", polygons: [rect(150, -10, 170, 10)] }];
  const r = computeTakes({ elements, corridor, parcels: overlapping, rules });
  expect(r.totals.unparcelledArea).toBeCloseTo(20_000 - 5100 - 400, 9);
  expect(r.warnings.some((w) => w.startsWith("Parcels overlap"))).toBe(false); // still under the corridor's area
  const stacked = [...parcels, { parcelId: "ALL", polygons: [rect(0, -10, 1000, 10)] }];
  const s = computeTakes({ elements, corridor, parcels: stacked, rules });
  expect(s.totals.unparcelledArea).toBe(0);
  expect(s.warnings.some((w) => w.startsWith("Parcels overlap"))).toBe(true);
});

test("bad rules and coordinates are refused with a field", () => {
  expect(() => computeTakes({ elements, corridor, parcels, rules: { ...rules, remnantMinFraction: 2 } })).toThrow(expect.objectContaining({ code: "out_of_range", details: { field: "rules.remnantMinFraction" } }));
  const bad = [{ parcelId: "X", polygons: [[[[0, 0], [1, Number.NaN], [1, 1], [0, 0]]]] }];
  expect(() => computeTakes({ elements, corridor, parcels: bad, rules })).toThrow(expect.objectContaining({ code: "invalid_number" }));
});
