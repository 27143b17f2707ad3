import { expect, test } from "vitest";
import { findSampledZeros, refineZero } from "./compound-zero-scan";

// Closed-form roots throughout: polynomials with chosen roots, sin x (zeros at kπ), ∛2.

function samples(lo: number, hi: number, n: number): number[] {
  return Array.from({ length: n + 1 }, (_, k) => lo + ((hi - lo) * k) / n);
}

function zerosOf(f: (x: number) => number, xs: number[], touch = 0): number[] {
  return findSampledZeros(f, xs, xs.map(f), touch).sort((a, b) => a - b);
}

test("Brent's method takes a sign change to round-off", () => {
  const f = (x: number) => x * x * x - 2;
  expect(Math.abs(refineZero(f, 0, 2, f(0), f(2)) - Math.cbrt(2))).toBeLessThanOrEqual(4e-16);
});

test("every sign change between samples is a zero: sin x on (0.1, 10) has zeros π, 2π, 3π", () => {
  const zeros = zerosOf(Math.sin, samples(0.1, 10, 40));
  expect(zeros).toHaveLength(3);
  zeros.forEach((z, k) => expect(Math.abs(z - (k + 1) * Math.PI)).toBeLessThan(1e-14));
});

test("two zeros inside one sample spacing are found from the dip between them", () => {
  // (x − 1)(x − 1.0001)(x − 3): the first two lie 1e-4 apart, samples are 0.25 apart.
  const f = (x: number) => (x - 1) * (x - 1.0001) * (x - 3);
  const zeros = zerosOf(f, samples(0.13, 4.13, 16));
  expect(zeros).toHaveLength(3);
  [1, 1.0001, 3].forEach((r, k) => expect(Math.abs(zeros[k]! - r)).toBeLessThan(1e-13));
});

test("a dip that stops short of zero gives no zero", () => {
  const f = (x: number) => (x - 1) * (x - 1) + 1e-9;
  expect(zerosOf(f, samples(0.13, 4.13, 16), 1e-12)).toEqual([]);
});

test("a dip that touches zero (a double root) is one zero", () => {
  const f = (x: number) => (x - 1) * (x - 1);
  const zeros = zerosOf(f, samples(0.13, 4.13, 16), 1e-12);
  expect(zeros).toHaveLength(1);
  expect(Math.abs(zeros[0]! - 1)).toBeLessThan(2e-6);
});

test("a sample exactly on a zero is reported once, not lost", () => {
  const f = (x: number) => x - 1;
  expect(zerosOf(f, samples(0, 2, 4))).toEqual([1]);
});
