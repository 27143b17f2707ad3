import { FabricInputError } from "../errors";
import type { AreaFeature } from "../types";
import { FEATURE_ID_SOURCE, TARGET_ATTRIBUTES, guessFieldMapping, type FieldMapping } from "../attributes/field-mapping";

/**
 * The mapping to apply: guesses from names and the first rows, overridden by
 * the planner's choices (null clears a guess). Refuses fields the layer does
 * not have (`unknown_field`) and parcels without a parcel ID source
 * (`missing_parcel_id_field`, with field names so the UI can ask).
 */
export function chooseMapping(features: AreaFeature[], fieldNames: string[], kind: "parcels" | "buildings", fields: Partial<FieldMapping> = {}): FieldMapping {
  const sample = features.slice(0, 20);
  const guessed = guessFieldMapping(fieldNames, sample.map((f) => f.properties), sample.map((f) => f.id));
  const mapping: FieldMapping = { ...guessed };
  for (const target of TARGET_ATTRIBUTES) {
    const field = fields[target];
    if (field === undefined) continue;
    if (field !== null && field !== FEATURE_ID_SOURCE && !fieldNames.includes(field)) {
      throw new FabricInputError("unknown_field", `The layer has no field "${field}" (chosen for ${target}).`, { field, target, fieldNames });
    }
    mapping[target] = field;
  }
  if (kind === "parcels" && mapping.parcelId === null) {
    throw new FabricInputError("missing_parcel_id_field", "No field looks like a parcel ID; choose which field holds it.", { fieldNames, mapping });
  }
  return mapping;
}
