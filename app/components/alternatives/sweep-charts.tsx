import type { SweepResult, SweepStep, SweepVariable } from "./api-types";
import { formatCost, formatNumber } from "./format";
import { SweepChart, type SweepPoint } from "./sweep-chart";
import { VARIABLE_LABELS } from "./sweep-defaults";

/** Take area in the project's square unit; cost in its currency. */
const METRICS: { key: keyof Pick<SweepStep, "takeArea" | "estimatedCost" | "parcelsAffected" | "displacements">; title: string; integer?: boolean }[] = [
  { key: "takeArea", title: "Take area" },
  { key: "estimatedCost", title: "Estimated cost (order of magnitude)" },
  { key: "parcelsAffected", title: "Parcels affected", integer: true },
  { key: "displacements", title: "Buildings displaced", integer: true },
];

/** A step where any design check is unmet — accepted or not: the chart shows what the rule says. */
const failing = (s: SweepStep) => s.checks !== null && s.checks.status !== "pass";

/** The four trade-off charts of a sweep, and the same figures as a table for reading exactly. */
export function SweepCharts({ result, vary, unit, lengthUnit, onPick }: { result: SweepResult; vary: SweepVariable; unit: string; lengthUnit: string; onPick?: (value: number) => void }) {
  const isRadius = vary !== "delta1";
  const marker = isRadius && result.minimumRadius !== null ? { x: result.minimumRadius, label: `min R ${formatNumber(result.minimumRadius)} ${lengthUnit}` } : null;
  const note = (s: SweepStep) => `${VARIABLE_LABELS[vary]} ${formatNumber(s.value, 2)} ${unit}`;
  const xLabel = `${VARIABLE_LABELS[vary]} (${unit})`;
  return (
    <div className="space-y-3">
      <p className="text-xs text-ink-soft">
        {onPick ? "Click a point (or focus it and press Enter) to apply its value to the PI. " : ""}
        Hollow diamonds: a design check is not met at that value (even where a warning was accepted). Crosses: the alignment does not compute there.{marker ? " Dashed line: minimum radius for the design speed and emax." : ""}
      </p>
      <div className="grid gap-4 sm:grid-cols-2">
        {METRICS.map((m) => {
          const points: SweepPoint[] = result.steps.map((s) => ({ value: s.value, y: s[m.key], failing: failing(s), note: note(s) }));
          return <SweepChart key={m.key} title={m.title} xLabel={xLabel} points={points} marker={marker} onPick={onPick} integer={m.integer} />;
        })}
      </div>
      <details className="text-sm">
        <summary className="cursor-pointer font-semibold">The sweep as a table</summary>
        <div className="mt-2 max-h-72 overflow-auto">
          <table className="w-full border-collapse text-sm" data-testid="sweep-table">
            <thead>
              <tr className="border-b border-rule-strong text-left text-label text-ink-soft">
                {[xLabel, "Take area", "Cost estimate", "Parcels", "Displaced", "Checks"].map((h) => <th key={h} scope="col" className="px-2 py-1">{h}</th>)}
              </tr>
            </thead>
            <tbody>
              {result.steps.map((s) => (
                <tr key={s.value} className="border-b border-rule">
                  <td className="px-2 py-1 tabular-nums">{formatNumber(s.value, 2)}</td>
                  <td className="px-2 py-1 tabular-nums">{formatNumber(s.takeArea, 1)}</td>
                  <td className="px-2 py-1 tabular-nums">{formatCost(s.estimatedCost)}</td>
                  <td className="px-2 py-1 tabular-nums">{s.parcelsAffected ?? "—"}</td>
                  <td className="px-2 py-1 tabular-nums">{s.displacements ?? "—"}</td>
                  <td className="px-2 py-1">{s.error ?? (s.checks ? (s.checks.warnings.length ? s.checks.warnings.join(" ") : s.checks.status) : "—")}</td>
                </tr>
              ))}
            </tbody>
          </table>
        </div>
      </details>
    </div>
  );
}
