import { expect, test } from "vitest";
import { FEATURE_ID_SOURCE, guessFieldMapping } from "./field-mapping";

test("guesses the usual assessor field names", () => {
  const rows = [{ APN: "QM-001", OWNER_NM: "Maradel Quonsey", SITUS: "12 Fennick Row", LU: "RES", LAND_VAL: "$125,000", SHAPE_AREA: 30160 }];
  expect(guessFieldMapping(["APN", "OWNER_NM", "SITUS", "LU", "LAND_VAL", "SHAPE_AREA"], rows)).toEqual({
    parcelId: "APN", owner: "OWNER_NM", address: "SITUS", landUse: "LU", landValue: "LAND_VAL",
  });
  const other = ["PARCEL_ID", "OwnerName", "SITE_ADDR", "LU_CODE", "LandValue"];
  expect(guessFieldMapping(other, [])).toEqual({ parcelId: "PARCEL_ID", owner: "OwnerName", address: "SITE_ADDR", landUse: "LU_CODE", landValue: "LandValue" });
  expect(guessFieldMapping(["PIN", "OWNER", "ADDRESS", "LANDUSE", "LAND_VALUE"], []).parcelId).toBe("PIN");
  expect(guessFieldMapping(["PARCELNO", "LANDVALUE"], []).landValue).toBe("LANDVALUE");
});

test("sample values break ties: a unique column wins the parcel ID", () => {
  const rows = [{ PARCEL_TYPE: "LOT", PARCEL_NO: "Q-1" }, { PARCEL_TYPE: "LOT", PARCEL_NO: "Q-2" }];
  expect(guessFieldMapping(["PARCEL_TYPE", "PARCEL_NO"], rows).parcelId).toBe("PARCEL_NO");
});

test("unknown fields stay unmapped and feature ids stand in for a missing parcel ID field", () => {
  expect(guessFieldMapping(["COLOR", "NOTES"], [{ COLOR: "red", NOTES: "" }])).toEqual({ parcelId: null, owner: null, address: null, landUse: null, landValue: null });
  expect(guessFieldMapping(["NOTES"], [{ NOTES: "x" }], ["Q-1"]).parcelId).toBe(FEATURE_ID_SOURCE);
  expect(guessFieldMapping(["NOTES"], [{ NOTES: "x" }, { NOTES: "y" }], ["Q-1", undefined]).parcelId).toBeNull();
});
