import { useState } from "react";
import { buildCompoundCurveReport } from "~/calculations/compound-curve-report";
import { compoundReportRows } from "~/calculations/report-rows";
import { parseAngleDeg } from "~/geometry/angles";
import type { CompoundGiven } from "~/geometry/compound-knowns";
import { parseStation, stationStyleForUnits } from "~/geometry/stations";
import type { LengthUnit } from "~/geometry/units";
import { Card } from "~/components/ui/card";
import { Field, SelectField } from "~/components/ui/field";
import { CurveDrawing } from "./curve-drawing";
import { compoundCurveFigure } from "./figures";
import { ResultActions, ResultTable } from "./result-actions";
import { optionalNumber, useCalculation } from "./use-calculation";

const LENGTHS = [
  ["radius1", "Radius R1 (first along stationing)"],
  ["radius2", "Radius R2"],
  ["tangentPC", "Tangent PI→PC"],
  ["tangentPT", "Tangent PI→PT"],
  ["subTangent1", "Sub-tangent t1"],
  ["subTangent2", "Sub-tangent t2"],
  ["length1", "Arc length L1"],
  ["length2", "Arc length L2"],
  ["longChord", "Long chord PC→PT"],
] as const;
const ANGLES = [
  ["delta", "Total Δ"],
  ["delta1", "Δ1"],
  ["delta2", "Δ2"],
  ["chordAnglePC", "Long chord to back tangent"],
  ["chordAnglePT", "Long chord to forward tangent"],
] as const;
type Key = (typeof LENGTHS)[number][0] | (typeof ANGLES)[number][0];

const START: Partial<Record<Key, string>> = { radius1: "400", delta1: "36", radius2: "300", delta2: "50" };

function readGiven(values: Partial<Record<Key, string>>, parallel: boolean): CompoundGiven {
  const given: CompoundGiven = {};
  for (const [key, label] of LENGTHS) {
    const n = optionalNumber(values[key] ?? "", label);
    if (n !== undefined) given[key] = n;
  }
  for (const [key, label] of ANGLES) if ((values[key] ?? "").trim()) given[key] = parseAngleDeg(values[key]!, label);
  if (parallel) given.commonTangentParallelToLongChord = true;
  return given;
}

export function CompoundCurvePanel() {
  const [units, setUnits] = useState<LengthUnit>("m");
  const [values, setValues] = useState<Partial<Record<Key, string>>>(START);
  const [parallel, setParallel] = useState(false);
  const [pcStation, setPcStation] = useState("4+509.000");
  const calc = useCalculation(() => {
    const given = readGiven(values, parallel);
    if (Object.keys(given).length === 0) return null;
    const pc = pcStation.trim() ? parseStation(pcStation, stationStyleForUnits(units), "PC station") : undefined;
    return buildCompoundCurveReport({ units, given, pcStation: pc });
  }, [units, values, parallel, pcStation]);
  const field = (key: Key, label: string, angle: boolean) => (
    <Field key={key} label={label} value={values[key] ?? ""} onChange={(e) => setValues({ ...values, [key]: e.target.value })} inputMode={angle ? "text" : "decimal"} />
  );
  return (
    <div className="grid gap-6 lg:grid-cols-[22rem_1fr]">
      <Card title="What you know">
        <p className="mb-4 text-sm text-ink-soft">Fill in any four independent values; leave the rest empty. Angles in decimal degrees or DMS.</p>
        <div className="space-y-3">
          <SelectField label="Length unit" value={units} onChange={(e) => setUnits(e.target.value as LengthUnit)} options={[{ value: "m", label: "metres" }, { value: "ft", label: "international feet" }, { value: "usft", label: "US survey feet" }]} />
          {LENGTHS.map(([k, l]) => field(k, l, false))}
          {ANGLES.map(([k, l]) => field(k, l, true))}
          <label className="flex items-center gap-2 text-sm">
            <input type="checkbox" checked={parallel} onChange={(e) => setParallel(e.target.checked)} />
            Common tangent parallel to the long chord
          </label>
          <Field label="Station of the PC (optional)" value={pcStation} onChange={(e) => setPcStation(e.target.value)} />
        </div>
      </Card>
      <div className="space-y-6">
        {calc.error && <p role="alert" className="rounded-md bg-danger-tint px-4 py-3 text-sm font-semibold text-danger">{calc.error}</p>}
        {calc.result?.solutions.length === 2 && <p className="text-sm font-semibold">These knowns fit two different curves; both are shown.</p>}
        {calc.result?.solutions.map((s, i) => {
          const rows = compoundReportRows(s, units);
          return (
            <div key={i} className="space-y-6">
              <Card title={calc.result!.solutions.length > 1 ? `Solution ${i + 1}` : "Curve elements"} actions={<ResultActions rows={rows} fileName={`compound-curve-${i + 1}.csv`} />}>
                <ResultTable rows={rows} />
              </Card>
              <Card title="Sketch">
                <CurveDrawing figure={compoundCurveFigure(s)} title="Two-centred compound curve with PC, PCC, PT and PI" />
              </Card>
            </div>
          );
        })}
      </div>
    </div>
  );
}
