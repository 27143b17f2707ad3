import { useEffect, useId, useRef, useState, type ReactNode } from "react";
import { Button } from "~/components/ui/button";
import { computeMinimumRadius } from "~/geometry/min-radius";
import { convertLength } from "~/geometry/units";
import type { AlignmentCurveInput } from "~/geometry/alignment-types";
import { isAbort, requestSweep } from "./api-client";
import type { AlternativeDraft, SweepResult, SweepVariable } from "./api-types";
import { deflectionDeg } from "./alignment-edits";
import { lengthUnitLabel } from "./format";
import { NumberInput } from "./number-input";
import { SweepCharts } from "./sweep-charts";
import { defaultSweepRange, sweepVariablesFor, VARIABLE_LABELS } from "./sweep-defaults";

export interface TradeoffProps {
  alternativeId: number;
  draft: AlternativeDraft;
  piIndex: number | null;
  editable: boolean;
  /** Saves pending edits first: the sweep runs on the saved alternative. */
  flush: () => Promise<boolean>;
  onApply: (piIndex: number, vary: SweepVariable, value: number) => void;
}

/** Curve choice against land take at one PI: sweep a curve parameter and chart what each value takes. */
export function CurveTradeoffPanel({ alternativeId, draft, piIndex, editable, flush, onApply }: TradeoffProps) {
  const id = useId();
  const points = draft.alignment.points;
  const isPi = piIndex !== null && piIndex > 0 && piIndex < points.length - 1;
  const curve: AlignmentCurveInput | undefined = isPi ? points[piIndex]!.curve : undefined;
  const variables = sweepVariablesFor(curve);
  const [vary, setVary] = useState<SweepVariable>(variables[0]!);
  const minimumRadius = minimumRadiusOf(draft);
  const deflection = isPi ? deflectionDeg(points, piIndex) : 0;
  const [range, setRange] = useState(() => defaultSweepRange(vary, curve, deflection, minimumRadius));
  const [result, setResult] = useState<(SweepResult & { vary: SweepVariable; piIndex: number }) | null>(null);
  const [error, setError] = useState<string | null>(null);
  const [running, setRunning] = useState(false);
  const controller = useRef<AbortController | null>(null);
  const curveKey = `${piIndex}:${curve?.type ?? "none"}`;

  useEffect(() => {
    const v = sweepVariablesFor(curve)[0]!;
    setVary(v);
    setRange(defaultSweepRange(v, curve, deflection, minimumRadius));
  }, [curveKey]); // eslint-disable-line react-hooks/exhaustive-deps

  if (!isPi) return <p className="text-sm text-ink-soft">Select a PI — in the table or on the map — to weigh its curve against the land it takes.</p>;

  const run = async () => {
    controller.current?.abort();
    controller.current = new AbortController();
    setRunning(true);
    setError(null);
    try {
      if (editable && !(await flush())) {
        setError("Your latest edits are not saved, and the sweep runs on the saved alternative: save them first (see the status above).");
        return;
      }
      const outcome = await requestSweep(alternativeId, { pointIndex: piIndex, vary, ...range }, controller.current.signal);
      if (outcome.ok) setResult({ ...outcome.value, vary, piIndex });
      else setError(outcome.message);
    } catch (e) {
      if (!isAbort(e)) setError("The sweep could not reach the server.");
    } finally {
      setRunning(false);
    }
  };
  const unit = vary === "delta1" ? "°" : lengthUnitLabel(draft.alignment.units);
  return (
    <div className="space-y-4" data-testid="curve-tradeoff">
      <form className="grid grid-cols-2 items-end gap-3 sm:grid-cols-5" onSubmit={(e) => { e.preventDefault(); void run(); }}>
        <div className="space-y-1">
          <label htmlFor={`${id}-vary`} className="block text-label font-semibold">Vary at PI {piIndex}</label>
          <select id={`${id}-vary`} value={vary} onChange={(e) => { const v = e.target.value as SweepVariable; setVary(v); setRange(defaultSweepRange(v, curve, deflection, minimumRadius)); }}
            className="w-full rounded-control border border-rule-strong bg-sheet px-2 py-1.5 text-sm">
            {variables.map((v) => <option key={v} value={v}>{VARIABLE_LABELS[v]}</option>)}
          </select>
        </div>
        <Labelled label={`From (${unit})`}><NumberInput label={`Sweep from (${unit})`} value={range.from} min={0.0001} onCommit={(v) => setRange((r) => ({ ...r, from: v }))} /></Labelled>
        <Labelled label={`To (${unit})`}><NumberInput label={`Sweep to (${unit})`} value={range.to} min={0.0001} onCommit={(v) => setRange((r) => ({ ...r, to: v }))} /></Labelled>
        <Labelled label="Steps"><NumberInput label="Sweep steps" value={range.steps} min={2} max={200} step="1" onCommit={(v) => setRange((r) => ({ ...r, steps: Math.round(v) }))} /></Labelled>
        <Button type="submit" disabled={running}>{running ? "Sweeping…" : "Run the sweep"}</Button>
      </form>
      {curve === undefined && <p className="text-xs text-ink-soft">PI {piIndex} is an angle point: the sweep tries a simple curve of each radius.</p>}
      {error && <p role="alert" className="text-sm font-semibold text-danger">{error}</p>}
      {result && result.piIndex === piIndex && (
        <SweepCharts result={result} vary={result.vary} unit={unit} lengthUnit={lengthUnitLabel(draft.alignment.units)} onPick={editable ? (value) => onApply(piIndex, result.vary, value) : undefined} />
      )}
    </div>
  );
}

function Labelled({ label, children }: { label: string; children: ReactNode }) {
  return (
    <div className="space-y-1">
      <span aria-hidden className="block text-label font-semibold">{label}</span>
      {children}
    </div>
  );
}

/** Minimum radius for the design speed and emax, in the alignment's units (AASHTO Green Book 2018, Table 3-7 via computeMinimumRadius). */
function minimumRadiusOf(draft: AlternativeDraft): number | null {
  try {
    const min = computeMinimumRadius({ designSpeed: draft.designSpeed, speedUnit: draft.speedUnit, emaxPercent: draft.emaxPercent });
    return convertLength(min.rounded, min.unit, draft.alignment.units);
  } catch {
    return null;
  }
}
