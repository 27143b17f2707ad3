import { expect, test } from "vitest";
import { utmZoneFor } from "./utm-zone";

test("utmZoneFor picks the 6° zone and hemisphere (north 326zz, south 327zz)", () => {
  expect(utmZoneFor(-118.24, 34.05)).toBe(32611);
  expect(utmZoneFor(151.21, -33.87)).toBe(32756);
  expect(utmZoneFor(-180, 0)).toBe(32601);
  expect(utmZoneFor(180, 10)).toBe(32660);
  expect(utmZoneFor(-0.0001, -0.0001)).toBe(32730);
});

test("utmZoneFor follows the Norway and Svalbard zone exceptions", () => {
  expect(utmZoneFor(5.3, 60.39)).toBe(32632);
  expect(utmZoneFor(15.6, 78.2)).toBe(32633);
  expect(utmZoneFor(10, 78.2)).toBe(32633);
  expect(utmZoneFor(8, 78.2)).toBe(32631);
});

test("utmZoneFor refuses coordinates that are not longitude/latitude", () => {
  expect(() => utmZoneFor(6487000, 1840000)).toThrow(RangeError);
  expect(() => utmZoneFor(Number.NaN, 0)).toThrow(RangeError);
});
