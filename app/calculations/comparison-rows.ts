/** One alternative's take from one parcel, as the parcel × alternative matrix shows it. */
export interface ComparisonCell {
  alternativeId: number;
  takeArea: number;
  classification: "partial" | "full";
  estimatedCost: number;
}

/** A parcel taken by at least one alternative, with one cell per alternative that takes from it. */
export interface ComparisonRow {
  parcelId: string;
  owner: string | null;
  address: string | null;
  parcelArea: number;
  takes: ComparisonCell[];
}
