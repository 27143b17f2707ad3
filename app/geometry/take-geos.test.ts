import { expect, test } from "vitest";
import { runGeosTakes } from "../../tests/reference/geos-takes";
import { makeTestFabric } from "../../tests/reference/take-fabric";
import type { AlignmentInput } from "./alignment-types";
import { computeAlignmentGeometry } from "./compute-alignment-geometry";
import { computeTakes } from "./take-compute";
import type { CorridorInput, TakeRules } from "./take-types";

// Left and right curves, an angle point without a curve, a taper on a curve and one on a tangent.
const LINE: AlignmentInput = {
  units: "m",
  startStation: 0,
  points: [
    { x: 10, y: 180 },
    { x: 360, y: 200, curve: { type: "simple", radius: 220 } },
    { x: 600, y: 480, curve: { type: "simple", radius: 300 } },
    { x: 880, y: 560 },
    { x: 1090, y: 470 },
  ],
};
const RULES: TakeRules = { remnantMinArea: 50, remnantMinFraction: 0.05, landValuePerArea: 40, buildingValue: 1e5, severancePercent: 10, easementRatePerArea: 4, adminCostPerParcel: 2000, contingencyPercent: 20, proximityDistance: 3 };

function scenario() {
  const elements = computeAlignmentGeometry(LINE).elements;
  const firstArc = elements.find((e) => e.type === "arc")!;
  const lastTangent = elements[elements.length - 1]!;
  const corridor: CorridorInput = {
    left: 25,
    right: 35,
    easement: 4,
    ranges: [
      { fromStation: firstArc.startStation + 60, toStation: firstArc.startStation + 110, right: 48, transition: 30 },
      { fromStation: lastTangent.startStation + 40, toStation: lastTangent.startStation + 120, left: 40, transition: 25 },
    ],
  };
  const parcels = makeTestFabric(-20, 0, 57, 26);
  return { elements, corridor, parcels };
}

test("per-parcel takes, easements and remainder pieces agree with GEOS within 0.01 m² on a grid fabric with curves", () => {
  const { elements, corridor, parcels } = scenario();
  const ours = computeTakes({ elements, corridor, parcels, rules: RULES });
  // Reference: GEOS (Debian python3-shapely) on a corridor the python script rebuilds from the elements
  // and widths, curves densified at 1e-5 m sagitta — independent of the engine's pieces.
  const geos = runGeosTakes({ elements, corridor, parcels: parcels.map((p) => ({ id: p.parcelId, polygons: p.polygons })), unparcelled: true, pieces: true });
  const byId = new Map(ours.parcels.map((p) => [p.parcelId, p]));
  let maxDiff = 0;
  for (const p of parcels) {
    const mine = byId.get(p.parcelId);
    const ref = geos.takes[p.parcelId] ?? 0;
    maxDiff = Math.max(maxDiff, Math.abs((mine?.takeArea ?? 0) - ref));
    const refEasement = (geos.wideTakes?.[p.parcelId] ?? 0) - ref;
    maxDiff = Math.max(maxDiff, Math.abs((mine?.easementArea ?? 0) - refEasement));
  }
  expect(maxDiff).toBeLessThan(0.01);
  // Remainder pieces: same count and areas as GEOS's parcel − corridor.
  for (const [id, refPieces] of Object.entries(geos.pieces ?? {})) {
    const mine = byId.get(id)!;
    if (geos.takes[id]! <= 1e-6) continue;
    expect(mine.remainderPieces, id).toBe(refPieces.length);
    mine.remainderPieceAreas.forEach((a, k) => expect(Math.abs(a - refPieces[k]!), id).toBeLessThan(0.01));
  }
  // The special cases were really exercised.
  const kinds = new Set(parcels.filter((p) => (byId.get(p.parcelId)?.takeArea ?? 0) > 1).map((p) => p.kind));
  expect([...kinds].sort()).toEqual(["concave", "holed", "lot", "multi", "strip"]);
  expect(ours.parcels.filter((p) => p.remainderPieces >= 2).length).toBeGreaterThan(2);
  expect(ours.parcels.length).toBeGreaterThan(100);
  // Corridor areas agree (the reference's chords are at 1e-5 m; the taper on the curve is within 0.5 mm).
  expect(Math.abs(ours.corridorArea - geos.corridorArea)).toBeLessThan(0.05);
  expect(Math.abs(ours.corridorArea + ours.easementArea - geos.wideArea!)).toBeLessThan(0.05);
  // Conservation: Σ takes + unparcelled (GEOS: corridor − ∪ parcels) = corridor area.
  expect(Math.abs(ours.totals.parcelTakeArea + geos.unparcelledArea! - ours.corridorArea)).toBeLessThan(0.05);
  expect(Math.abs(ours.totals.unparcelledArea - geos.unparcelledArea!)).toBeLessThan(0.05);
});
