import type { CompoundCurve } from "~/geometry/compound-curve";
import type { CompoundGiven } from "~/geometry/compound-knowns";
import { solveCompoundCurve } from "~/geometry/compound-solver";
import { formatStation, stationStyleForUnits } from "~/geometry/stations";
import type { LengthUnit } from "~/geometry/units";

export type CompoundSolution = Omit<CompoundCurve, "pcStation" | "pccStation" | "ptStation" | "piStation"> & {
  stations?: { PC: number; PCC: number; PT: number; PI: number };
  stationLabels?: { PC: string; PCC: string; PT: string; PI: string };
};

/** Solves a two-centred compound curve from any sufficient knowns; every solution, with stations when a PC station is given. */
export function buildCompoundCurveReport(req: { units: LengthUnit; given: CompoundGiven; pcStation?: number }): { units: LengthUnit; solutions: CompoundSolution[] } {
  const style = stationStyleForUnits(req.units);
  const { solutions } = solveCompoundCurve(req.given, req.pcStation === undefined ? {} : { pcStation: req.pcStation });
  return {
    units: req.units,
    solutions: solutions.map(({ pcStation, pccStation, ptStation, piStation, ...elements }) => {
      if (pcStation === undefined || pccStation === undefined || ptStation === undefined || piStation === undefined) return elements;
      return {
        ...elements,
        stations: { PC: pcStation, PCC: pccStation, PT: ptStation, PI: piStation },
        stationLabels: { PC: formatStation(pcStation, style), PCC: formatStation(pccStation, style), PT: formatStation(ptStation, style), PI: formatStation(piStation, style) },
      };
    }),
  };
}
