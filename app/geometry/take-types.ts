import type { CorridorSelfOverlap } from "./corridor-self-overlap";

/**
 * The corridor and land-take contract shared by the engine, the API, storage and the UI.
 * Lengths are in the alignment's units; areas in those units squared; stations are internal
 * (start station + distance, no equations applied). Coordinates are the working projected CRS.
 */

/** Half-widths that differ from the base over a station range, tapering linearly outside it. */
export interface CorridorWidthRange {
  fromStation: number;
  toStation: number;
  /** Right-of-way half-width left of the centreline (looking ahead) inside the range; base if absent. */
  left?: number;
  right?: number;
  /** Length of the linear taper from the base width, before `fromStation` and after `toStation` (0 = a step). */
  transition: number;
}

/** Right-of-way half-widths from the centreline, and a temporary construction easement beyond each line. */
export interface CorridorInput {
  left: number;
  right: number;
  /** Temporary construction easement width beyond the right-of-way line on each side (0 or absent = none). */
  easement?: number;
  ranges?: CorridorWidthRange[];
}

/** Polygon rings as GeoJSON coordinates: first ring the exterior, the rest holes. */
export type PolygonCoords = number[][][];

export interface TakeParcelInput {
  parcelId: string;
  owner?: string | null;
  address?: string | null;
  /** MultiPolygon coordinates in the working CRS (a Polygon is one element). */
  polygons: PolygonCoords[];
  /** Land value per square unit; when absent the rules' default applies. */
  landValuePerArea?: number | null;
}

export interface TakeBuildingInput {
  buildingId: string;
  /** The parcel the footprint file assigns it to, if any; otherwise it belongs to the parcel that contains most of it. */
  parcelId?: string | null;
  polygons: PolygonCoords[];
  /** Value of the building (currency); when absent the rules' default applies. */
  value?: number | null;
}

/** How takes are classified and costed. Every amount is an order-of-magnitude estimate. */
export interface TakeRules {
  /** A remainder piece smaller than this (square units) is an uneconomic remnant. */
  remnantMinArea: number;
  /** …or smaller than this fraction of the parcel's area (0–1). */
  remnantMinFraction: number;
  /** Default land value per square unit, where a parcel has none. */
  landValuePerArea: number;
  /** Default value of a displaced building, where the footprint has none. */
  buildingValue: number;
  /** Severance damages, % of the land cost, for partial takes that leave a remainder. */
  severancePercent: number;
  /** Temporary easement cost per square unit. */
  easementRatePerArea: number;
  /** Appraisal, title and closing per parcel acquired (currency). */
  adminCostPerParcel: number;
  /** Contingency, % of the other lines. */
  contingencyPercent: number;
  /** A building not hit but within this distance of the new right-of-way line is a proximity impact. */
  proximityDistance: number;
}

export interface TakeCostLines {
  land: number;
  buildings: number;
  severance: number;
  easement: number;
  administrative: number;
  contingency: number;
  total: number;
}

export interface ParcelTake {
  parcelId: string;
  owner: string | null;
  address: string | null;
  parcelArea: number;
  takeArea: number;
  easementArea: number;
  remainderArea: number;
  takeFraction: number;
  remainderPieces: number;
  remainderPieceAreas: number[];
  classification: "partial" | "full";
  /** Buildings of this parcel the right-of-way touches (displacements). */
  buildingsHit: string[];
  /** Buildings left standing within `proximityDistance` of the right-of-way line. */
  buildingsNear: string[];
  cost: TakeCostLines;
  /** Internal stations the take spans along the centreline. */
  stationFrom: number;
  stationTo: number;
}

export interface TakeTotals {
  parcelTakeArea: number;
  parcelEasementArea: number;
  unparcelledArea: number;
  parcelsAffected: number;
  fullTakes: number;
  partialTakes: number;
  displacements: number;
  proximityImpacts: number;
  estimatedCost: number;
}

export interface TakeResult {
  corridorArea: number;
  /** Area of the easement strips (outside the right-of-way). */
  easementArea: number;
  parcels: ParcelTake[];
  totals: TakeTotals;
  /** Plain-language notes, e.g. parcels that overlap each other inside the corridor. */
  warnings: string[];
  /** Stretches where the right-of-way covers the same ground twice (that ground is taken once). */
  corridorSelfOverlaps: CorridorSelfOverlap[];
}
