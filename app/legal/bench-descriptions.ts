/**
 * Prints how long legal descriptions take on the invented grid fabric of the take tests (curves,
 * tapers, holed and two-part lots): `npx tsx app/legal/bench-descriptions.ts`. Figures, not goals.
 */
import { makeTestFabric } from "../../tests/reference/take-fabric";
import { computeAlignmentGeometry } from "~/geometry/compute-alignment-geometry";
import { computeTakes } from "~/geometry/take-compute";
import { describeTake } from "./describe-take";

const elements = computeAlignmentGeometry({
  units: "m",
  startStation: 0,
  points: [{ x: 10, y: 180 }, { x: 360, y: 200, curve: { type: "simple", radius: 220 } }, { x: 600, y: 480, curve: { type: "simple", radius: 300 } }, { x: 880, y: 560 }, { x: 1090, y: 470 }],
}).elements;
const corridor = { left: 25, right: 35 };
const parcels = makeTestFabric(-20, 0, 57, 26);
const rules = { remnantMinArea: 50, remnantMinFraction: 0.05, landValuePerArea: 40, buildingValue: 1e5, severancePercent: 10, easementRatePerArea: 4, adminCostPerParcel: 2000, contingencyPercent: 20, proximityDistance: 3 };
const takes = computeTakes({ elements, corridor, parcels, rules }).parcels.filter((t) => t.takeArea > 0);
const byId = new Map(parcels.map((p) => [p.parcelId, p]));
const times: number[] = [];
let courses = 0;
for (const t of takes) {
  const start = performance.now();
  const d = describeTake({ elements, corridor, parcel: byId.get(t.parcelId)!, units: "m", crsName: null, projectName: "bench", alternativeName: "bench" });
  times.push(performance.now() - start);
  courses += d?.courses.length ?? 0;
}
times.sort((a, b) => a - b);
const at = (q: number) => times[Math.min(times.length - 1, Math.floor(q * times.length))]!.toFixed(1);
console.log(`${takes.length} takes, ${courses} courses: median ${at(0.5)} ms, p90 ${at(0.9)} ms, max ${at(1)} ms, total ${times.reduce((a, b) => a + b, 0).toFixed(0)} ms`);
