import type { ParcelTake, TakeCostLines, TakeRules } from "./take-types";
import { TAKE_MIN_AREA } from "./corridor-tolerances";

/**
 * "full" when nothing usable is left: no remainder piece, or every piece smaller than
 * `remnantMinArea` or than `remnantMinFraction` of the parcel — an uneconomic remnant, which
 * agencies commonly buy with the take (49 CFR 24.102(k), offer to acquire uneconomic remnants;
 * the thresholds are the project's own, common practice).
 */
export function classifyTake(parcelArea: number, pieceAreas: number[], rules: TakeRules): ParcelTake["classification"] {
  const usable = pieceAreas.some((a) => a >= rules.remnantMinArea && a >= rules.remnantMinFraction * parcelArea);
  return usable ? "partial" : "full";
}

/** Inputs of one parcel's cost lines. */
export interface CostInput {
  parcelArea: number;
  takeArea: number;
  easementArea: number;
  classification: ParcelTake["classification"];
  landValuePerArea: number;
  buildingValues: number[];
}

/**
 * Order-of-magnitude cost lines (Caltrans Right of Way Manual ch. 4 lists land, damages to the
 * remainder, improvements, incidentals and contingency; the rates are the project's own):
 * land = value × take (× the whole parcel for a full take); buildings = Σ hit buildings;
 * severance = % of land for a partial take; easement = rate × easement area (nothing for a full
 * take — the whole parcel is bought); administrative once per parcel with a take; contingency =
 * % of the sum of the other lines.
 */
export function costTake(c: CostInput, rules: TakeRules): TakeCostLines {
  const hasTake = c.takeArea > TAKE_MIN_AREA;
  const full = hasTake && c.classification === "full";
  const land = hasTake ? c.landValuePerArea * (full ? c.parcelArea : c.takeArea) : 0;
  const buildings = c.buildingValues.reduce((s, v) => s + v, 0);
  const severance = hasTake && !full ? (rules.severancePercent / 100) * land : 0;
  const easement = full ? 0 : rules.easementRatePerArea * c.easementArea;
  const administrative = hasTake ? rules.adminCostPerParcel : 0;
  const sum = land + buildings + severance + easement + administrative;
  const contingency = (rules.contingencyPercent / 100) * sum;
  return { land, buildings, severance, easement, administrative, contingency, total: sum + contingency };
}
