import { expect, test } from "vitest";
import { makeTestFabric } from "../../tests/reference/take-fabric";
import type { AlignmentInput } from "./alignment-types";
import { computeAlignmentGeometry } from "./compute-alignment-geometry";
import { computeTakes } from "./take-compute";
import { createTakeSession } from "./take-session";
import type { CorridorInput, TakeBuildingInput, TakeRules } from "./take-types";

const RULES: TakeRules = { remnantMinArea: 50, remnantMinFraction: 0.05, landValuePerArea: 40, buildingValue: 1e5, severancePercent: 10, easementRatePerArea: 4, adminCostPerParcel: 2000, contingencyPercent: 20, proximityDistance: 3 };
const CORRIDOR: CorridorInput = { left: 25, right: 30, easement: 4 };

function line(dx: number, radius = 300): AlignmentInput {
  return {
    units: "m",
    startStation: 0,
    points: [{ x: 10, y: 180 }, { x: 360, y: 200, curve: { type: "simple", radius: 220 } }, { x: 600 + dx, y: 480, curve: { type: "simple", radius } }, { x: 880, y: 560 }, { x: 1090, y: 470 }],
  };
}

const parcels = makeTestFabric(-20, 0, 57, 26);
// A small building in the middle of every fourth lot, none with a parcelId.
const buildings: TakeBuildingInput[] = parcels
  .filter((_, i) => i % 4 === 0)
  .map((p, i) => {
    const [x, y] = p.polygons[0]![0]![0]!;
    return { buildingId: `H-${i}`, polygons: [[[[x! + 5, y! + 8], [x! + 13, y! + 8], [x! + 13, y! + 18], [x! + 5, y! + 18], [x! + 5, y! + 8]]]] };
  });

test("after a PI moves, the session measures only parcels near changed pieces and equals a fresh computation", () => {
  const session = createTakeSession(parcels, buildings);
  const before = computeAlignmentGeometry(line(0)).elements;
  const after = computeAlignmentGeometry(line(4)).elements;
  session.compute(before, CORRIDOR, RULES);
  const incremental = session.compute(after, CORRIDOR, RULES);
  expect(session.stats.reused).toBeGreaterThan(0);
  expect(session.stats.measured).toBeLessThan(session.stats.candidates);
  const fresh = computeTakes({ elements: after, corridor: CORRIDOR, parcels, buildings, rules: RULES });
  expect(incremental).toEqual(fresh);
  expect(incremental.totals.displacements).toBeGreaterThan(0);
});

test("a radius sweep and a change of rules reuse what did not change", () => {
  const session = createTakeSession(parcels, buildings);
  for (const r of [300, 320, 340]) session.compute(computeAlignmentGeometry(line(0, r)).elements, CORRIDOR, RULES);
  const elements = computeAlignmentGeometry(line(0, 340)).elements;
  const dearer = session.compute(elements, CORRIDOR, { ...RULES, landValuePerArea: 80 });
  expect(session.stats.measured).toBe(0);
  expect(dearer).toEqual(computeTakes({ elements, corridor: CORRIDOR, parcels, buildings, rules: { ...RULES, landValuePerArea: 80 } }));
  session.clear();
  session.compute(elements, CORRIDOR, RULES);
  expect(session.stats.measured).toBe(session.stats.candidates);
});
