import { readFileSync } from "node:fs";
import { expect, test } from "vitest";
import { computeAlignmentGeometry } from "../geometry";
import { ExchangeInputError } from "./exchange-errors";
import { readLandXmlAlignments } from "./landxml-read";

const sample = (name: string) => readFileSync(new URL(`../../tests/reference/${name}`, import.meta.url), "utf8");

test("the hand-written Imperial sample reads as one 90° right curve of radius 500 with its station equation", () => {
  const [cl1, ...rest] = readLandXmlAlignments(sample("exports-landxml-imperial.xml"));
  expect(rest).toEqual([]);
  expect(cl1!.name).toBe("CL-1");
  expect(cl1!.crs).toEqual({ epsgCode: 2229, name: "NAD83 / California zone 5 (ftUS)" });
  expect(cl1!.warnings).toEqual([]);
  expect(cl1!.alignment).toEqual({
    units: "usft",
    startStation: 1000,
    stationEquations: [{ back: 2000, ahead: 2100 }],
    points: [{ x: 1000, y: 1000 }, { x: 1000, y: 2000, curve: { type: "simple", radius: 500 } }, { x: 1500, y: 2000 }],
  });
  // T = R tan(Δ/2) = 500; Sta PC = PI − T = 1500; Sta PT = PC + RΔ (Schofield & Breach §10.1).
  const g = computeAlignmentGeometry(cl1!.alignment!);
  const pt = g.stations.find((s) => s.label === "PT")!;
  expect(g.curves[0]!.pcStation).toBeCloseTo(1500, 9);
  expect(pt.station).toBeCloseTo(1500 + 250 * Math.PI, 9);
  // The equation 2000 = 2100 falls before the PT, so the PT shows 100 more.
  expect(pt.displayStation).toBeCloseTo(1600 + 250 * Math.PI, 9);
});

test("the hand-written Metric sample: a curve without Center, a pntRef start, a reverse curve and a compound curve", () => {
  const [cl2, cl3] = readLandXmlAlignments(sample("exports-landxml-metric.xml"));
  expect(cl2!.warnings).toEqual([]);
  expect(cl2!.alignment!.units).toBe("m");
  expect(cl2!.alignment!.points).toEqual([
    { x: 0, y: 0 },
    { x: 200, y: 0, curve: { type: "simple", radius: 100 } },
    { x: 200, y: 300, curve: { type: "simple", radius: 200 } },
    { x: 500, y: 300 },
  ]);
  // No staBack: the back station is staInternal itself before any other equation.
  expect(cl2!.alignment!.stationEquations).toEqual([{ back: 300, ahead: 1000 }]);
  const g2 = computeAlignmentGeometry(cl2!.alignment!);
  expect(g2.stations.map((s) => s.label)).toEqual(["POB", "PC", "PI", "PRC", "PI", "PT", "POE"]);
  const prc = g2.stations.find((s) => s.label === "PRC")!;
  expect(prc.station).toBeCloseTo(100 + 50 * Math.PI, 9);
  expect(g2.stations.at(-1)!.displayStation).toBeCloseTo(1000 + (200 + 150 * Math.PI - 300), 9);

  // Compound: PI where y = 0 meets x = 300; Δ1 = 30° of R1 100, then R2 300 to Δ = 90°.
  expect(cl3!.warnings).toEqual([]);
  const [, pi, end] = cl3!.alignment!.points;
  expect(pi!.x).toBeCloseTo(300, 9);
  expect(pi!.y).toBeCloseTo(0, 9);
  const curve = pi!.curve as { type: string; radius1: number; radius2: number; delta1: number };
  expect(curve.type).toBe("compound");
  expect(curve.radius1).toBeCloseTo(100, 9);
  expect(curve.radius2).toBeCloseTo(300, 9);
  expect(curve.delta1).toBeCloseTo(30, 9);
  expect(end).toEqual({ x: 300, y: 400 });
  const c = computeAlignmentGeometry(cl3!.alignment!).curves[0]!;
  // Vertex triangle with t1 = R1 tan 15°, t2 = R2 tan 30°: V1 = (100 + t1, 0), V2 = V1 + (t1 + t2)∠30° = (300, 100),
  // PT = V2 + t2 north, so T_PC = 300 − 100 = 200 and T_PT = 100 + 300 tan 30° (closed form).
  expect(c.tangentPC).toBeCloseTo(200, 9);
  expect(c.tangentPT).toBeCloseTo(100 + 300 * Math.tan(Math.PI / 6), 9);
  expect(c.pcStation).toBeCloseTo(600, 9);
});

test("files Takeline cannot represent are refused or flagged, never guessed", () => {
  expect(() => readLandXmlAlignments("<Foo/>")).toThrow(ExchangeInputError);
  expect(() => readLandXmlAlignments("<LandXML><Alignments><Alignment name='a'>")).toThrow(/never closed/);
  const noUnits = sample("exports-landxml-imperial.xml").replace(/<Units>[\s\S]*?<\/Units>/, "");
  expect(() => readLandXmlAlignments(noUnits)).toThrow(/no <Units>/);
  const spiral = sample("exports-landxml-imperial.xml").replace("<Line ", '<Spiral length="200" radiusStart="INF" radiusEnd="800" rot="ccw" spiType="clothoid"><Start>0 0</Start><PI>0 1</PI><End>0 2</End></Spiral><Line ');
  const [read] = readLandXmlAlignments(spiral);
  expect(read!.alignment).toBeNull();
  expect(read!.error).toMatchObject({ code: "unsupported_geometry" });
  expect(read!.error!.message).toMatch(/Spiral/);
  const wrongLength = sample("exports-landxml-imperial.xml").replace('length="1285.398"', 'length="1300"');
  expect(readLandXmlAlignments(wrongLength)[0]!.warnings.join(" ")).toMatch(/elements add up to 1285.398/);
});
