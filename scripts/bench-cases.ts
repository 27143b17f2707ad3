/**
 * Named benchmark cases for the geometry engine. Add a case by appending to `benchCases`;
 * `scripts/bench.ts` times every case and prints median and p95.
 */
import {
  COMPOUND_ANGLE_KEYS,
  COMPOUND_LENGTH_KEYS,
  computeAlignmentGeometry,
  computeCompoundCurve,
  solveCompoundCurve,
  type AlignmentInput,
  type CompoundCurve,
  type CompoundGiven,
} from "../app/geometry";

export interface BenchCase {
  name: string;
  /** Target the product promises for one run, milliseconds (printed beside the result). */
  targetMs?: number;
  /** Number of timed runs (after warm-up). */
  runs: number;
  /** One run; called `runs` times with the run index. */
  run(i: number): void;
}

const CURVES: CompoundCurve[] = [
  [400, 300, 36, 50],
  [600, 400, 45, 20],
  [150, 900, 12, 70],
  [2500, 800, 15, 60],
  [90, 260, 55, 40],
].map(([radius1, radius2, delta1, delta2]) => computeCompoundCurve({ radius1: radius1!, radius2: radius2!, delta1: delta1!, delta2: delta2! }));

function givenOf(c: CompoundCurve, keys: (keyof CompoundGiven)[]): CompoundGiven {
  const g: CompoundGiven = {};
  for (const k of keys) if (k !== "commonTangentParallelToLongChord") g[k] = c[k];
  return g;
}

function solveCase(name: string, keys: (keyof CompoundGiven)[]): BenchCase {
  const inputs = CURVES.map((c) => givenOf(c, keys));
  return { name: `solve ${name}`, targetMs: 1, runs: 2000, run: (i) => void solveCompoundCurve(inputs[i % inputs.length]!) };
}

function allFourSubsets(): (keyof CompoundGiven)[][] {
  const keys = [...COMPOUND_LENGTH_KEYS, ...COMPOUND_ANGLE_KEYS];
  const out: (keyof CompoundGiven)[][] = [];
  for (let a = 0; a < keys.length; a++)
    for (let b = a + 1; b < keys.length; b++)
      for (let c = b + 1; c < keys.length; c++) for (let d = c + 1; d < keys.length; d++) out.push([keys[a]!, keys[b]!, keys[c]!, keys[d]!]);
  return out;
}

const MIXED = allFourSubsets().flatMap((keys) => CURVES.map((c) => givenOf(c, keys)));

// Curves whose common tangent is parallel to the long chord: R2 = R1(1 − cos Δ1)/(1 − cos Δ2).
const PARALLEL_CURVES: CompoundCurve[] = [
  [400, 36, 50],
  [900, 30, 45],
  [250, 60, 25],
].map(([r1, d1, d2]) => {
  const r2 = (r1! * (1 - Math.cos((d1! * Math.PI) / 180))) / (1 - Math.cos((d2! * Math.PI) / 180));
  return computeCompoundCurve({ radius1: r1!, radius2: r2, delta1: d1!, delta2: d2! });
});

function parallelCase(name: string, keys: (keyof CompoundGiven)[]): BenchCase {
  const inputs = PARALLEL_CURVES.map((c) => ({ ...givenOf(c, keys), commonTangentParallelToLongChord: true }));
  return { name: `solve ${name}`, targetMs: 1, runs: 2000, run: (i) => void solveCompoundCurve(inputs[i % inputs.length]!) };
}

// Sets that leave both angles free after the closed forms: one item of each arc (R, t or L) and
// two of T_PC, T_PT, LC and one chord angle (the parallel sets are timed above).
const ARC_ITEMS = [["radius1", "subTangent1", "length1"], ["radius2", "subTangent2", "length2"]] as const;
const TRIANGLE_PAIRS = [["tangentPC", "tangentPT"], ["tangentPC", "longChord"], ["tangentPT", "longChord"], ["tangentPC", "chordAnglePC"], ["tangentPC", "chordAnglePT"], ["tangentPT", "chordAnglePC"], ["tangentPT", "chordAnglePT"], ["longChord", "chordAnglePC"], ["longChord", "chordAnglePT"]] as const;
const TWO_ANGLE = ARC_ITEMS[0].flatMap((a) => ARC_ITEMS[1].flatMap((b) => TRIANGLE_PAIRS.map((p) => [a, b, ...p] as (keyof CompoundGiven)[]))).flatMap((keys) =>
  CURVES.map((c) => givenOf(c, keys)),
);

/** A 10.5 km metric line of 21 legs with 20 curves (every fourth compound), zig-zagging east. */
export function makeTenKmAlignment(): AlignmentInput {
  const points: AlignmentInput["points"] = [{ x: 0, y: 0 }];
  let heading = 0;
  let x = 0;
  let y = 0;
  for (let i = 1; i <= 21; i++) {
    x += 500 * Math.cos(heading);
    y += 500 * Math.sin(heading);
    const turn = ((i % 2 === 0 ? 1 : -1) * (20 + (i % 5) * 2) * Math.PI) / 180;
    heading += turn;
    const radius = 350 + (i % 4) * 60;
    const curve = i % 4 === 0 ? { type: "compound" as const, radius1: radius, radius2: radius * 1.4, delta1: 8 } : { type: "simple" as const, radius };
    points.push(i === 21 ? { x, y } : { x, y, curve });
  }
  return { units: "m", startStation: 0, points, stationEquations: [{ back: 5000, ahead: 5100 }] };
}

const TEN_KM = makeTenKmAlignment();

export const benchCases: BenchCase[] = [
  solveCase("{R1, R2, Δ1, Δ2}", ["radius1", "radius2", "delta1", "delta2"]),
  solveCase("{Δ, R1, T_PC, T_PT}", ["delta", "radius1", "tangentPC", "tangentPT"]),
  solveCase("{LC, φ_PC, φ_PT, R1}", ["longChord", "chordAnglePC", "chordAnglePT", "radius1"]),
  solveCase("{Δ, R1, R2, T_PC}", ["delta", "radius1", "radius2", "tangentPC"]),
  solveCase("{R1, R2, Δ, L1}", ["radius1", "radius2", "delta", "length1"]),
  solveCase("{R1, R2, Δ, LC} (numeric 1-D)", ["radius1", "radius2", "delta", "longChord"]),
  solveCase("{R1, R2, T_PC, T_PT} (numeric 2-D)", ["radius1", "radius2", "tangentPC", "tangentPT"]),
  solveCase("{R1, T_PT, t2, LC} (numeric 2-D, reversed sweep)", ["radius1", "tangentPT", "subTangent2", "longChord"]),
  solveCase("{T_PC, T_PT, L1, L2} (numeric 2-D, contour)", ["tangentPC", "tangentPT", "length1", "length2"]),
  parallelCase("{T_PC, T_PT, R1, parallel} (numeric 2-D)", ["tangentPC", "tangentPT", "radius1"]),
  {
    name: "solve any two-angle set (81 sets × 5 curves)",
    targetMs: 1,
    runs: 3000,
    run: (i) => void solveCompoundCurve(TWO_ANGLE[(i * 7919) % TWO_ANGLE.length]!),
  },
  {
    name: "solve any 4-subset of knowns (mixed, errors included)",
    targetMs: 1,
    runs: 5000,
    run: (i) => {
      try {
        solveCompoundCurve(MIXED[(i * 7919) % MIXED.length]!);
      } catch {
        // Dependent sets throw missing_knowns; timing them is part of the mix.
      }
    },
  },
  {
    name: "10 km alignment, 20 curves: elements + checks + densify (1 cm) + 4 offsets",
    targetMs: 20,
    runs: 300,
    run: () =>
      void computeAlignmentGeometry(TEN_KM, { design: { designSpeed: 80, speedUnit: "km/h", emaxPercent: 6 }, offsets: [-30, -15, 15, 30] }),
  },
];
