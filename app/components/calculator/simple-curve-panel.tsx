import { useState } from "react";
import { buildSimpleCurveReport } from "~/calculations/simple-curve-report";
import { simpleReportRows } from "~/calculations/report-rows";
import { parseAngleDeg } from "~/geometry/angles";
import { parseStation, stationStyleForUnits } from "~/geometry/stations";
import type { LengthUnit } from "~/geometry/units";
import { Card } from "~/components/ui/card";
import { Field, SelectField } from "~/components/ui/field";
import { CurveDrawing } from "./curve-drawing";
import { simpleCurveFigure } from "./figures";
import { ResultActions, ResultTable } from "./result-actions";
import { StakingTableView } from "./staking-table-view";
import { optionalNumber, useCalculation } from "./use-calculation";

const UNIT_OPTIONS = [
  { value: "m", label: "metres" },
  { value: "ft", label: "international feet" },
  { value: "usft", label: "US survey feet" },
];

export function SimpleCurvePanel() {
  const [units, setUnits] = useState<LengthUnit>("m");
  const [by, setBy] = useState<"radius" | "arc" | "chord">("radius");
  const [size, setSize] = useState("400");
  const [delta, setDelta] = useState("38°15'20\"");
  const [piStation, setPiStation] = useState("");
  const [interval, setInterval] = useState("");
  const calc = useCalculation(() => {
    const value = optionalNumber(size, by === "radius" ? "radius" : "degree of curve");
    if (value === undefined || delta.trim() === "") return null;
    return buildSimpleCurveReport({
      units,
      ...(by === "radius" ? { radius: value } : { degree: value, definition: by }),
      delta: parseAngleDeg(delta, "Δ"),
      piStation: piStation.trim() ? parseStation(piStation, stationStyleForUnits(units), "PI station") : undefined,
      stakingInterval: optionalNumber(interval, "staking interval"),
    });
  }, [units, by, size, delta, piStation, interval]);
  const rows = calc.result ? simpleReportRows(calc.result) : [];
  return (
    <div className="grid gap-6 lg:grid-cols-[22rem_1fr]">
      <Card title="What you know">
        <div className="space-y-4">
          <SelectField label="Length unit" value={units} onChange={(e) => setUnits(e.target.value as LengthUnit)} options={UNIT_OPTIONS} />
          <SelectField
            label="Curve given by"
            value={by}
            onChange={(e) => setBy(e.target.value as typeof by)}
            options={[
              { value: "radius", label: "radius" },
              { value: "arc", label: units === "m" ? "degree of curve, 20 m arc" : "degree of curve, 100 ft arc" },
              ...(units === "m" ? [] : [{ value: "chord", label: "degree of curve, 100 ft chord" }]),
            ]}
          />
          <Field label={by === "radius" ? "Radius R" : "Degree of curve D (decimal degrees)"} value={size} onChange={(e) => setSize(e.target.value)} inputMode="decimal" />
          <Field label="Central angle Δ" value={delta} onChange={(e) => setDelta(e.target.value)} hint={'DMS like 38°15\'20", 38-15-20 or 38 15 20.5, or decimal degrees'} />
          <Field label="Station of the PI (optional)" value={piStation} onChange={(e) => setPiStation(e.target.value)} placeholder={units === "m" ? "3+415.250" : "54+23.15"} />
          <Field label="Staking interval (optional)" value={interval} onChange={(e) => setInterval(e.target.value)} inputMode="decimal" hint="Needs the PI station. E.g. 20 (m) or 100, 50, 25 (ft)." />
        </div>
      </Card>
      <div className="space-y-6">
        {calc.error && <p role="alert" className="rounded-md bg-danger-tint px-4 py-3 text-sm font-semibold text-danger">{calc.error}</p>}
        {calc.result && (
          <>
            <Card title="Curve elements" actions={<ResultActions rows={rows} fileName="simple-curve.csv" />}>
              <ResultTable rows={rows} />
            </Card>
            <Card title="Sketch">
              <CurveDrawing figure={simpleCurveFigure(calc.result)} title="Simple circular curve with PC, PI, PT, radius, tangent and long chord" />
            </Card>
            {calc.result.staking && (
              <Card title="Staking by deflection angles from the PC">
                <StakingTableView rows={calc.result.staking} units={units} />
              </Card>
            )}
          </>
        )}
      </div>
    </div>
  );
}
