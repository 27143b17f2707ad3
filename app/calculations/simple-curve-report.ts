import { computeDegreeFromRadius, type DegreeDefinition } from "~/geometry/degree-of-curve";
import { GeometryInputError } from "~/geometry/errors";
import { computeSimpleCurve } from "~/geometry/simple-curve";
import { computeStakingTable, type StakingRow } from "~/geometry/staking-table";
import { formatStation, stationStyleForUnits } from "~/geometry/stations";
import type { LengthUnit } from "~/geometry/units";

export type SimpleCurveRequest = {
  units: LengthUnit;
  radius?: number;
  degree?: number;
  definition?: "arc" | "chord";
  delta: number;
  piStation?: number;
  stakingInterval?: number;
};

export type SimpleCurveReport = {
  units: LengthUnit;
  radius: number;
  delta: number;
  tangent: number;
  length: number;
  external: number;
  middleOrdinate: number;
  longChord: number;
  /** Degree of curve, arc definition: on a 100 ft arc in feet, on a 20 m arc in metres. */
  degreeArc: number;
  degreeChord?: number;
  stations?: { PI: number; PC: number; PT: number };
  stationLabels?: { PI: string; PC: string; PT: string };
  staking?: StakingRow[];
};

/** The arc definition that goes with a length unit (100 ft arc for feet, 20 m arc for metres). */
export function arcDefinitionFor(units: LengthUnit): DegreeDefinition {
  return units === "m" ? "arc-20m" : "arc-100ft";
}

function definitionFor(units: LengthUnit, definition: "arc" | "chord"): DegreeDefinition {
  if (definition === "arc") return arcDefinitionFor(units);
  if (units === "m") {
    throw new GeometryInputError("invalid_unit", "the chord definition of degree of curve is on a 100 ft chord: use ft or usft", { field: "definition" });
  }
  return "chord-100ft";
}

/** Every element of a simple curve, its stations and (optionally) its staking table, for the API and the calculator. */
export function buildSimpleCurveReport(req: SimpleCurveRequest): SimpleCurveReport {
  const definition = req.degree === undefined ? arcDefinitionFor(req.units) : definitionFor(req.units, req.definition ?? "arc");
  const curve = computeSimpleCurve({ radius: req.radius, degreeOfCurveDeg: req.degree, degreeDefinition: definition, deltaDeg: req.delta, piStation: req.piStation });
  const report: SimpleCurveReport = {
    units: req.units,
    radius: curve.radius,
    delta: curve.deltaDeg,
    tangent: curve.tangent,
    length: curve.length,
    external: curve.external,
    middleOrdinate: curve.middleOrdinate,
    longChord: curve.longChord,
    degreeArc: computeDegreeFromRadius(curve.radius, arcDefinitionFor(req.units)),
  };
  if (req.units !== "m" && curve.radius >= 50) report.degreeChord = computeDegreeFromRadius(curve.radius, "chord-100ft");
  if (curve.pcStation !== undefined && curve.ptStation !== undefined && curve.piStation !== undefined) {
    const style = stationStyleForUnits(req.units);
    report.stations = { PI: curve.piStation, PC: curve.pcStation, PT: curve.ptStation };
    report.stationLabels = { PI: formatStation(curve.piStation, style), PC: formatStation(curve.pcStation, style), PT: formatStation(curve.ptStation, style) };
    if (req.stakingInterval) {
      report.staking = computeStakingTable({ radius: curve.radius, deltaDeg: curve.deltaDeg, pcStation: curve.pcStation }, { interval: req.stakingInterval });
    }
  }
  return report;
}
