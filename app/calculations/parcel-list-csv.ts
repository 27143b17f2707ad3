import { csvField, formatCell } from "~/exports/impact-csv";
import type { ColumnKind } from "~/exports/impact-columns";
import { formatStation, stationStyleForUnits, type LengthUnit } from "~/geometry";

/** What a land agent's parcel list holds of a case (areas in units², stations internal, cost an estimate). */
export interface ParcelListRow {
  parcelId: string;
  owner: string | null;
  address: string | null;
  takeArea: number;
  remainderArea: number;
  classification: "partial" | "full";
  estimatedCost: number;
  stationFrom: number;
  stationTo: number;
}

interface ListColumn {
  key: string;
  kind: ColumnKind;
  value: (r: ParcelListRow, units: LengthUnit) => string | number | null;
}

/** The columns of the agent's list, named as in the impact exports (`take_area_m2`, `station_from_m`). */
const COLUMNS: readonly ListColumn[] = [
  { key: "parcel_id", kind: "text", value: (r) => r.parcelId },
  { key: "owner", kind: "text", value: (r) => r.owner },
  { key: "address", kind: "text", value: (r) => r.address },
  { key: "take_area", kind: "area", value: (r) => r.takeArea },
  { key: "remainder_area", kind: "area", value: (r) => r.remainderArea },
  { key: "classification", kind: "text", value: (r) => r.classification },
  { key: "estimated_cost", kind: "money", value: (r) => r.estimatedCost },
  { key: "station_from", kind: "station", value: (r) => r.stationFrom },
  { key: "station_to", kind: "station", value: (r) => r.stationTo },
  { key: "station_range", kind: "text", value: (r, u) => formatStationRange(r, u) },
];

function headerName(c: ListColumn, units: LengthUnit): string {
  if (c.kind === "area") return `${c.key}_${units}2`;
  return c.kind === "station" ? `${c.key}_${units}` : c.key;
}

/** "0+120.000 to 0+185.500" (metric) or "1+20.00 to 1+85.50" (US). */
export function formatStationRange(r: Pick<ParcelListRow, "stationFrom" | "stationTo">, units: LengthUnit): string {
  const style = stationStyleForUnits(units);
  return `${formatStation(r.stationFrom, style)} to ${formatStation(r.stationTo, style)}`;
}

/**
 * The parcel list as CSV text (RFC 4180: header line, CRLF line ends, quoted where needed), in the
 * order given. Numbers are plain (0.0001 of an area unit or station, cents of cost).
 */
export function writeParcelListCsv(rows: readonly ParcelListRow[], units: LengthUnit): string {
  const lines = [COLUMNS.map((c) => headerName(c, units)).join(",")];
  for (const r of rows) lines.push(COLUMNS.map((c) => csvField(formatCell(c.value(r, units), c.kind), c.kind === "text")).join(","));
  return lines.join("\r\n") + "\r\n";
}
