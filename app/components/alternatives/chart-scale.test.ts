import { expect, test } from "vitest";
import { linearScale, niceTicks, shortNumber, tickLabel, valueExtent } from "./chart-scale";

test("a linear scale maps the ends of the domain to the ends of the range, and the middle to the middle", () => {
  const y = linearScale([0, 200], [150, 10]);
  expect(y(0)).toBe(150);
  expect(y(200)).toBe(10);
  expect(y(100)).toBe(80);
  expect(linearScale([5, 5], [0, 10])(5)).toBe(5);
});

test("nice ticks step by 1, 2 or 5 × 10ⁿ (Heckbert, Graphics Gems 1990) and stay inside the range", () => {
  expect(niceTicks(0, 10, 6)).toEqual([0, 2, 4, 6, 8, 10]);
  expect(niceTicks(300, 1200, 5)).toEqual([400, 600, 800, 1000, 1200]);
  expect(niceTicks(0, 0.7, 8)).toEqual([0, 0.1, 0.2, 0.3, 0.4, 0.5, 0.6, 0.7]);
  expect(niceTicks(12, 12)).toEqual([12]);
  const t = niceTicks(23_456, 98_765, 5);
  expect(t[0]).toBeGreaterThanOrEqual(23_456);
  expect(t[t.length - 1]).toBeLessThanOrEqual(98_765);
  expect(t.every((v, i) => i === 0 || Math.abs(v - t[i - 1]! - 20_000) < 1e-6)).toBe(true);
});

test("value axes start at zero for counts and areas, and ignore missing steps", () => {
  expect(valueExtent([10, 20, Number.NaN])).toEqual([0, 21]);
  expect(valueExtent([])).toEqual([0, 1]);
  expect(valueExtent([0, 0])).toEqual([0, 1]);
  // Around the data for a sweep: 100…200 padded by 5 % of the spread either side.
  expect(valueExtent([100, 200, 150], false)).toEqual([95, 205]);
  expect(valueExtent([40, 40], false)).toEqual([38, 42]);
  expect(shortNumber(12_500)).toBe("12.5k");
  expect(shortNumber(3_400_000)).toBe("3.4M");
});

test("tick labels keep enough decimals to tell neighbouring ticks apart", () => {
  expect([150_800, 151_000, 151_200].map((v) => tickLabel(v, 200))).toEqual(["150.8k", "151k", "151.2k"]);
  expect([0, 0.25, 0.5].map((v) => tickLabel(v, 0.25))).toEqual(["0", "0.25", "0.5"]);
  expect(tickLabel(3_400_000, 100_000)).toBe("3.4M");
  expect(tickLabel(400, 100)).toBe("400");
  // Counts: a minimum step of 1 gives whole-number ticks only.
  expect(niceTicks(13, 15, 5, 1)).toEqual([13, 14, 15]);
});
