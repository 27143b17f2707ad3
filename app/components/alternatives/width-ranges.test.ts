import { expect, test } from "vitest";
import { createWidthProfile } from "~/geometry/corridor-widths";
import type { CorridorWidthRange } from "~/geometry/take-types";
import { checkWidthRanges, parseRangeText, rangeToText, sortRanges } from "./width-ranges";

const BASE = { left: 20, right: 20 };
const EXTENT = { start: 0, end: 500 };
const range = (fromStation: number, toStation: number, transition: number, extra: Partial<CorridorWidthRange> = {}): CorridorWidthRange => ({ fromStation, toStation, transition, ...extra });

test("stations are read and shown in the project's notation: 12+34.56 is 1 234.56 ft, 0+150.000 is 150 m", () => {
  // US stations are 100 ft (Mahun, OASL Curves A.2 "Stationing"); metric km+metres is common practice.
  const us = parseRangeText({ from: "12+34.56", to: "15+00.00", left: "", right: "30", transition: "" }, "us");
  expect(us).toEqual({ range: { fromStation: 1234.56, toStation: 1500, transition: 0, right: 30 } });
  const metric = parseRangeText({ from: "0+150.000", to: "250", left: "0", right: "", transition: "20" }, "metric");
  expect(metric).toEqual({ range: { fromStation: 150, toStation: 250, transition: 20, left: 0 } });
  expect(rangeToText(range(1150, 1250.5, 20, { right: 30 }), "metric")).toEqual({ from: "1+150.000", to: "1+250.500", left: "", right: "30", transition: "20" });
});

test("a station stored to more decimals than shown keeps its value when another field is edited", () => {
  const stored = range(150.00049, 250, 20);
  const text = { ...rangeToText(stored, "metric"), right: "25" };
  expect(text.from).toBe("0+150.000");
  expect(parseRangeText(text, "metric", stored)).toEqual({ range: { fromStation: 150.00049, toStation: 250, transition: 20, right: 25 } });
  // Typed again, it is what was typed.
  expect(parseRangeText({ ...text, from: "0+150.001" }, "metric", stored)).toMatchObject({ range: { fromStation: 150.001 } });
});

test("text that is not a station or a number is refused with a message naming the field", () => {
  expect(parseRangeText({ from: "1+2", to: "300", left: "", right: "", transition: "" }, "metric")).toEqual({ error: expect.stringContaining("From station is not a station") });
  expect(parseRangeText({ from: "100", to: "300", left: "wide", right: "", transition: "" }, "metric")).toEqual({ error: expect.stringContaining("Left half-width must be a number") });
});

test("each rule the engine enforces gets a message on its row; a good set has none", () => {
  expect(checkWidthRanges([range(150, 250, 20, { right: 30 })], BASE, EXTENT, "metric")).toEqual([null]);
  expect(checkWidthRanges([range(250, 150, 0)], BASE, EXTENT, "metric")[0]).toMatch(/must end ahead of where it starts \(0\+250\.000 to 0\+150\.000\)/);
  expect(checkWidthRanges([range(100, 200, 0, { right: -1 })], BASE, EXTENT, "metric")[0]).toMatch(/right half-width cannot be negative/);
  expect(checkWidthRanges([range(100, 200, -5)], BASE, EXTENT, "metric")[0]).toMatch(/transition cannot be negative/);
  expect(checkWidthRanges([range(100, 200, 0, { left: 10_001 })], BASE, EXTENT, "metric")[0]).toMatch(/at most 10,000/);
  expect(checkWidthRanges([range(100, 200, 0, { left: 0, right: 0 })], BASE, EXTENT, "metric")[0]).toMatch(/width on at least one side/);
  // A blank side takes the base width, so one zero side is fine.
  expect(checkWidthRanges([range(100, 200, 0, { left: 0 })], BASE, EXTENT, "metric")).toEqual([null]);
});

test("a range must lie within the alignment's stations; its taper may run past an end", () => {
  expect(checkWidthRanges([range(-1, 100, 0)], BASE, EXTENT, "metric")[0]).toMatch(/starts before the alignment's first station, 0\+000\.000/);
  expect(checkWidthRanges([range(400, 501, 0)], BASE, EXTENT, "metric")[0]).toMatch(/ends beyond the alignment's last station, 0\+500\.000/);
  expect(checkWidthRanges([range(0, 500, 30)], BASE, EXTENT, "metric")).toEqual([null]);
  // The end station as shown (0+500.000) is accepted when the length is a hair under 500.
  expect(checkWidthRanges([range(400, 500, 0)], BASE, { start: 0, end: 499.9999996 }, "metric")).toEqual([null]);
  expect(checkWidthRanges([range(-1, 100, 0)], BASE, null, "metric")).toEqual([null]);
});

test("overlaps, tapers included, are flagged on both ranges; ranges whose tapers touch are fine", () => {
  const touching = [range(100, 200, 20), range(240, 300, 20)];
  expect(checkWidthRanges(touching, BASE, EXTENT, "metric")).toEqual([null, null]);
  const overlapping = [range(100, 200, 20), range(239, 300, 20)];
  const messages = checkWidthRanges(overlapping, BASE, EXTENT, "metric");
  expect(messages[0]).toMatch(/overlaps range 2 \(tapers included: 0\+080\.000–0\+220\.000 against 0\+219\.000–0\+320\.000\)/);
  expect(messages[1]).toMatch(/overlaps range 1/);
});

test("the checks agree with the engine: a set passes here exactly when createWidthProfile accepts it", () => {
  // Deterministic pseudo-random sets (a linear congruential generator, Numerical Recipes constants).
  let seed = 12345;
  const next = () => (seed = (seed * 1664525 + 1013904223) % 2 ** 32) / 2 ** 32;
  for (let n = 0; n < 400; n++) {
    const ranges = Array.from({ length: 1 + Math.floor(next() * 3) }, () => {
      const from = Math.round(next() * 400);
      return range(from, from + Math.round(next() * 120) - 10, Math.round(next() * 40) - 4, next() < 0.3 ? { left: Math.round(next() * 30) - 3 } : {});
    });
    const ours = checkWidthRanges(ranges, BASE, null, "metric").every((m) => m === null);
    let engine = true;
    try {
      createWidthProfile({ ...BASE, ranges });
    } catch {
      engine = false;
    }
    expect({ ranges, ours }).toEqual({ ranges, ours: engine });
  }
});

test("ranges are kept in station order", () => {
  expect(sortRanges([range(300, 400, 0), range(100, 200, 0)]).map((r) => r.fromStation)).toEqual([100, 300]);
});
