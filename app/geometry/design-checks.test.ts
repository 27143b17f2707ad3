import { expect, test } from "vitest";
import { checkRadiusRatio } from "./radius-ratio-check";
import { computeAlignmentGeometry } from "./compute-alignment-geometry";
import type { AlignmentInput } from "./alignment-types";

test("compound ratio: 1.5 passes and 1.6 warns on open roads; 2.0 passes and 2.1 warns at intersections", () => {
  // TxDOT Roadway Design Manual §4.7.1 (citing AASHTO).
  expect(checkRadiusRatio(1, 600, 400).severity).toBe("ok");
  expect(checkRadiusRatio(1, 640, 400).severity).toBe("warning");
  expect(checkRadiusRatio(1, 800, 400, "intersection").severity).toBe("ok");
  expect(checkRadiusRatio(1, 840, 400, "intersection").severity).toBe("warning");
  expect(checkRadiusRatio(3, 840, 400).id).toBe("compound-ratio:pi-3");
  expect(checkRadiusRatio(3, 840, 400).source).toContain("TxDOT Roadway Design Manual §4.7.1");
});

const line = (r1: number, r2: number, gapX: number): AlignmentInput => ({
  units: "ft",
  startStation: 0,
  points: [
    { x: 0, y: 0 },
    { x: 1000, y: 0, curve: { type: "simple", radius: r1 } },
    { x: 1000 + gapX, y: 400, curve: { type: "simple", radius: r2 } },
    { x: 3000, y: 1600 },
  ],
});

test("minimum radius check flags a curve sharper than Table 3-7 and names the source", () => {
  // AASHTO Green Book 2018 Table 3-7: 50 mph at emax 6 % → 833 ft.
  const g = computeAlignmentGeometry(line(700, 2000, 800), { design: { designSpeed: 50, speedUnit: "mph", emaxPercent: 6 } });
  const check = g.checks.find((c) => c.id === "min-radius:pi-1")!;
  expect(check.severity).toBe("warning");
  expect(check.limit).toBe(833);
  expect(check.source).toContain("Table 3-7");
  expect(g.checks.find((c) => c.id === "min-radius:pi-2")!.severity).toBe("ok");
});

test("no design speed skips the speed checks", () => {
  const g = computeAlignmentGeometry(line(700, 2000, 800));
  expect(g.checks.filter((c) => c.id.startsWith("min-radius"))).toHaveLength(0);
});

test("a short tangent between same-direction curves is a broken-back warning", () => {
  // TxDOT RDM §4.7.1: tangent at least 15 × design speed (ft per mph, from memory) — 50 mph → 750 ft.
  const input: AlignmentInput = {
    units: "ft",
    startStation: 0,
    points: [
      { x: 0, y: 0 },
      { x: 1000, y: 0, curve: { type: "simple", radius: 800 } },
      { x: 1600, y: 600, curve: { type: "simple", radius: 800 } },
      { x: 1600, y: 2000 },
    ],
  };
  const g = computeAlignmentGeometry(input, { design: { designSpeed: 50, speedUnit: "mph", emaxPercent: 8 } });
  const bb = g.checks.find((c) => c.id === "broken-back:pi-2")!;
  expect(bb.severity).toBe("warning");
  expect(bb.limit).toBeCloseTo(750, 9);
  const relaxed = computeAlignmentGeometry(input, { design: { brokenBackMinTangent: 100 } });
  expect(relaxed.checks.find((c) => c.id === "broken-back:pi-2")!.severity).toBe("ok");
});

test("reverse curves report the tangent between them", () => {
  // Agency design manual §7.5.3.1 as quoted: desirably ≥ 0.6V (m per km/h) — 80 km/h → 48 m.
  const input: AlignmentInput = {
    units: "m",
    startStation: 0,
    points: [
      { x: 0, y: 0 },
      { x: 500, y: 0, curve: { type: "simple", radius: 300 } },
      { x: 900, y: 300, curve: { type: "simple", radius: 300 } },
      { x: 1500, y: 300 },
    ],
  };
  const g = computeAlignmentGeometry(input, { design: { designSpeed: 80, speedUnit: "km/h", emaxPercent: 6 } });
  const rc = g.checks.find((c) => c.id === "reverse-tangent:pi-2")!;
  expect(rc.limit).toBeCloseTo(48, 9);
  expect(rc.value).toBeGreaterThan(0);
  expect(rc.severity).toBe(rc.value >= 48 ? "ok" : "warning");
});
