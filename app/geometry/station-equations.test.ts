import { expect, test } from "vitest";
import { createStationing, distanceAtStation, stationAtDistance } from "./station-equations";
import { GeometryInputError } from "./errors";

// Station equations "back = ahead" give one point two station values (Mahun OASL, Curves A.2).

test("a gap equation jumps the stationing forward", () => {
  const s = createStationing(1000, 2000, [{ back: 1500, ahead: 1600 }]);
  expect(stationAtDistance(s, 499)).toEqual({ station: 1499, region: 0 });
  expect(stationAtDistance(s, 500)).toEqual({ station: 1600, region: 1 });
  expect(stationAtDistance(s, 700).station).toBe(1800);
  expect(distanceAtStation(s, 1800)).toBe(700);
  expect(() => distanceAtStation(s, 1550)).toThrow(GeometryInputError);
});

test("an overlap equation makes a station occur twice, resolved by region", () => {
  const s = createStationing(0, 1000, [{ back: 600, ahead: 500 }]);
  expect(stationAtDistance(s, 650).station).toBe(550);
  expect(distanceAtStation(s, 550, 0)).toBe(550);
  expect(distanceAtStation(s, 550, 1)).toBe(650);
  try {
    distanceAtStation(s, 550);
    expect.unreachable();
  } catch (e) {
    expect(e).toBeInstanceOf(GeometryInputError);
    expect((e as GeometryInputError).code).toBe("ambiguous_station");
  }
});

test("stations outside the overlap need no region", () => {
  const s = createStationing(0, 1000, [{ back: 600, ahead: 500 }]);
  expect(distanceAtStation(s, 100)).toBe(100);
  expect(distanceAtStation(s, 800)).toBe(900);
});

test("distance → station → distance round-trips through several equations", () => {
  const s = createStationing(250, 3000, [
    { back: 900, ahead: 1000 },
    { back: 1800, ahead: 1700 },
  ]);
  for (let d = 0; d <= 3000; d += 37.5) {
    const { station, region } = stationAtDistance(s, d);
    expect(distanceAtStation(s, station, region)).toBeCloseTo(d, 9);
  }
});

test("an equation off the line or out of order is rejected", () => {
  expect(() => createStationing(0, 100, [{ back: 200, ahead: 300 }])).toThrow(GeometryInputError);
  expect(() => createStationing(0, 1000, [{ back: 500, ahead: 600 }, { back: 550, ahead: 700 }])).toThrow(GeometryInputError);
});
