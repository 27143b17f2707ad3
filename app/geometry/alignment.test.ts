import { expect, test } from "vitest";
import fc from "fast-check";
import { computeAlignmentGeometry } from "./compute-alignment-geometry";
import type { AlignmentInput, ArcElement } from "./alignment-types";
import { locateAtInternalStation, findStationOffset } from "./alignment-locate";
import { findPointStation, locateStation } from "./alignment-stations";
import { GeometryInputError } from "./errors";
import { degToRad } from "./angles";
import { mathRadFromAzimuthDeg } from "./bearings";
import { addVec, distanceBetween, scaleVec, unitAtRad } from "./vec2";

// A metric test line: a simple curve, a compound curve by Δ1, an angle point, a compound curve
// by its tangent PI→PC and two reverse curves meeting at a PRC.
const LINE: AlignmentInput = {
  units: "m",
  startStation: 2000,
  points: [
    { x: 0, y: 0 },
    { x: 600, y: 0, curve: { type: "simple", radius: 400 } },
    { x: 1100, y: 500, curve: { type: "compound", radius1: 600, radius2: 350, delta1: 25 } },
    { x: 1200, y: 1300 },
    { x: 1700, y: 1900, curve: { type: "compound", radius1: 300, radius2: 450, tangentPC: 120 } },
    { x: 2400, y: 2000, curve: { type: "simple", radius: 500 } },
    { x: 2900, y: 2500, curve: { type: "simple", radius: prcRadius() } },
    { x: 3900, y: 2500 },
  ],
};

/** Radius at PI 6 whose tangent exactly fills the leg left by PI 5's curve, so they meet at a PRC. */
function prcRadius(): number {
  const leg = Math.hypot(500, 500);
  const d5 = Math.atan2(500, 500) - Math.atan2(100, 700);
  const d6 = Math.atan2(500, 500);
  return (leg - 500 * Math.tan(d5 / 2)) / Math.tan(d6 / 2);
}

function arcs(input = LINE): ArcElement[] {
  return computeAlignmentGeometry(input).elements.filter((e): e is ArcElement => e.type === "arc");
}

test("each arc's own tangents meet at its PI and its chord is 2R sin(Δ/2)", () => {
  // Schofield & Breach §10.1: T = R tan(Δ/2) on both tangents, LC = 2R sin(Δ/2).
  for (const a of arcs()) {
    const d = degToRad(Math.abs(a.deltaDeg));
    const t = a.radius * Math.tan(d / 2);
    const fromEnd = addVec(a.end, scaleVec(unitAtRad(mathRadFromAzimuthDeg(a.endAzimuthDeg)), -t));
    expect(distanceBetween(fromEnd, a.pi!)).toBeLessThan(1e-8);
    expect(distanceBetween(a.start, a.end)).toBeCloseTo(2 * a.radius * Math.sin(d / 2), 8);
    expect(distanceBetween(a.start, a.center)).toBeCloseTo(a.radius, 8);
    expect(distanceBetween(a.end, a.center)).toBeCloseTo(a.radius, 8);
  }
});

test("elements join end to start and stations increase by their lengths", () => {
  const g = computeAlignmentGeometry(LINE);
  g.elements.forEach((e, i) => {
    expect(e.endStation - e.startStation).toBeCloseTo(e.length, 9);
    const next = g.elements[i + 1];
    if (next) {
      expect(distanceBetween(e.end, next.start)).toBeLessThan(1e-8);
      expect(next.startStation).toBe(e.endStation);
    }
  });
  expect(g.length).toBeCloseTo(g.elements.reduce((s, e) => s + e.length, 0), 9);
});

test("PC = PI − T and PT = PC + L at every curve, never PI + T", () => {
  // Schofield & Breach §10.1 station rule; Mahun OASL Curves A.2.
  for (const c of computeAlignmentGeometry(LINE).curves) {
    expect(c.piStation - c.pcStation).toBeCloseTo(c.tangentPC, 9);
    expect(c.ptStation - c.pcStation).toBeCloseTo(c.length, 9);
  }
});

test("key stations: POB, PC, PI, PCC, PT, PRC and POE in station order", () => {
  const g = computeAlignmentGeometry(LINE);
  const labels = g.stations.map((s) => s.label);
  expect(labels[0]).toBe("POB");
  expect(labels[labels.length - 1]).toBe("POE");
  expect(labels.filter((l) => l === "PCC")).toHaveLength(2);
  expect(labels).toContain("PRC");
  for (let i = 1; i < g.stations.length; i++) expect(g.stations[i]!.station).toBeGreaterThanOrEqual(g.stations[i - 1]!.station);
  expect(g.stations[0]!.stationText).toBe("2+000.000");
});

test("a compound curve given by its tangent PI→PC has that tangent", () => {
  const c = computeAlignmentGeometry(LINE).curves.find((k) => k.piIndex === 4)!;
  expect(c.type).toBe("compound");
  expect(c.tangentPC).toBeCloseTo(120, 9);
  expect(c.radius1).toBeCloseTo(300, 9);
});

test("point at a station then its inverse returns the same station with zero offset", () => {
  const g = computeAlignmentGeometry(LINE);
  fc.assert(
    fc.property(fc.double({ min: 0, max: 1, noNaN: true }), (f) => {
      const station = g.startStation + f * g.length;
      const { point } = locateAtInternalStation(g.elements, station);
      const back = findStationOffset(g.elements, point);
      expect(back.station).toBeCloseTo(station, 7);
      expect(Math.abs(back.offset)).toBeLessThan(1e-7);
    }),
    { numRuns: 2000, seed: 99 },
  );
});

test("a point off the line inverts to its station and signed offset (right positive)", () => {
  const g = computeAlignmentGeometry(LINE);
  fc.assert(
    fc.property(fc.double({ min: 0.01, max: 0.99, noNaN: true }), fc.double({ min: -50, max: 50, noNaN: true }), (f, w) => {
      const station = g.startStation + f * g.length;
      const { point, azimuthDeg } = locateAtInternalStation(g.elements, station);
      const u = unitAtRad(mathRadFromAzimuthDeg(azimuthDeg));
      const off = addVec(point, scaleVec([u[1], -u[0]], w));
      const back = findStationOffset(g.elements, off);
      // Near a PRC or an angle point another element can be closer; only check unambiguous hits.
      if (Math.abs(back.station - station) < 1e-6) expect(back.offset).toBeCloseTo(w, 7);
    }),
    { numRuns: 2000, seed: 100 },
  );
});

test("station equations shift displayed stations and resolve an overlap by region", () => {
  const input: AlignmentInput = { ...LINE, stationEquations: [{ back: 2300, ahead: 2200 }] };
  const g = computeAlignmentGeometry(input);
  const first = locateStation(g, 2250, 0);
  const second = locateStation(g, 2250, 1);
  expect(first.point[0]).toBeCloseTo(250, 9);
  expect(second.point[0]).toBeCloseTo(350, 9);
  expect(() => locateStation(g, 2250)).toThrow(GeometryInputError);
  // The line runs east here, so a point south of it is on the right: offset +5.
  const found = findPointStation(g, [350, -5]);
  expect(found.displayStation).toBeCloseTo(2250, 9);
  expect(found.region).toBe(1);
  expect(found.offset).toBeCloseTo(5, 9);
});

test("the result survives JSON unchanged", () => {
  const g = computeAlignmentGeometry(LINE, { design: { designSpeed: 80, emaxPercent: 6 }, offsets: [15] });
  expect(JSON.parse(JSON.stringify(g))).toEqual(g);
  expect(g.centerline.type).toBe("LineString");
});

test("the densified centreline stays within the chord tolerance of the arcs", () => {
  // Sagitta M = R(1 − cos(θ/2)) (Schofield & Breach §10.1); default 1 cm.
  const g = computeAlignmentGeometry(LINE);
  const coords = g.centerline.coordinates;
  for (let i = 0; i + 1 < coords.length; i++) {
    const mid: [number, number] = [(coords[i]![0] + coords[i + 1]![0]) / 2, (coords[i]![1] + coords[i + 1]![1]) / 2];
    expect(Math.abs(findStationOffset(g.elements, mid).offset)).toBeLessThanOrEqual(0.01 + 1e-9);
  }
  const coarse = computeAlignmentGeometry(LINE, { chordTolerance: 1 });
  expect(coarse.centerline.coordinates.length).toBeLessThan(coords.length);
});

test("US-foot alignments print US stations and a gap equation skips stations", () => {
  // Mahun OASL Curves A.2: 100-ft stations; station equation "back = ahead".
  const input: AlignmentInput = {
    units: "usft",
    startStation: 1000,
    points: [
      { x: 0, y: 0 },
      { x: 1000, y: 0, curve: { type: "simple", radius: 800 } },
      { x: 1800, y: 700 },
    ],
    stationEquations: [{ back: 1500, ahead: 1600 }],
  };
  const g = computeAlignmentGeometry(input);
  expect(g.stations[0]!.stationText).toBe("10+00.00");
  const pt = g.stations.find((s) => s.label === "PT")!;
  expect(pt.displayStation).toBeCloseTo(pt.station + 100, 9);
  expect(pt.stationText).toMatch(/^\d+\+\d{2}\.\d{2}$/);
  expect(() => locateStation(g, 1550)).toThrow(GeometryInputError);
});
