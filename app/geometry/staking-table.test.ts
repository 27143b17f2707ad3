import { expect, test } from "vitest";
import { computeStakingTable } from "./staking-table";
import { parseAngleDeg } from "./angles";
import { computeRadiusFromDegree } from "./degree-of-curve";
import { GeometryInputError } from "./errors";

const ONE_SECOND = 1 / 3600;

test("Mahun set 2 deflection table from BC 50+84.98 at 100-ft stations", () => {
  // Mahun OASL Horizontal Curves Set 2, problem 1: station, deflection, chord. The page's
  // 53+00 values (7°42'00", 214.38) recompute to 7°41'59.4" and 214.37, so allow 1" and 0.01 ft.
  const rows = computeStakingTable({ radius: 800, deltaDeg: parseAngleDeg(`45°49'45"`), pcStation: 5084.98 }, { interval: 100 });
  const expected: [number, string, number][] = [
    [5100, `0°32'17"`, 15.02],
    [5200, `4°07'08"`, 114.92],
    [5300, `7°42'00"`, 214.38],
    [5500, `14°51'43"`, 410.38],
    [5700, `22°01'26"`, 599.99],
  ];
  for (const [station, deflection, chord] of expected) {
    const row = rows.find((r) => Math.abs(r.station - station) < 1e-9)!;
    expect(Math.abs(row.deflectionDeg - parseAngleDeg(deflection))).toBeLessThanOrEqual(ONE_SECOND);
    expect(Math.abs(row.chordFromPc - chord)).toBeLessThanOrEqual(0.01 + 1e-9);
  }
  const pt = rows[rows.length - 1]!;
  expect(pt.label).toBe("PT");
  expect(pt.station).toBeCloseTo(5724.88, 2);
  // Our reference notes list the EC deflection as 24°54'52" "(= Δ/2)", but Δ/2 of 45°49'45" is
  // 22°54'52.5"; the "24" is a transcription slip, so the check is against Δ/2 itself.
  expect(Math.abs(pt.deflectionDeg - parseAngleDeg(`22°54'52.5"`))).toBeLessThanOrEqual(ONE_SECOND / 10);
  expect(pt.chordFromPc).toBeCloseTo(622.97, 2);
});

test("the deflection at the PT is half of Δ (the built-in check)", () => {
  // NAVEDTRA 14070 Engineering Aid, "Solving a Simple Curve".
  const rows = computeStakingTable({ radius: 412.3, deltaDeg: 63.25, pcStation: 1234.5 }, { interval: 20 });
  expect(rows[rows.length - 1]!.deflectionDeg).toBeCloseTo(63.25 / 2, 12);
});

test("D = 15° with 50-ft stations: each full chord deflects D/4 = 3°45', first sub-chord 42.2 ft", () => {
  // NAVEDTRA 14070, "Solving a Simple Curve": PC 18+07.80, D = 15°, 50-ft stations.
  const r = computeRadiusFromDegree(15, "arc-100ft");
  const rows = computeStakingTable({ radius: r, deltaDeg: 40, pcStation: 1807.8 }, { interval: 50 });
  expect(rows[1]!.arcFromPc).toBeCloseTo(42.2, 9);
  // Sub-chord deflection d = 0.3·c·D minutes (same source).
  expect(rows[1]!.deflectionDeg * 60).toBeCloseTo(0.3 * 42.2 * 15, 9);
  expect(rows[2]!.deflectionDeg - rows[1]!.deflectionDeg).toBeCloseTo(3.75, 9);
});

test("sub-chords chain from the PC and sum of arcs is the curve length", () => {
  const rows = computeStakingTable({ radius: 800, deltaDeg: 30, pcStation: 100.5 }, { interval: 25 });
  const total = rows.reduce((s, r, i) => s + (i === 0 ? 0 : r.arcFromPc - rows[i - 1]!.arcFromPc), 0);
  expect(total).toBeCloseTo((800 * 30 * Math.PI) / 180, 9);
  expect(rows[0]!.subChord).toBe(0);
  expect(rows[1]!.subChord).toBeCloseTo(rows[1]!.chordFromPc, 12);
});

test("bad interval is a typed error", () => {
  expect(() => computeStakingTable({ radius: 800, deltaDeg: 30, pcStation: 0 }, { interval: 0 })).toThrow(GeometryInputError);
  expect(() => computeStakingTable({ radius: 800, deltaDeg: 190, pcStation: 0 }, { interval: 10 })).toThrow(GeometryInputError);
});
