import { expect, test } from "vitest";
import { computeReverseCurve } from "./reverse-curve";
import { degToRad } from "./angles";
import { distanceBetween } from "./vec2";
import { GeometryInputError } from "./errors";

test("two opposite arcs meeting at a PRC share the point and the tangent direction there", () => {
  // Reverse curve definition (Schofield & Breach §10.3): common tangent at the PRC, centres on opposite sides.
  const c = computeReverseCurve({ radius1: 300, delta1: 40, radius2: 500, delta2: 25 });
  const [a, b] = c.arcs;
  expect(c.join).toBe("PRC");
  expect(distanceBetween(a.end, b.start)).toBe(0);
  expect(a.endAzimuthDeg).toBeCloseTo(b.startAzimuthDeg, 12);
  expect(a.direction).toBe("left");
  expect(b.direction).toBe("right");
  expect(c.length).toBeCloseTo(300 * degToRad(40) + 500 * degToRad(25), 9);
  expect(c.netDeflectionDeg).toBeCloseTo(15, 12);
  // The centres lie on opposite sides of the PRC, R1 + R2 apart along one line.
  expect(distanceBetween(a.center, b.center)).toBeCloseTo(800, 9);
});

test("with a tangent between them the stations add the tangent", () => {
  const c = computeReverseCurve({ radius1: 300, delta1: 40, radius2: 300, delta2: 40, tangentLength: 60, pcStation: 1000, firstDirection: "right" });
  expect(c.join).toBe("tangent");
  expect(c.ptStation - c.pcStation).toBeCloseTo(2 * 300 * degToRad(40) + 60, 9);
  expect(c.pt[1]).toBeLessThan(0);
  expect(c.netDeflectionDeg).toBeCloseTo(0, 12);
});

test("bad reverse-curve input is refused", () => {
  expect(() => computeReverseCurve({ radius1: 300, delta1: 40, radius2: 0, delta2: 25 })).toThrow(GeometryInputError);
  expect(() => computeReverseCurve({ radius1: 300, delta1: 40, radius2: 100, delta2: 25, tangentLength: -1 })).toThrow(GeometryInputError);
});
