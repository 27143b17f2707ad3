import { expect, test } from "vitest";
import { createTakeSession } from "~/geometry/take-session";
import type { TakeParcelInput } from "~/geometry/take-types";
import { evaluateAlternative, type EvaluationInputs } from "./evaluate-alternative";
import { defaultTakeRules } from "./take-rules";

const X0 = 560_000;
const Y0 = 4_420_000;
const at = (x: number, y: number) => ({ x: X0 + x, y: Y0 + y });
/** One 100 × 100 m parcel around the point where leg 2 crosses leg 0 (x = 750, y = 0). */
const square = (cx: number, cy: number): TakeParcelInput => ({ parcelId: "P-1", polygons: [[[[X0 + cx - 50, Y0 + cy - 50], [X0 + cx + 50, Y0 + cy - 50], [X0 + cx + 50, Y0 + cy + 50], [X0 + cx - 50, Y0 + cy + 50], [X0 + cx - 50, Y0 + cy - 50]]]] });

function inputs(points: EvaluationInputs["alignment"]["points"], acceptedChecks: EvaluationInputs["acceptedChecks"] = []): EvaluationInputs {
  return { alignment: { units: "m", startStation: 0, points }, corridor: { left: 10, right: 10 }, rules: defaultTakeRules("m"), design: { designSpeed: 30, speedUnit: "km/h" }, acceptedChecks };
}

test("a corridor that crosses itself is a warning beside the design checks, and the ground both legs cover is taken once", () => {
  const crossing = inputs([at(0, 0), at(1000, 0), at(1000, 400), at(500, -400)]);
  const evaluation = evaluateAlternative(crossing, createTakeSession([square(750, 0)]));
  const check = evaluation.checks.find((c) => c.id === "corridor-self-overlap-1");
  // Two 20 m strips crossing at θ with sin θ = 800 / √(500² + 800²): a parallelogram 20 · 20 / sin θ (closed form).
  const doubled = (20 * 20) / (800 / Math.hypot(500, 800));
  expect(check?.severity).toBe("warning");
  expect(check?.value).toBeCloseTo(doubled, 6);
  // The parcel holds the whole crossing: its take is both strips less the parallelogram they share
  // (leg 0 crosses it side to side, leg 2 top to bottom: W · 100 and W · 100 / sin θ, closed form).
  const strips = 100 * 20 + 20 * (100 / (800 / Math.hypot(500, 800)));
  const take = evaluation.takes.parcels[0]!;
  expect(take.takeArea).toBeCloseTo(strips - doubled, 6);
  // The two strips cut the square into four corners, which together are what is left.
  expect(take.remainderPieces).toBe(4);
  expect(take.remainderPieceAreas.reduce((s, a) => s + a, 0)).toBeCloseTo(100 * 100 - (strips - doubled), 6);
  expect(evaluation.takes.warnings.some((w) => w.includes("same ground twice"))).toBe(true);
  expect(evaluation.summary.checkWarnings).toBeGreaterThanOrEqual(1);
});

test("the warning can be accepted with a reason like any design check, and is absent when the legs do not meet", () => {
  const crossing = inputs([at(0, 0), at(1000, 0), at(1000, 400), at(500, -400)], [{ id: "corridor-self-overlap-1", reason: "Loop ramp: measured by the survey team" }]);
  const accepted = evaluateAlternative(crossing, createTakeSession([square(750, 0)]));
  expect(accepted.checks.find((c) => c.id === "corridor-self-overlap-1")?.accepted?.reason).toContain("Loop ramp");
  const apart = evaluateAlternative(inputs([at(0, 0), at(1000, 0), at(1000, 400), at(1500, 900)]), createTakeSession([square(750, 0)]));
  expect(apart.checks.some((c) => c.id.startsWith("corridor-self-overlap"))).toBe(false);
});
