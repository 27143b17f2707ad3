import type { LengthUnit } from "../geometry";
import { columnLabel, IMPACT_COLUMNS, type ColumnKind } from "./impact-columns";
import type { ImpactSummary } from "./impact-summary";
import { columnLetter } from "./xlsx-sheet-names";

/** Excel number formats per kind: areas 0.00, money #,##0 (whole currency units), shares as %. */
export const NUMBER_FORMATS: Partial<Record<ColumnKind, string>> = { area: "0.00", station: "0.000", fraction: "0.00%", count: "0", money: "#,##0" };

/** A Summary sheet column: its heading, number format, the formula over an alternative's sheet, and its value. */
export interface SummaryColumn {
  label: string;
  kind: ColumnKind;
  /** Formula over rows 2…last of the alternative's sheet (quoted name), or null for a plain value. */
  formula: ((sheet: string, last: number) => string) | null;
  value: (s: ImpactSummary, extra: { corridorArea?: number; unparcelledArea?: number }) => number | null;
}

function letterOf(key: string): string {
  return columnLetter(IMPACT_COLUMNS.findIndex((c) => c.key === key));
}

const sum = (key: string) => (sheet: string, last: number) => `SUM(${sheet}!${letterOf(key)}2:${letterOf(key)}${last})`;
const countIf = (what: string) => (sheet: string, last: number) => `COUNTIF(${sheet}!${letterOf("classification")}2:${letterOf("classification")}${last},"${what}")`;

/** The Summary sheet's columns after "Alternative", each tied to the alternative sheets by a formula. */
export function summaryColumns(units: LengthUnit): SummaryColumn[] {
  const area = (key: string) => columnLabel(IMPACT_COLUMNS.find((c) => c.key === key)!, units);
  const money = (key: keyof ImpactSummary["cost"], label: string): SummaryColumn => ({ label, kind: "money", formula: sum(`cost_${key}`), value: (s) => s.cost[key] });
  return [
    { label: "Parcels affected", kind: "count", formula: (sheet, last) => `COUNTA(${sheet}!${letterOf("parcel_id")}2:${letterOf("parcel_id")}${last})`, value: (s) => s.parcelsAffected },
    { label: "Full takes", kind: "count", formula: countIf("full"), value: (s) => s.fullTakes },
    { label: "Partial takes", kind: "count", formula: countIf("partial"), value: (s) => s.partialTakes },
    { label: area("take_area"), kind: "area", formula: sum("take_area"), value: (s) => s.takeArea },
    { label: area("easement_area"), kind: "area", formula: sum("easement_area"), value: (s) => s.easementArea },
    { label: area("remainder_area"), kind: "area", formula: sum("remainder_area"), value: (s) => s.remainderArea },
    { label: "Buildings displaced", kind: "count", formula: sum("buildings_hit"), value: (s) => s.displacements },
    { label: "Buildings near", kind: "count", formula: sum("buildings_near"), value: (s) => s.proximityImpacts },
    money("land", "Land"),
    money("buildings", "Buildings"),
    money("severance", "Severance"),
    money("easement", "Easement"),
    money("administrative", "Administrative"),
    money("contingency", "Contingency"),
    money("total", "Estimated cost"),
    { label: area("take_area").replace("Take area", "Corridor area"), kind: "area", formula: null, value: (_, e) => e.corridorArea ?? null },
    { label: area("take_area").replace("Take area", "Unparcelled area"), kind: "area", formula: null, value: (_, e) => e.unparcelledArea ?? null },
  ];
}
