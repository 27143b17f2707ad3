import { expect, test } from "vitest";
import { runGeosTakes } from "../../tests/reference/geos-takes";
import { makeTestFabric } from "../../tests/reference/take-fabric";
import type { AlignmentInput } from "./alignment-types";
import { computeAlignmentGeometry } from "./compute-alignment-geometry";
import { computeTakes } from "./take-compute";
import type { TakeParcelInput, TakeRules } from "./take-types";

// Where the right-of-way comes back over itself, the ground it covers twice (or three times) is
// taken once. Reference: GEOS (Debian python3-shapely) with the right-of-way built as GEOS's own
// buffer of the centreline (flat caps, mitred joins), which is the union of the ground within the
// half-width by construction; curves densified at 1e-5 m sagitta. Nothing of the engine's pieces.
const RULES: TakeRules = { remnantMinArea: 50, remnantMinFraction: 0.05, landValuePerArea: 40, buildingValue: 1e5, severancePercent: 10, easementRatePerArea: 4, adminCostPerParcel: 2000, contingencyPercent: 20, proximityDistance: 0 };
// Projected coordinates of the size a UTM zone gives, so that round-off far from the origin is exercised.
const X0 = 560_000;
const Y0 = 4_420_000;
const at = (x: number, y: number, radius?: number) => ({ x: X0 + x, y: Y0 + y, ...(radius ? { curve: { type: "simple" as const, radius } } : {}) });

function compareWithGeos(points: AlignmentInput["points"], halfWidth: number, easement: number, fabric: [number, number, number, number]) {
  const { elements } = computeAlignmentGeometry({ units: "m", startStation: 0, points });
  const corridor = { left: halfWidth, right: halfWidth, easement };
  const parcels = makeTestFabric(X0 + fabric[0], Y0 + fabric[1], fabric[2], fabric[3]);
  const ours = computeTakes({ elements, corridor, parcels, rules: RULES });
  const geos = runGeosTakes({ elements, corridor, parcels: parcels.map((p) => ({ id: p.parcelId, polygons: p.polygons })), pieces: true, unparcelled: true, buffered: true });
  const byId = new Map(ours.parcels.map((p) => [p.parcelId, p]));
  let maxTakeDiff = 0;
  let maxEasementDiff = 0;
  for (const p of parcels) {
    const mine = byId.get(p.parcelId);
    const ref = geos.takes[p.parcelId] ?? 0;
    maxTakeDiff = Math.max(maxTakeDiff, Math.abs((mine?.takeArea ?? 0) - ref));
    maxEasementDiff = Math.max(maxEasementDiff, Math.abs((mine?.easementArea ?? 0) - ((geos.wideTakes?.[p.parcelId] ?? 0) - ref)));
  }
  for (const [id, refPieces] of Object.entries(geos.pieces ?? {})) {
    const mine = byId.get(id)!;
    expect(mine.remainderPieceAreas.length, id).toBe(refPieces.length);
    mine.remainderPieceAreas.forEach((a, k) => expect(Math.abs(a - refPieces[k]!), id).toBeLessThan(0.01));
  }
  return { ours, geos, maxTakeDiff, maxEasementDiff };
}

// East, north, west around three 90° curves, then south across the first leg at x = 300.
const LOOP = [at(0, 0), at(600, 0, 150), at(600, 400, 150), at(300, 400, 120), at(300, -300)];

test("a loop whose last leg crosses the first: per-parcel takes, easements and remainder pieces agree with GEOS within 0.01 m²", () => {
  const { ours, geos, maxTakeDiff, maxEasementDiff } = compareWithGeos(LOOP, 15, 3, [150, -120, 12, 6]);
  expect(ours.corridorSelfOverlaps).toHaveLength(1);
  expect(maxTakeDiff).toBeLessThan(0.01);
  expect(maxEasementDiff).toBeLessThan(0.01);
  // The crossing was really in the fabric: parcels there lose ground to both legs.
  expect(ours.parcels.filter((p) => p.stationFrom < 400 && p.stationTo > 1400).length).toBeGreaterThan(0);
  // The right-of-way's own area is the ground it covers, each square metre once (closed form; GEOS's
  // buffer of the whole line is only within a few hundredths of a square metre of it).
  expect(ours.corridorArea).toBeCloseTo(LOOP_GROUND, 6);
  expect(Math.abs(ours.corridorArea - geos.corridorArea)).toBeLessThan(0.1);
});

// The loop's centreline: tangents 450 + 100 + 30 + 580 m and 90° arcs of 150, 150 and 120 m; its
// last leg crosses the first square on, so a 30 m corridor covers 30 · L less the 30 × 30 m crossing.
const LOOP_GROUND = 30 * (1160 + ((150 + 150 + 120) * Math.PI) / 2) - 30 * 30;

test("a parcel holding the whole loop keeps two pieces: the land around it and the island the loop closes off (closed form)", () => {
  const { elements } = computeAlignmentGeometry({ units: "m", startStation: 0, points: LOOP });
  const corner = (x: number, y: number) => [X0 + x, Y0 + y];
  const farm: TakeParcelInput = { parcelId: "FARM", polygons: [[[corner(-100, -400), corner(800, -400), corner(800, 600), corner(-100, 600), corner(-100, -400)]]] };
  const take = computeTakes({ elements, corridor: { left: 15, right: 15 }, parcels: [farm], rules: RULES }).parcels[0]!;
  // The island lies inside the loop's inner lines: [315, 585] × [15, 385] less three corners, each a
  // square on the inner radius less its quarter circle (inner radii 135, 135 and 105 m).
  const island = 270 * 370 - (2 * 135 ** 2 + 105 ** 2) * (1 - Math.PI / 4);
  expect(take.takeArea).toBeCloseTo(LOOP_GROUND, 6);
  expect(take.remainderPieces).toBe(2);
  expect(take.remainderPieceAreas[1]!).toBeCloseTo(island, 3);
  expect(take.remainderPieceAreas[0]!).toBeCloseTo(900 * 1000 - LOOP_GROUND - island, 3);
});

test("a hairpin closing in on its first leg, over curves of 30 m radius, agrees with GEOS within 0.01 m²", () => {
  const { ours, geos, maxTakeDiff, maxEasementDiff } = compareWithGeos([at(0, 0), at(1000, 0, 30), at(1000, 80, 30), at(0, 30)], 20, 3, [-10, -40, 12, 5]);
  expect(ours.corridorSelfOverlaps).toHaveLength(1);
  expect(maxTakeDiff).toBeLessThan(0.01);
  expect(maxEasementDiff).toBeLessThan(0.01);
  expect(Math.abs(ours.totals.unparcelledArea - geos.unparcelledArea!)).toBeLessThan(0.05);
});

test("three legs crossing at one point: ground covered three times is still taken once (GEOS within 0.01 m²)", () => {
  // Legs 0 (y = 0), 2 (x = 400) and 4 (x + y = 400) all pass through (400, 0).
  const points = [at(0, 0), at(1000, 0, 100), at(400, 600), at(400, -400, 100), at(800, -400), at(0, 400)];
  const { ours, maxTakeDiff, maxEasementDiff } = compareWithGeos(points, 10, 2, [330, -60, 7, 4]);
  expect(maxTakeDiff).toBeLessThan(0.01);
  expect(maxEasementDiff).toBeLessThan(0.01);
  // The pieces there make three overlapping pairs (0–2, 0–4, 2–4).
  expect(ours.corridorSelfOverlaps.length).toBeGreaterThanOrEqual(3);
});
