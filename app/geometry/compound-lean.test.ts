import { expect, test } from "vitest";
import { evaluateCompoundCore } from "./compound-core";
import { residualOf, type Known } from "./compound-knowns";
import { computeLeanResiduals, UnitCoefficients } from "./compound-lean";

const KNOWNS: Known[] = [
  ["radius1", 410], ["radius2", 290], ["subTangent1", 130], ["subTangent2", 140], ["length1", 250], ["length2", 260],
  ["tangentPC", 330], ["tangentPT", 300], ["longChord", 520],
].map(([key, value]) => ({ key, kind: "length", value }) as Known);
const ANGLES: Known[] = [
  { key: "delta", kind: "angle", value: 1.4 }, { key: "delta1", kind: "angle", value: 0.6 }, { key: "delta2", kind: "angle", value: 0.9 },
  { key: "chordAnglePC", kind: "angle", value: 0.7 }, { key: "chordAnglePT", kind: "angle", value: 0.75 },
  { key: "commonTangentParallelToLongChord", kind: "condition", value: 0 },
];

test("lean residuals equal the full forward solution's residuals for every known", () => {
  // The check value 6 curve (R1 400 / 36°, R2 300 / 50°) and a sharp, nearly reversed one.
  for (const [r1, r2, d1, d2] of [[400, 300, 0.6283, 0.8727], [35, 900, 2.1, 0.9], [5000, 120, 0.1, 2.9]] as const) {
    const lean = computeLeanResiduals([...KNOWNS, ...ANGLES], r1, r2, new UnitCoefficients(d1, d2));
    const core = evaluateCompoundCore(r1, r2, d1, d2);
    const full = [...KNOWNS, ...ANGLES].map((k) => residualOf(core, k));
    lean.forEach((v, i) => expect(v).toBeCloseTo(full[i]!, 11));
  }
});
