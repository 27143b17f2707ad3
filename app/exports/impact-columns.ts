import type { LengthUnit } from "../geometry";
import type { ImpactExportRow } from "./impact-types";

/** How a column's values are written: decimals in CSV/DBF, number format in XLSX. */
export type ColumnKind = "text" | "area" | "areaList" | "station" | "fraction" | "count" | "money" | "list";

export type CellValue = string | number | null | string[] | number[];

/** One impact-table column, named the same way in every format (Shapefile names ≤ 10 characters). */
export interface ImpactColumn {
  /** Base name; CSV/GeoJSON add the unit: `take_area` → `take_area_m2`, `station_from` → `station_from_m`. */
  key: string;
  /** dBASE field name for the Shapefile (≤ 10 ASCII characters, dBASE III limit). */
  dbf: string;
  /** Heading in the XLSX sheets, before the unit. */
  label: string;
  kind: ColumnKind;
  value: (row: ImpactExportRow, alternative: string) => CellValue;
}

/** Every column, in order. Money has no unit: the project's currency, an estimate. */
export const IMPACT_COLUMNS: readonly ImpactColumn[] = [
  { key: "alternative", dbf: "ALT_NAME", label: "Alternative", kind: "text", value: (_, a) => a },
  { key: "parcel_id", dbf: "PARCEL_ID", label: "Parcel", kind: "text", value: (r) => r.parcelId },
  { key: "owner", dbf: "OWNER", label: "Owner", kind: "text", value: (r) => r.owner },
  { key: "address", dbf: "ADDRESS", label: "Address", kind: "text", value: (r) => r.address },
  { key: "classification", dbf: "TAKE_TYPE", label: "Take", kind: "text", value: (r) => r.classification },
  { key: "parcel_area", dbf: "PARCEL_AR", label: "Parcel area", kind: "area", value: (r) => r.parcelArea },
  { key: "take_area", dbf: "TAKE_AREA", label: "Take area", kind: "area", value: (r) => r.takeArea },
  { key: "easement_area", dbf: "EASE_AREA", label: "Easement area", kind: "area", value: (r) => r.easementArea },
  { key: "remainder_area", dbf: "REMAIN_AR", label: "Remainder area", kind: "area", value: (r) => r.remainderArea },
  { key: "take_fraction", dbf: "TAKE_FRAC", label: "Share taken", kind: "fraction", value: (r) => r.takeFraction },
  { key: "remainder_pieces", dbf: "REM_PIECES", label: "Remainder pieces", kind: "count", value: (r) => r.remainderPieces },
  { key: "remainder_piece_areas", dbf: "REM_AREAS", label: "Remainder piece areas", kind: "areaList", value: (r) => r.remainderPieceAreas },
  { key: "buildings_hit", dbf: "BLDG_HIT", label: "Buildings displaced", kind: "count", value: (r) => r.buildingsHit.length },
  { key: "buildings_hit_ids", dbf: "HIT_IDS", label: "Displaced building IDs", kind: "list", value: (r) => r.buildingsHit },
  { key: "buildings_near", dbf: "BLDG_NEAR", label: "Buildings near", kind: "count", value: (r) => r.buildingsNear.length },
  { key: "buildings_near_ids", dbf: "NEAR_IDS", label: "Nearby building IDs", kind: "list", value: (r) => r.buildingsNear },
  { key: "station_from", dbf: "STA_FROM", label: "Station from", kind: "station", value: (r) => r.stationFrom },
  { key: "station_to", dbf: "STA_TO", label: "Station to", kind: "station", value: (r) => r.stationTo },
  { key: "cost_land", dbf: "COST_LAND", label: "Land", kind: "money", value: (r) => r.cost.land },
  { key: "cost_buildings", dbf: "COST_BLDG", label: "Buildings", kind: "money", value: (r) => r.cost.buildings },
  { key: "cost_severance", dbf: "COST_SEVER", label: "Severance", kind: "money", value: (r) => r.cost.severance },
  { key: "cost_easement", dbf: "COST_EASE", label: "Easement", kind: "money", value: (r) => r.cost.easement },
  { key: "cost_administrative", dbf: "COST_ADMIN", label: "Administrative", kind: "money", value: (r) => r.cost.administrative },
  { key: "cost_contingency", dbf: "COST_CONT", label: "Contingency", kind: "money", value: (r) => r.cost.contingency },
  { key: "cost_total", dbf: "COST_TOTAL", label: "Estimated cost", kind: "money", value: (r) => r.cost.total },
];

/** Unit suffix of a machine-readable name: m2/ft2/usft2 for areas, m/ft/usft for stations. */
export function unitSuffix(kind: ColumnKind, units: LengthUnit): string {
  if (kind === "area" || kind === "areaList") return `_${units}2`;
  return kind === "station" ? `_${units}` : "";
}

/** CSV and GeoJSON name of a column: its key with the unit, e.g. `take_area_usft2`. */
export function columnName(column: ImpactColumn, units: LengthUnit): string {
  return column.key + unitSuffix(column.kind, units);
}

const AREA_LABEL: Record<LengthUnit, string> = { m: "m²", ft: "ft²", usft: "US survey ft²" };
const LENGTH_LABEL: Record<LengthUnit, string> = { m: "m", ft: "ft", usft: "US survey ft" };

/** Human heading with the unit, e.g. "Take area (m²)". */
export function columnLabel(column: ImpactColumn, units: LengthUnit): string {
  if (column.kind === "area" || column.kind === "areaList") return `${column.label} (${AREA_LABEL[units]})`;
  return column.kind === "station" ? `${column.label} (${LENGTH_LABEL[units]})` : column.label;
}

/** Decimals written for each numeric kind: 0.0001 of an area unit or station, 2 for money. */
export const KIND_DECIMALS: Record<ColumnKind, number> = { text: 0, list: 0, area: 4, areaList: 4, station: 4, fraction: 6, count: 0, money: 2 };
