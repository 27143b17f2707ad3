import type { AlignmentElement } from "./alignment-types";
import { createTakeSession } from "./take-session";
import type { CorridorInput, TakeBuildingInput, TakeParcelInput, TakeResult, TakeRules } from "./take-types";

/** Inputs of {@link computeTakes}. Lengths in the alignment's unit; areas in that unit squared. */
export interface ComputeTakesInput {
  elements: AlignmentElement[];
  corridor: CorridorInput;
  parcels: TakeParcelInput[];
  buildings?: TakeBuildingInput[];
  rules: TakeRules;
}

/**
 * Land takes of a right-of-way: per parcel the exact take (right-of-way ∩ parcel), easement,
 * remainder pieces, classification, buildings hit and near, cost lines and station span; totals
 * and warnings. A one-shot take session (see `createTakeSession` for repeated computations).
 * Throws `GeometryInputError` for bad widths, rules or coordinates.
 */
export function computeTakes(input: ComputeTakesInput): TakeResult {
  return createTakeSession(input.parcels, input.buildings ?? []).compute(input.elements, input.corridor, input.rules);
}
