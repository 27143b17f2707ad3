import { shortNumber } from "~/components/alternatives/chart-scale";
import { formatNumber } from "~/components/alternatives/format";
import type { AlternativeSummary } from "~/components/alternatives/api-types";
import type { ComparisonAlternative } from "./comparison-types";
import { MetricBarChart } from "./metric-bar-chart";

/** The six figures the comparison charts, with their units. */
export function MetricCharts({ alternatives, lengthUnit, areaUnit }: { alternatives: ComparisonAlternative[]; lengthUnit: string; areaUnit: string }) {
  const metrics: { key: keyof AlternativeSummary; title: string; format: (v: number) => string }[] = [
    { key: "length", title: `Length (${lengthUnit})`, format: (v) => formatNumber(v, 0) },
    { key: "takeArea", title: `Take area (${areaUnit})`, format: (v) => formatNumber(v, 0) },
    { key: "parcelsAffected", title: "Parcels affected", format: (v) => String(v) },
    { key: "fullTakes", title: "Full takes", format: (v) => String(v) },
    { key: "displacements", title: "Displacements", format: (v) => String(v) },
    { key: "estimatedCost", title: "Cost estimate (order of magnitude)", format: (v) => `≈ ${shortNumber(v)}` },
  ];
  return (
    <div className="grid gap-5 sm:grid-cols-2 lg:grid-cols-3">
      {metrics.map((m) => (
        <MetricBarChart key={m.key} title={m.title} format={m.format}
          bars={alternatives.map((a) => ({ id: a.id, name: a.name, colour: a.colour, value: Number(a.summary[m.key]) || 0 }))} />
      ))}
    </div>
  );
}
