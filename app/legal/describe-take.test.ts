import { expect, test } from "vitest";
import { computeAlignmentGeometry } from "~/geometry/compute-alignment-geometry";
import type { AlignmentInput } from "~/geometry/alignment-types";
import { computeTakes } from "~/geometry/take-compute";
import type { PolygonCoords, TakeRules } from "~/geometry/take-types";
import { describeTake, type DescribeTakeInput } from "./describe-take";
import type { ArcCourse, LineCourse } from "./legal-types";

const RULES: TakeRules = { remnantMinArea: 50, remnantMinFraction: 0.05, landValuePerArea: 40, buildingValue: 1e5, severancePercent: 10, easementRatePerArea: 4, adminCostPerParcel: 2000, contingencyPercent: 20, proximityDistance: 3 };
const square = (x0: number, y0: number, x1: number, y1: number) => [[x0, y0], [x1, y0], [x1, y1], [x0, y1], [x0, y0]];

function describe(alignment: AlignmentInput, polygons: PolygonCoords[], corridor = { left: 20, right: 20 }, extra: Partial<DescribeTakeInput> = {}) {
  const elements = computeAlignmentGeometry(alignment).elements;
  const d = describeTake({ elements, corridor, parcel: { parcelId: "QM-1", owner: "Invented Owner", polygons }, units: alignment.units, crsName: "EPSG:32617", projectName: "Quillmere test", alternativeName: "Test line", ...extra });
  if (!d) throw new Error("no take");
  return d;
}

const EAST: AlignmentInput = { units: "m", startStation: 0, points: [{ x: -50, y: 50 }, { x: 450, y: 50 }] };

test("a straight 40 m corridor across a 100 m lot is a 100 × 40 rectangle begun at its north-west corner on the parcel line", () => {
  const d = describe(EAST, [[square(0, 0, 100, 100)]]);
  // Closed form: the take is [0, 100] × [30, 70]; walked clockwise from (0, 70).
  const lines = d.courses as LineCourse[];
  expect(lines.map((c) => c.kind)).toEqual(["line", "line", "line", "line"]);
  expect(lines.map((c) => [c.bearing, c.distance.toFixed(6), c.on])).toEqual([
    [`N 90°00'00" E`, "100.000000", "right-of-way"],
    [`S 0°00'00" W`, "40.000000", "parcel"],
    [`N 90°00'00" W`, "100.000000", "right-of-way"],
    [`N 0°00'00" E`, "40.000000", "parcel"],
  ]);
  expect(d.courses[0]!.from).toEqual([0, 70]);
  expect(d.area).toBeCloseTo(4000, 9);
  expect(d.closure).toBeLessThan(1e-9);
  expect(d.roundedClosure).toBeLessThan(1e-9);
  // Commenced from the nearer end of the parcel line the POB is on: the corner (0, 100), 30 m north.
  expect(d.parts[0]!.commencement).toMatchObject({ point: [0, 100], bearing: `S 0°00'00" W`, alongParcelLine: true });
  expect(d.parts[0]!.commencement!.distance).toBeCloseTo(30, 9);
  // x = 0 is 50 m along a line starting at station 0; y = 70 is 20 m left of an eastbound line.
  expect(d.text).toContain("COMMENCING at a corner of said parcel at N 100.000, E 0.000;");
  expect(d.text).toContain("to the POINT OF BEGINNING, at N 70.000, E 0.000, 20.000 m left of centreline station 0+050.000;");
  expect(d.text).toContain("containing 4000.00 m² (0.4000 ha), more or less.");
  expect(d.text).toMatch(/^DRAFT FOR REVIEW, NOT FOR RECORDING\./);
  expect(d.text).toContain("licensed professional land surveyor");
});

// A 90° left curve of R = 300 m centred at (−300, 300): PC (−300, 0), PT (0, 300). The parcel is
// a triangle from the centre between the radial lines at −70° and −25°, reaching 400 m out, so the
// take is an annular sector of θ = 45° between R − w = 280 and R + w = 320.
const LEFT_CURVE: AlignmentInput = { units: "m", startStation: 1000, points: [{ x: -1000, y: 0 }, { x: 0, y: 0, curve: { type: "simple", radius: 300 } }, { x: 0, y: 1000 }] };
const ray = (deg: number, r: number) => [-300 + r * Math.cos((deg * Math.PI) / 180), 300 + r * Math.sin((deg * Math.PI) / 180)];

test("a take cut from a curve is an annular sector: exact radii, central angle, arc lengths, chords and area (closed form)", () => {
  const d = describe(LEFT_CURVE, [[[[-300, 300], ray(-70, 400), ray(-25, 400), [-300, 300]]]]);
  const arcs = d.courses.filter((c): c is ArcCourse => c.kind === "arc");
  const lines = d.courses.filter((c): c is LineCourse => c.kind === "line");
  expect(arcs.map((a) => a.radius).sort()).toEqual([280, 320]);
  const theta = Math.PI / 4;
  for (const a of arcs) {
    expect(a.delta).toBe(`45°00'00"`);
    expect(a.deltaDeg).toBeCloseTo(45, 10);
    // L = R·Δ, C = 2R·sin(Δ/2) (Schofield & Breach §10.1).
    expect(a.arcLength).toBeCloseTo(a.radius * theta, 9);
    expect(a.chordDistance).toBeCloseTo(2 * a.radius * Math.sin(theta / 2), 9);
    expect(a.center[0]).toBeCloseTo(-300, 9);
    expect(a.center[1]).toBeCloseTo(300, 9);
    // Walked clockwise round the sector: the outer arc turns right about the centre, the inner one left.
    expect(a.direction).toBe(a.radius === 320 ? "right" : "left");
    // Neither arc leaves a radial line on a tangent.
    expect(a.tangent).toBe(false);
  }
  expect(lines.map((l) => l.distance.toFixed(9))).toEqual(["40.000000000", "40.000000000"]);
  // Sector area ½·θ·(320² − 280²) (CRC, "circular sector").
  expect(Math.abs(d.area - 0.5 * theta * (320 ** 2 - 280 ** 2))).toBeLessThan(1e-6);
  expect(d.closure).toBeLessThan(1e-9);
  expect(d.text).toContain(`a central angle of 45°00'00" and an arc length of ${(320 * theta).toFixed(3)} m`);
});

test("a U-shaped parcel crossed by the corridor gives a take in two parts, each commenced and closed on its own", () => {
  const u = [[0, 0], [100, 0], [100, 100], [70, 100], [70, 40], [30, 40], [30, 100], [0, 100], [0, 0]];
  const d = describe({ units: "m", startStation: 0, points: [{ x: -50, y: 80 }, { x: 150, y: 80 }] }, [[u]], { left: 10, right: 10 });
  expect(d.parts.map((p) => p.label)).toEqual(["Part 1", "Part 2"]);
  for (const p of d.parts) expect(p.area).toBeCloseTo(30 * 20, 9);
  expect(d.area).toBeCloseTo(1200, 9);
  expect(d.text).toContain("PART 1:");
  expect(d.text).toContain("PART 2:");
  expect(d.text).toContain("The take in all contains 1200.00 m² (0.1200 ha), more or less.");
  expect(new Set(d.courses.map((c) => c.part))).toEqual(new Set([1, 2]));
});

test("a hole in the parcel inside the corridor is excepted from the take", () => {
  const d = describe(EAST, [[square(0, 0, 100, 100), square(40, 45, 60, 55).reverse()]]);
  expect(d.parts).toHaveLength(1);
  expect(d.parts[0]!.rings.map((r) => [r.hole, Number(r.area.toFixed(9))])).toEqual([[false, 4000], [true, 200]]);
  expect(d.area).toBeCloseTo(3800, 9);
  expect(d.text).toContain("EXCEPTING THEREFROM the land within the following courses: BEGINNING at N 55.000, E 40.000;");
  expect(d.text).toContain("Leaving 3800.00 m² (0.3800 ha), more or less.");
});

test("US survey feet: distances and areas are stated in survey feet and US survey acres", () => {
  const d = describe({ ...EAST, units: "usft" }, [[square(0, 0, 100, 100)]]);
  // 4000 usft² = 4000/43560 US survey acre (an acre is 43 560 ft² of its own foot: NIST Handbook 44 App. C).
  expect(d.areas).toMatchObject({ smallUnit: "usft2", largeUnit: "usacre" });
  expect(d.areas.large).toBeCloseTo(4000 / 43560, 12);
  expect(d.text).toContain("a distance of 100.000 US survey ft");
  expect(d.text).toContain("containing 4000.00 US survey ft² (0.0918 US survey acres)");
  expect(d.text).toContain("grid distances in US survey feet");
});

test("a parcel the right-of-way misses has no description", () => {
  const elements = computeAlignmentGeometry(EAST).elements;
  const d = describeTake({ elements, corridor: { left: 20, right: 20 }, parcel: { parcelId: "far", polygons: [[square(0, 200, 100, 300)]] }, units: "m", crsName: null, projectName: "p", alternativeName: "a" });
  expect(d).toBeNull();
});

test("a parcel corner 2 cm inside the curved right-of-way line (less than a coarse chord's sagitta) still gives its sliver of take, exact to the engine's area", () => {
  // Outside the 320 m outer line of LEFT_CURVE, except one corner at r = 319.98 (−45°).
  const polar = (deg: number, r: number) => ray(deg, r);
  const parcel = [[polar(-47, 330), polar(-45.6, 320.3), polar(-45, 319.98), polar(-44.4, 320.3), polar(-43, 330), polar(-45, 360), polar(-47, 330)]];
  const elements = computeAlignmentGeometry(LEFT_CURVE).elements;
  const exact = computeTakes({ elements, corridor: { left: 20, right: 20 }, parcels: [{ parcelId: "QM-2", polygons: [parcel] }], rules: RULES }).parcels[0]!;
  const d = describe(LEFT_CURVE, [parcel]);
  expect(exact.takeArea).toBeGreaterThan(1e-6);
  expect(Math.abs(d.area - exact.takeArea)).toBeLessThan(1e-7);
  expect(d.courses.map((c) => c.kind).sort()).toEqual(["arc", "line", "line"]);
  const arc = d.courses.find((c): c is ArcCourse => c.kind === "arc")!;
  expect(arc.radius).toBe(320);
});
