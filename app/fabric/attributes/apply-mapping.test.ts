import { expect, test } from "vitest";
import type { AreaFeature, Properties } from "../types";
import { applyFieldMapping } from "./apply-mapping";
import { FEATURE_ID_SOURCE, type FieldMapping } from "./field-mapping";
import { parseLandValue } from "./land-value";

const square = { type: "Polygon" as const, coordinates: [[[0, 0], [1, 0], [1, 1], [0, 1], [0, 0]]] };
const feature = (sourceRow: number, properties: Properties, id?: string): AreaFeature => ({ type: "Feature", geometry: square, properties, sourceRow, ...(id ? { id } : {}) });
const mapping: FieldMapping = { parcelId: "APN", owner: "OWNER_NM", address: "SITUS", landUse: "LU", landValue: "LAND_VAL" };

test("maps attributes, parses land values and keeps the source attributes", () => {
  const props = { APN: " QM-001 ", OWNER_NM: "Maradel Quonsey", SITUS: "12 Fennick Row", LU: "RES", LAND_VAL: "$125,000.50" };
  const { mapped, rejected } = applyFieldMapping([feature(1, props)], mapping, { kind: "parcels", landValueBasis: "perArea" });
  expect(rejected).toEqual([]);
  expect(mapped[0]!.attributes).toEqual({
    parcelId: "QM-001", owner: "Maradel Quonsey", address: "12 Fennick Row", landUse: "RES",
    landValue: 125000.5, landValueBasis: "perArea", attributes: props,
  });
});

test("missing and duplicate parcel IDs and bad land values are rejected with their rows", () => {
  const rows = [
    feature(1, { APN: "QM-1", LAND_VAL: 10 }),
    feature(2, { APN: "", LAND_VAL: 10 }),
    feature(4, { APN: "QM-1", LAND_VAL: 12 }),
    feature(5, { APN: "QM-5", LAND_VAL: "-3" }),
    feature(6, { APN: "QM-6", LAND_VAL: "about 40k" }),
    feature(7, { APN: "QM-7", LAND_VAL: null }),
  ];
  const { mapped, rejected } = applyFieldMapping(rows, mapping);
  expect(mapped.map((m) => m.attributes.parcelId)).toEqual(["QM-7"]);
  expect(mapped[0]!.attributes.landValue).toBeNull();
  expect(rejected).toEqual([
    { row: 1, reason: expect.stringMatching(/"QM-1" is used by rows 1, 4/) },
    { row: 2, reason: "parcel ID is missing" },
    { row: 4, reason: expect.stringMatching(/"QM-1" is used by rows 1, 4/) },
    { row: 5, reason: "land value is negative" },
    { row: 6, reason: 'land value "about 40k" is not a number' },
  ]);
});

test("building footprints may lack a parcel ID and share one", () => {
  const rows = [feature(1, { APN: "QM-1" }), feature(2, { APN: "QM-1" }), feature(3, {})];
  const { mapped, rejected } = applyFieldMapping(rows, mapping, { kind: "buildings", landValueBasis: "total" });
  expect(rejected).toEqual([]);
  expect(mapped.map((m) => m.attributes.parcelId)).toEqual(["QM-1", "QM-1", null]);
});

test("the GeoJSON feature id can serve as the parcel ID", () => {
  const { mapped } = applyFieldMapping([feature(1, {}, "Q-77")], { ...mapping, parcelId: FEATURE_ID_SOURCE });
  expect(mapped[0]!.attributes.parcelId).toBe("Q-77");
});

test("parseLandValue reads assessor spellings and refuses ambiguous ones", () => {
  expect(parseLandValue("1,250")).toEqual({ value: 1250 });
  expect(parseLandValue("€ 3 400")).toEqual({ value: 3400 });
  expect(parseLandValue("USD 99.5")).toEqual({ value: 99.5 });
  expect(parseLandValue("(1,200)")).toEqual({ value: -1200 });
  expect(parseLandValue(42)).toEqual({ value: 42 });
  expect(parseLandValue("  ")).toEqual({ value: null });
  expect(parseLandValue("1.234,56")).toHaveProperty("error");
  expect(parseLandValue("12,34")).toHaveProperty("error");
  expect(parseLandValue(Number.NaN)).toHaveProperty("error");
});
