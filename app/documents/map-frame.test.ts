import { expect, test } from "vitest";
import { fitMapFrame, roundDown125, roundScaleUp, scaleBarLength } from "./map-frame";

test("round scales go up to the next 1, 1.25, 2, 2.5 or 5 × 10^k", () => {
  expect([roundScaleUp(980), roundScaleUp(1000), roundScaleUp(1001), roundScaleUp(1300), roundScaleUp(2100), roundScaleUp(2600), roundScaleUp(5100)]).toEqual([1000, 1000, 1250, 2000, 2500, 5000, 10000]);
  expect([roundDown125(0.7), roundDown125(1), roundDown125(3.9), roundDown125(74), roundDown125(180)]).toEqual([0.5, 1, 2, 50, 100]);
});

test("a 300 m × 200 m window in a 500 × 400 pt box is drawn at 1:2500 and 1 inch is 63.5 m on the ground", () => {
  const frame = fitMapFrame([1000, 2000, 1300, 2200], { x: 36, y: 100, width: 500, height: 400 }, "m");
  // 360 m (with the 10 % margins) into 500 pt: 1 pt = 0.72 m, i.e. 1:2041 → rounded up to 1:2500.
  expect(frame.ratio).toBe(2500);
  // 1 in = 72 pt at 1:2500 is 0.0254 × 2500 = 63.5 m (international inch).
  expect(72 / frame.pointsPerUnit).toBeCloseTo(63.5, 9);
  // The centre of the window is the centre of the box; north is up.
  expect(frame.toPage([1150, 2100])).toEqual([286, 300]);
  const [, yNorth] = frame.toPage([1150, 2150]);
  expect(yNorth).toBeLessThan(300);
  // The window shown covers the box: 500 pt = 500 × 0.88194 m.
  expect(frame.world[2] - frame.world[0]).toBeCloseTo(500 / frame.pointsPerUnit, 9);
  expect(scaleBarLength(frame)).toBe(100);
});

test("in US survey feet the ratio uses the survey foot (1200/3937 m)", () => {
  const frame = fitMapFrame([0, 0, 1000, 500], { x: 0, y: 0, width: 540, height: 300 }, "usft");
  const metresPerPoint = 0.0254 / 72;
  expect(((1200 / 3937) / frame.pointsPerUnit) / metresPerPoint).toBeCloseTo(frame.ratio, 6);
});
