import { expect, test } from "vitest";
import { degToRad, normalizeRadSigned } from "./angles";
import type { AlignmentElement, AlignmentInput } from "./alignment-types";
import { mathRadFromAzimuthDeg } from "./bearings";
import { buildCorridor } from "./corridor-build";
import { computeAlignmentGeometry } from "./compute-alignment-geometry";
import { GeometryInputError } from "./errors";

// Simple curves both ways, a compound curve, reverse curves meeting at a PRC, and an angle point.
const CURVY: AlignmentInput = {
  units: "m",
  startStation: 1000,
  points: [
    { x: 0, y: 0 },
    { x: 600, y: 0, curve: { type: "simple", radius: 400 } },
    { x: 1100, y: 500, curve: { type: "compound", radius1: 600, radius2: 350, delta1: 25 } },
    { x: 1200, y: 1300 },
    { x: 1700, y: 1900, curve: { type: "simple", radius: 250 } },
    { x: 2400, y: 2000, curve: { type: "simple", radius: 500 } },
    { x: 2900, y: 2500 },
  ],
};

function elementsOf(input: AlignmentInput): AlignmentElement[] {
  return computeAlignmentGeometry(input).elements;
}

/** L, Σ signed Δ over arcs (left positive), and Σ tan(θ/2) over angle points (signed turns). */
function closedFormTerms(els: AlignmentElement[]) {
  const length = els[els.length - 1]!.endStation - els[0]!.startStation;
  const sumDelta = els.reduce((s, e) => s + (e.type === "arc" ? degToRad(e.deltaDeg) : 0), 0);
  let sumTan = 0;
  for (let i = 1; i < els.length; i++) {
    const a = els[i - 1]!;
    const b = els[i]!;
    if (a.type === "tangent" && b.type === "tangent") sumTan += Math.tan(normalizeRadSigned(mathRadFromAzimuthDeg(b.azimuthDeg) - mathRadFromAzimuthDeg(a.azimuthDeg)) / 2);
  }
  return { length, sumDelta, sumTan };
}

/**
 * Closed form of the exact right-of-way area (parallel curves; annular sector ½Δ(Ro² − Ri²)):
 * A = L(wL + wR) + ½(wR² − wL²)ΣΔ + (wR² − wL²)Σ tan(θ/2) — the last term is the two mitre
 * triangles w²·tan(θ/2) gained outside and lost inside at each angle point (closed-form geometry).
 */
function closedFormArea(els: AlignmentElement[], wL: number, wR: number): number {
  const t = closedFormTerms(els);
  return t.length * (wL + wR) + 0.5 * (wR * wR - wL * wL) * t.sumDelta + (wR * wR - wL * wL) * t.sumTan;
}

test("corridor area equals the closed form for equal and unequal half-widths, both turns, compound, reverse and angle points", () => {
  const els = elementsOf(CURVY);
  expect(els.some((e) => e.type === "arc" && e.direction === "left")).toBe(true);
  expect(els.some((e) => e.type === "arc" && e.direction === "right")).toBe(true);
  for (const [wL, wR] of [[30, 30], [12, 45], [40, 5], [0, 20], [25, 0]] as const) {
    const c = buildCorridor(els, { left: wL, right: wR });
    const expected = closedFormArea(els, wL, wR);
    expect(Math.abs(c.area - expected) / expected).toBeLessThan(1e-9);
  }
});

test("reverse curves meeting at a PRC with no tangent between them keep the closed form", () => {
  // Two simple curves whose tangents exactly fill the leg between them meet at a PRC.
  const leg = Math.hypot(500, 500);
  const d1 = Math.atan2(500, 500);
  const t1 = 300 * Math.tan(d1 / 2);
  const r2 = (leg - t1) / Math.tan(d1 / 2);
  const els = elementsOf({ units: "m", startStation: 0, points: [{ x: 0, y: 0 }, { x: 500, y: 0, curve: { type: "simple", radius: 300 } }, { x: 1000, y: 500, curve: { type: "simple", radius: r2 } }, { x: 2000, y: 500 }] });
  expect(els.filter((e) => e.type === "tangent").length).toBe(2);
  const c = buildCorridor(els, { left: 20, right: 35 });
  expect(Math.abs(c.area - closedFormArea(els, 20, 35)) / c.area).toBeLessThan(1e-9);
});

test("an angle point without a curve mitres the lines exactly: area matches w²·tan(θ/2) per side", () => {
  const els = elementsOf({ units: "m", startStation: 0, points: [{ x: 0, y: 0 }, { x: 400, y: 0 }, { x: 700, y: 300 }, { x: 700, y: 800 }] });
  const c = buildCorridor(els, { left: 10, right: 25 });
  expect(Math.abs(c.area - closedFormArea(els, 10, 25)) / c.area).toBeLessThan(1e-12);
  // The mitre corners of neighbouring pieces are the same points, so the lines meet.
  for (let i = 1; i < c.pieces.length; i++) {
    expect(c.pieces[i]!.corners[0]).toEqual(c.pieces[i - 1]!.corners[1]);
    expect(c.pieces[i]!.corners[3]).toEqual(c.pieces[i - 1]!.corners[2]);
  }
});

test("pieces are at most 90° slices, in station order, and cover the line without gaps", () => {
  const points: AlignmentInput["points"] = [
    { x: 0, y: 0 },
    { x: 1000, y: 0, curve: { type: "simple", radius: 200 } },
    { x: 1000, y: -1000, curve: { type: "simple", radius: 150 } },
    { x: -500, y: -1000 },
  ];
  const els = elementsOf({ units: "m", startStation: 0, points });
  const c = buildCorridor(els, { left: 20, right: 20 });
  let station = c.stationFrom;
  for (const p of c.pieces) {
    expect(p.stationFrom).toBeCloseTo(station, 9);
    station = p.stationTo;
    if (p.kind === "annular") expect(p.sweepRad).toBeLessThanOrEqual(Math.PI / 2 + 1e-12);
  }
  expect(station).toBe(c.stationTo);
});

test("a taper on a tangent is an exact trapezoid: the area changes by T·Δw/2 per side", () => {
  const els = elementsOf({ units: "m", startStation: 0, points: [{ x: 0, y: 0 }, { x: 1000, y: 0 }] });
  const base = buildCorridor(els, { left: 20, right: 20 });
  // Range 400–600 at left 35, tapering over 50 m each way: extra = 15 × (200 + 50) m² (trapezoid areas).
  const wide = buildCorridor(els, { left: 20, right: 20, ranges: [{ fromStation: 400, toStation: 600, left: 35, transition: 50 }] });
  expect(wide.area - base.area).toBeCloseTo(15 * 250, 9);
});

test("a taper on a curve follows the spiral edge to within 0.5 mm and its area is the spiral's ½∫r²dθ", () => {
  const els = elementsOf({ units: "m", startStation: 0, points: [{ x: 0, y: 0 }, { x: 500, y: 0, curve: { type: "simple", radius: 300 } }, { x: 900, y: 400 }] });
  const arc = els.find((e) => e.type === "arc")!;
  const from = arc.startStation + 60;
  const to = arc.startStation + 140;
  const T = 40;
  const c = buildCorridor(els, { left: 20, right: 20, ranges: [{ fromStation: from, toStation: to, right: 32, transition: T }] });
  const base = buildCorridor(els, { left: 20, right: 20 });
  // Left turn: the right side is outside, r = R + w. Full range: annulus of R+20 → R+32 over (to − from)/R;
  // each taper: spiral from R+20 to R+32 over T/R, area ½δ(r0² + r0r1 + r1²)/3 minus the base sector ½δr0².
  const R = 300;
  const r0 = R + 20;
  const r1 = R + 32;
  const full = 0.5 * ((to - from) / R) * (r1 * r1 - r0 * r0);
  const taper = 0.5 * (T / R) * ((r0 * r0 + r0 * r1 + r1 * r1) / 3 - r0 * r0);
  const expected = full + 2 * taper;
  // A 0.5 mm band along the two tapers bounds the difference.
  expect(Math.abs(c.area - base.area - expected)).toBeLessThan(0.0005 * 2 * T * (r1 / R));
  const tapered = c.pieces.filter((p) => p.kind === "annular" && p.tapered);
  expect(tapered.length).toBeGreaterThan(1);
  for (const p of tapered) {
    if (p.kind !== "annular") continue;
    for (let k = 0; k <= 16; k++) {
      const q = k / 16;
      const theta = Math.atan2(p.rayFrom[1], p.rayFrom[0]) + p.turn * q * p.sweepRad;
      const u: [number, number] = [Math.cos(theta), Math.sin(theta)];
      const s = p.stationFrom + q * (p.stationTo - p.stationFrom);
      const w = s <= from ? 20 + (12 * (s - (from - T))) / T : s >= to ? 32 - (12 * (s - to)) / T : 32;
      const o = p.outer;
      const proj = o.center[0] * u[0] + o.center[1] * u[1];
      const dist = proj + Math.sqrt(proj * proj - (o.center[0] ** 2 + o.center[1] ** 2) + o.radius ** 2);
      expect(Math.abs(dist - (R + w))).toBeLessThan(0.0005);
    }
  }
});

test("the easement corridor is the right-of-way widened by e each side", () => {
  const els = elementsOf(CURVY);
  const c = buildCorridor(els, { left: 15, right: 22, easement: 4 });
  expect(c.easement).not.toBeNull();
  const expected = closedFormArea(els, 19, 26) - closedFormArea(els, 15, 22);
  expect(Math.abs(c.easementArea - expected) / expected).toBeLessThan(1e-8);
});

test("an inside half-width reaching a curve's radius is refused", () => {
  const els = elementsOf({ units: "m", startStation: 0, points: [{ x: 0, y: 0 }, { x: 500, y: 0, curve: { type: "simple", radius: 50 } }, { x: 600, y: 400 }] });
  expect(() => buildCorridor(els, { left: 50, right: 10 })).toThrow(expect.objectContaining({ code: "offset_exceeds_radius", details: expect.objectContaining({ field: "corridor.left" }) }));
  expect(() => buildCorridor(els, { left: 30, right: 10, easement: 25 })).toThrow(expect.objectContaining({ code: "offset_exceeds_radius", details: expect.objectContaining({ field: "corridor.easement" }) }));
  expect(buildCorridor(els, { left: 10, right: 60 }).area).toBeGreaterThan(0);
});

test("bad widths, overlapping ranges and mitres that cross are refused with codes", () => {
  const els = elementsOf({ units: "m", startStation: 0, points: [{ x: 0, y: 0 }, { x: 400, y: 0 }, { x: 410, y: 30 }, { x: 0, y: 60 }] });
  expect(() => buildCorridor(els, { left: 40, right: 40 })).toThrow(expect.objectContaining({ code: "tangent_overrun" }));
  const straight = elementsOf({ units: "m", startStation: 0, points: [{ x: 0, y: 0 }, { x: 1000, y: 0 }] });
  expect(() => buildCorridor(straight, { left: -1, right: 10 })).toThrow(expect.objectContaining({ code: "out_of_range", details: { field: "corridor.left", value: -1 } }));
  expect(() => buildCorridor(straight, { left: 0, right: 0 })).toThrow(GeometryInputError);
  expect(() => buildCorridor(straight, { left: Number.NaN, right: 10 })).toThrow(expect.objectContaining({ code: "invalid_number" }));
  const overlap = { left: 10, right: 10, ranges: [{ fromStation: 100, toStation: 200, left: 20, transition: 30 }, { fromStation: 220, toStation: 300, left: 5, transition: 0 }] };
  expect(() => buildCorridor(straight, overlap)).toThrow(expect.objectContaining({ code: "out_of_range", details: { field: "corridor.ranges.1.fromStation" } }));
  expect(() => buildCorridor(straight, { left: 10, right: 10, easement: -2 })).toThrow(expect.objectContaining({ code: "out_of_range" }));
  expect(() => buildCorridor([], { left: 10, right: 10 })).toThrow(expect.objectContaining({ code: "invalid_alignment" }));
});
