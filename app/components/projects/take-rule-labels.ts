/** The project's length unit, as stored. */
export type ProjectUnits = "m" | "ft" | "usft";

export type TakeRuleKey =
  | "remnantMinArea"
  | "remnantMinFraction"
  | "landValuePerArea"
  | "buildingValue"
  | "severancePercent"
  | "easementRatePerArea"
  | "adminCostPerParcel"
  | "contingencyPercent"
  | "proximityDistance";

/** One rule as the project page shows it: the value in effect, whether it is the project's own, and the default. */
export interface ProjectRuleRow {
  key: TakeRuleKey;
  value: number;
  source: "project" | "default";
  defaultValue: number;
}

const AREA: Record<ProjectUnits, string> = { m: "m²", ft: "ft²", usft: "US ft²" };
const LENGTH: Record<ProjectUnits, string> = { m: "m", ft: "ft", usft: "US ft" };

/** What each rule means, in our own words, and the unit its value is in for a project's units. */
export function describeRule(key: TakeRuleKey, units: ProjectUnits): { label: string; unit: string; hint: string } {
  const area = AREA[units];
  switch (key) {
    case "remnantMinArea":
      return { label: "Smallest usable remainder", unit: area, hint: "A piece left smaller than this is an uneconomic remnant, bought with the take." };
    case "remnantMinFraction":
      return { label: "Smallest usable share of the parcel", unit: "fraction, 0 to 1", hint: "A piece left smaller than this share of the parcel is an uneconomic remnant too." };
    case "landValuePerArea":
      return { label: "Land value where a parcel has none", unit: `currency per ${area}`, hint: "Used only for parcels whose layer carries no land value." };
    case "buildingValue":
      return { label: "Value of a displaced building", unit: "currency per building", hint: "Used only for footprints whose layer carries no value." };
    case "severancePercent":
      return { label: "Severance damages", unit: "% of the land cost", hint: "Added to partial takes that leave a usable remainder." };
    case "easementRatePerArea":
      return { label: "Temporary easement rate", unit: `currency per ${area}`, hint: "Per unit of construction easement area outside the right-of-way." };
    case "adminCostPerParcel":
      return { label: "Appraisal, title and closing", unit: "currency per parcel with a take", hint: "Once for each parcel the right-of-way reaches." };
    case "contingencyPercent":
      return { label: "Contingency", unit: "% of the other lines", hint: "Added on top of land, buildings, severance, easement and the per-parcel cost." };
    case "proximityDistance":
      return { label: "Building proximity distance", unit: LENGTH[units], hint: "A building left standing this close to the new right-of-way line is counted as a proximity impact." };
  }
}

/** A rule's value as the page shows it: grouped thousands, up to six decimals, no exponent. */
export function formatRuleValue(value: number): string {
  return value.toLocaleString("en-US", { maximumFractionDigits: 6 });
}
