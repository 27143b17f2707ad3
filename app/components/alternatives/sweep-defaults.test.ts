import { expect, test } from "vitest";
import { applySweepValue, defaultSweepRange, sweepVariablesFor } from "./sweep-defaults";

test("a simple curve sweeps its radius; a compound one R1, R2 and Δ1", () => {
  expect(sweepVariablesFor({ type: "simple", radius: 400 })).toEqual(["radius"]);
  expect(sweepVariablesFor(undefined)).toEqual(["radius"]);
  expect(sweepVariablesFor({ type: "compound", radius1: 400, radius2: 600, delta1: 10 })).toEqual(["radius1", "radius2", "delta1"]);
});

test("the default radius range spans half to twice the current radius and reaches below the minimum radius", () => {
  expect(defaultSweepRange("radius", { type: "simple", radius: 600 }, 30, 250)).toEqual({ from: 200, to: 1200, steps: 20 });
  expect(defaultSweepRange("radius", { type: "simple", radius: 600 }, 30, null)).toEqual({ from: 300, to: 1200, steps: 20 });
  expect(defaultSweepRange("delta1", { type: "compound", radius1: 400, radius2: 600, delta1: 10 }, -40, 250)).toEqual({ from: 4, to: 36, steps: 20 });
});

test("a picked value replaces only the varied parameter", () => {
  const compound = { type: "compound", radius1: 400, radius2: 600, delta1: 10 } as const;
  expect(applySweepValue(compound, "radius2", 650)).toEqual({ type: "compound", radius1: 400, radius2: 650, delta1: 10 });
  expect(applySweepValue(compound, "delta1", 12.5)).toEqual({ type: "compound", radius1: 400, radius2: 600, delta1: 12.5 });
  expect(applySweepValue(undefined, "radius", 500)).toEqual({ type: "simple", radius: 500 });
});
