import type { RowError } from "./exchange-errors";

/** The PI list columns Takeline reads; `radius` is a simple curve's radius or a compound curve's R1. */
export type PiColumn = "x" | "y" | "curveType" | "radius" | "radius2" | "delta1" | "tangentPC";

/**
 * Accepted header names per column, compared after lower-casing and dropping spaces, "_", "-",
 * "." and any "(unit)" suffix: "Easting (m)" and "curve_type" match. Common practice names.
 */
const ALIASES: Record<PiColumn, string[]> = {
  x: ["x", "easting", "east", "e"],
  y: ["y", "northing", "north", "n"],
  curveType: ["curvetype", "curve", "type", "kind"],
  radius: ["radius", "radius1", "r", "r1"],
  radius2: ["radius2", "r2"],
  delta1: ["delta1", "d1", "Δ1", "δ1", "delta1deg", "centralangle1"],
  tangentPC: ["tangentpc", "tpc", "tangent1", "t1"],
};

function normalize(header: string): string {
  return header.toLowerCase().replace(/\(.*?\)|\[.*?\]/g, "").replace(/[\s_.\-]+/g, "");
}

/**
 * Finds each column's index in the header (first match wins). Headers that match nothing are
 * ignored (a name or note column is fine); missing x or y, or a column named twice, is an error.
 */
export function mapPiColumns(header: string[]): { columns: Partial<Record<PiColumn, number>>; errors: RowError[] } {
  const columns: Partial<Record<PiColumn, number>> = {};
  const errors: RowError[] = [];
  header.forEach((raw, i) => {
    const name = normalize(raw);
    const col = (Object.keys(ALIASES) as PiColumn[]).find((k) => ALIASES[k].includes(name));
    if (!col) return;
    if (columns[col] !== undefined) errors.push({ row: 1, column: raw, message: `column "${raw}" repeats column "${header[columns[col]!]}"` });
    else columns[col] = i;
  });
  for (const need of ["x", "y"] as const) {
    if (columns[need] === undefined) errors.push({ row: 1, column: need, message: `no ${need} column (accepted names: ${ALIASES[need].join(", ")})` });
  }
  return { columns, errors };
}
