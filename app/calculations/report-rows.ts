import type { CompoundSolution } from "./compound-curve-report";
import type { SimpleCurveReport } from "./simple-curve-report";
import { formatDms } from "~/geometry/angles";
import type { LengthUnit } from "~/geometry/units";

export type ReportRow = { element: string; value: string; unit: string };

const UNIT_TEXT: Record<LengthUnit, string> = { m: "m", ft: "ft", usft: "US ft" };
const PLACES: Record<LengthUnit, number> = { m: 3, ft: 2, usft: 2 };

function lengthRow(element: string, value: number, units: LengthUnit): ReportRow {
  return { element, value: value.toFixed(PLACES[units] + 1), unit: UNIT_TEXT[units] };
}
function angleRow(element: string, deg: number): ReportRow {
  return { element, value: `${formatDms(deg, { secondsDecimals: 1 })} (${deg.toFixed(8)}°)`, unit: "" };
}

/** The elements of a simple curve as labelled rows, in the order a field book lists them. */
export function simpleReportRows(r: SimpleCurveReport): ReportRow[] {
  const rows = [
    lengthRow("Radius R", r.radius, r.units),
    angleRow("Central angle Δ", r.delta),
    angleRow(`Degree of curve (arc, ${r.units === "m" ? "20 m" : "100 ft"})`, r.degreeArc),
    ...(r.degreeChord !== undefined ? [angleRow("Degree of curve (chord, 100 ft)", r.degreeChord)] : []),
    lengthRow("Tangent T", r.tangent, r.units),
    lengthRow("Length L", r.length, r.units),
    lengthRow("Long chord LC", r.longChord, r.units),
    lengthRow("External E", r.external, r.units),
    lengthRow("Middle ordinate M", r.middleOrdinate, r.units),
  ];
  if (r.stationLabels) {
    rows.push({ element: "Station PI", value: r.stationLabels.PI, unit: "" }, { element: "Station PC", value: r.stationLabels.PC, unit: "" }, { element: "Station PT", value: r.stationLabels.PT, unit: "" });
  }
  return rows;
}

export function compoundReportRows(s: CompoundSolution, units: LengthUnit): ReportRow[] {
  const rows = [
    lengthRow("Radius R1", s.radius1, units),
    lengthRow("Radius R2", s.radius2, units),
    angleRow("Central angle Δ1", s.delta1),
    angleRow("Central angle Δ2", s.delta2),
    angleRow("Total Δ", s.delta),
    lengthRow("Tangent PI→PC", s.tangentPC, units),
    lengthRow("Tangent PI→PT", s.tangentPT, units),
    lengthRow("Sub-tangent t1", s.subTangent1, units),
    lengthRow("Sub-tangent t2", s.subTangent2, units),
    lengthRow("Common tangent t1 + t2", s.commonTangent, units),
    lengthRow("Vertex V1→PI", s.vertexToPiPC, units),
    lengthRow("Vertex PI→V2", s.piToVertexPT, units),
    lengthRow("Arc length L1", s.length1, units),
    lengthRow("Arc length L2", s.length2, units),
    lengthRow("Chord of arc 1", s.chord1, units),
    lengthRow("Chord of arc 2", s.chord2, units),
    lengthRow("Long chord PC→PT", s.longChord, units),
    angleRow("Long chord to back tangent", s.chordAnglePC),
    angleRow("Long chord to forward tangent", s.chordAnglePT),
  ];
  if (s.stationLabels) {
    for (const key of ["PC", "PCC", "PT", "PI"] as const) rows.push({ element: `Station ${key}`, value: s.stationLabels[key], unit: "" });
  }
  return rows;
}

function csvCell(v: string): string {
  return /[",\n]/.test(v) ? `"${v.replace(/"/g, '""')}"` : v;
}

export function rowsToCsv(rows: ReportRow[]): string {
  return ["element,value,unit", ...rows.map((r) => [r.element, r.value, r.unit].map(csvCell).join(","))].join("\n") + "\n";
}

export function rowsToText(rows: ReportRow[]): string {
  const width = Math.max(...rows.map((r) => r.element.length));
  return rows.map((r) => `${r.element.padEnd(width)}  ${r.value}${r.unit ? ` ${r.unit}` : ""}`).join("\n");
}
