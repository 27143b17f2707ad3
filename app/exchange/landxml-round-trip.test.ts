import { execFileSync } from "node:child_process";
import { expect, test } from "vitest";
import { computeAlignmentGeometry, type AlignmentGeometry, type AlignmentInput } from "../geometry";
import { readLandXmlAlignments } from "./landxml-read";
import { writeLandXmlAlignment } from "./landxml-write";

/** Radius at PI `i` whose tangent exactly fills what the curve at PI i−1 leaves of the leg: a PRC. */
function fillRadius(p: [number, number][], i: number, rPrev: number): number {
  const h = (a: [number, number], b: [number, number]) => Math.atan2(b[1] - a[1], b[0] - a[0]);
  const turn = (j: number) => Math.abs(Math.atan2(Math.sin(h(p[j]!, p[j + 1]!) - h(p[j - 1]!, p[j]!)), Math.cos(h(p[j]!, p[j + 1]!) - h(p[j - 1]!, p[j]!))));
  const leg = Math.hypot(p[i]![0] - p[i - 1]![0], p[i]![1] - p[i - 1]![1]);
  return (leg - rPrev * Math.tan(turn(i - 1) / 2)) / Math.tan(turn(i) / 2);
}

const METRIC_XY: [number, number][] = [[0, 0], [600, 0], [1100, 500], [1200, 1300], [1700, 1900], [2400, 2000], [2900, 2500], [3900, 2500]];

// Simple, compound by Δ1, angle point, compound by its tangent PI→PC, then two simple curves
// turning opposite ways that meet at a PRC (a reverse curve), with a gap and an overlap equation.
const METRIC: AlignmentInput = {
  units: "m",
  startStation: 2000,
  stationEquations: [{ back: 2500, ahead: 2600 }, { back: 4000, ahead: 3900 }],
  points: [
    { x: 0, y: 0 },
    { x: 600, y: 0, curve: { type: "simple", radius: 400 } },
    { x: 1100, y: 500, curve: { type: "compound", radius1: 600, radius2: 350, delta1: 25 } },
    { x: 1200, y: 1300 },
    { x: 1700, y: 1900, curve: { type: "compound", radius1: 300, radius2: 450, tangentPC: 120 } },
    { x: 2400, y: 2000, curve: { type: "simple", radius: 500 } },
    { x: 2900, y: 2500, curve: { type: "simple", radius: fillRadius(METRIC_XY, 6, 500) } },
    { x: 3900, y: 2500 },
  ],
};

// The same kinds in US survey feet on State-Plane-sized coordinates, two angle points in a row.
const X0 = 6_487_000;
const Y0 = 1_840_000;
const USFT_XY: [number, number][] = [[X0, Y0], [X0 + 1500, Y0 + 400], [X0 + 2600, Y0 + 2100], [X0 + 4200, Y0 + 2300], [X0 + 5000, Y0 + 3400], [X0 + 5900, Y0 + 3500], [X0 + 7400, Y0 + 3100]];
const USFT: AlignmentInput = {
  units: "usft",
  startStation: 10_000,
  stationEquations: [{ back: 12_000, ahead: 12_050.25 }],
  points: [
    { x: USFT_XY[0]![0], y: USFT_XY[0]![1] },
    { x: USFT_XY[1]![0], y: USFT_XY[1]![1], curve: { type: "compound", radius1: 1910, radius2: 1145, delta1: 20.5 } },
    { x: USFT_XY[2]![0], y: USFT_XY[2]![1], curve: { type: "simple", radius: 1200 } },
    { x: USFT_XY[3]![0], y: USFT_XY[3]![1], curve: { type: "simple", radius: fillRadius(USFT_XY, 3, 1200) } },
    { x: USFT_XY[4]![0], y: USFT_XY[4]![1] },
    { x: USFT_XY[5]![0], y: USFT_XY[5]![1] },
    { x: USFT_XY[6]![0], y: USFT_XY[6]![1] },
  ],
};

function roundTrip(alignment: AlignmentInput): { xml: string; before: AlignmentGeometry; after: AlignmentGeometry; warnings: string[] } {
  const before = computeAlignmentGeometry(alignment);
  const xml = writeLandXmlAlignment({ name: "CL-A", alignment, geometry: before, projectName: "Quillmere bypass", epsgCode: 2229, crsName: "NAD83 / California zone 5 (ftUS)" });
  const [read] = readLandXmlAlignments(xml);
  expect(read!.error).toBeUndefined();
  return { xml, before, after: computeAlignmentGeometry(read!.alignment!), warnings: read!.warnings };
}

function expectSameGeometry(before: AlignmentGeometry, after: AlignmentGeometry): void {
  expect(after.units).toBe(before.units);
  expect(after.elements.map((e) => e.type)).toEqual(before.elements.map((e) => e.type));
  before.elements.forEach((e, i) => {
    const f = after.elements[i]!;
    expect(Math.abs(f.length - e.length)).toBeLessThan(1e-6);
    expect(Math.abs(f.startStation - e.startStation)).toBeLessThan(1e-6);
    for (const k of [0, 1] as const) {
      expect(Math.abs(f.start[k] - e.start[k])).toBeLessThan(1e-6);
      expect(Math.abs(f.end[k] - e.end[k])).toBeLessThan(1e-6);
    }
    if (e.type === "arc" && f.type === "arc") {
      expect(Math.abs(f.radius - e.radius)).toBeLessThan(1e-6);
      expect(Math.abs(f.deltaDeg - e.deltaDeg)).toBeLessThan(1e-9);
      expect(f.direction).toBe(e.direction);
    }
  });
  expect(after.curves.map((c) => [c.type, c.direction])).toEqual(before.curves.map((c) => [c.type, c.direction]));
  before.curves.forEach((c, i) => {
    const d = after.curves[i]!;
    for (const key of ["deltaDeg", "radius", "radius1", "radius2", "delta1Deg", "tangentPC", "tangentPT", "length", "pcStation", "ptStation", "piStation"] as const) {
      if (c[key] === undefined) expect(d[key]).toBeUndefined();
      else expect(Math.abs(d[key]! - c[key]!)).toBeLessThan(1e-6);
    }
  });
  expect(after.stations.map((s) => s.label)).toEqual(before.stations.map((s) => s.label));
  before.stations.forEach((s, i) => {
    const t = after.stations[i]!;
    expect(Math.abs(t.station - s.station)).toBeLessThan(1e-6);
    expect(Math.abs(t.displayStation - s.displayStation)).toBeLessThan(1e-6);
    expect(t.stationText).toBe(s.stationText);
  });
  expect(after.stationEquations.length).toBe(before.stationEquations.length);
}

test("metric alignment with simple, compound and reverse curves and an angle point survives export and import", () => {
  const { before, after, warnings } = roundTrip(METRIC);
  expect(before.stations.some((s) => s.label === "PRC")).toBe(true);
  expect(before.curves.filter((c) => c.type === "compound")).toHaveLength(2);
  expectSameGeometry(before, after);
  expect(warnings).toEqual([]);
});

test("US survey foot alignment on State Plane coordinates survives export and import", () => {
  const { xml, before, after, warnings } = roundTrip(USFT);
  expect(xml).toContain('linearUnit="USSurveyFoot"');
  expect(before.stations.some((s) => s.label === "PRC")).toBe(true);
  expectSameGeometry(before, after);
  expect(warnings).toEqual([]);
});

test("international feet are written as foot, not USSurveyFoot, and read back as ft", () => {
  const ft: AlignmentInput = { ...USFT, units: "ft" };
  const { xml, before, after } = roundTrip(ft);
  expect(xml).toContain('linearUnit="foot"');
  expect(after.units).toBe("ft");
  expectSameGeometry(before, after);
});

// An independent XML parser (Python's standard library ElementTree) reads the export: the
// namespace, the element sequence, and the "northing easting" order of point text.
test("Python's ElementTree reads the export as LandXML 1.2 with northing-first points and schema directions", () => {
  const before = computeAlignmentGeometry(METRIC);
  const xml = writeLandXmlAlignment({ name: "CL-A", alignment: METRIC, geometry: before, projectName: "Quillmere bypass", generatedAt: new Date(Date.UTC(2025, 0, 2, 3, 4, 5)) });
  const script = [
    "import sys, json, xml.etree.ElementTree as ET",
    "ns = {'l': 'http://www.landxml.org/schema/LandXML-1.2'}",
    "root = ET.fromstring(sys.stdin.read())",
    "geom = root.find('l:Alignments/l:Alignment/l:CoordGeom', ns)",
    "print(json.dumps({'version': root.get('version'), 'date': root.get('date'), 'time': root.get('time'),",
    "  'units': root.find('l:Units/l:Metric', ns).attrib,",
    "  'tags': [e.tag.split('}')[1] for e in geom],",
    "  'firstLine': [geom[0].find('l:Start', ns).text, geom[0].find('l:End', ns).text, geom[0].get('dir')],",
    "  'firstCurve': geom[1].attrib, 'equations': [e.attrib for e in root.findall('l:Alignments/l:Alignment/l:StaEquation', ns)]}))",
  ].join("\n");
  const out = JSON.parse(execFileSync("python3", ["-c", script], { input: xml, encoding: "utf8" }));
  expect(out.version).toBe("1.2");
  expect([out.date, out.time]).toEqual(["2025-01-02", "03:04:05Z"]);
  // LandXML-1.2.xsd: Metric requires areaUnit, linearUnit, volumeUnit, temperatureUnit, pressureUnit.
  expect(Object.keys(out.units).sort()).toEqual(["angularUnit", "areaUnit", "directionUnit", "linearUnit", "pressureUnit", "temperatureUnit", "volumeUnit"]);
  expect(out.tags).toEqual(before.elements.map((e) => (e.type === "tangent" ? "Line" : "Curve")));
  // First tangent runs (0,0) → PC of the 400 m curve at (600 − 400·tan(Δ/2), 0); point text is "N E".
  const t = 400 * Math.tan(Math.atan2(500, 500) / 2);
  expect(out.firstLine[0]).toBe("0 0");
  expect(out.firstLine[1].split(" ").map(Number)[0]).toBe(0);
  expect(Math.abs(out.firstLine[1].split(" ").map(Number)[1] - (600 - t))).toBeLessThan(1e-9);
  // Due east is azimuth 90°; the schema measures directions counter-clockwise from north: 270°.
  expect(Number(out.firstLine[2])).toBeCloseTo(270, 9);
  // Left turn of 45° from due east: rot ccw, Δ 45°, L = RΔ, chord = 2R sin(Δ/2) (Schofield & Breach §10.1).
  expect(out.firstCurve.rot).toBe("ccw");
  expect(Number(out.firstCurve.delta)).toBeCloseTo(45, 9);
  expect(Number(out.firstCurve.length)).toBeCloseTo((400 * Math.PI) / 4, 8);
  expect(Number(out.firstCurve.chord)).toBeCloseTo(800 * Math.sin(Math.PI / 8), 8);
  expect(Number(out.firstCurve.dirEnd)).toBeCloseTo(270 + 45, 9);
  expect(out.equations.map((e: Record<string, string>) => [e.staBack, e.staAhead])).toEqual([["2500", "2600"], ["4000", "3900"]]);
  expect(Number(out.equations[0].staInternal)).toBe(2500);
  expect(Number(out.equations[1].staInternal)).toBeCloseTo(2000 + 500 + (4000 - 2600), 9);
});
