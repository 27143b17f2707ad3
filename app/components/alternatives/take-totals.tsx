import type { AlternativeSummary } from "./api-types";
import { areaUnitLabel, formatCost, formatNumber, type Units } from "./format";

const COST_LINES: { key: keyof AlternativeSummary["costLines"]; label: string }[] = [
  { key: "land", label: "Land (value × take area)" },
  { key: "buildings", label: "Buildings displaced" },
  { key: "severance", label: "Severance damages" },
  { key: "easement", label: "Construction easement" },
  { key: "administrative", label: "Acquisition administration" },
  { key: "contingency", label: "Contingency" },
];

/** The land-take totals of the draft and its estimated cost, line by line. */
export function TakeTotals({ summary, units, pending }: { summary: AlternativeSummary; units: Units; pending: boolean }) {
  const area = areaUnitLabel(units);
  const figures: [string, string, string][] = [
    ["takeArea", "Right-of-way take", `${formatNumber(summary.takeArea, 1)} ${area}`],
    ["easementArea", "Construction easement", `${formatNumber(summary.easementArea, 1)} ${area}`],
    ["parcelsAffected", "Parcels affected", `${summary.parcelsAffected} (${summary.partialTakes} partial, ${summary.fullTakes} full)`],
    ["displacements", "Buildings displaced", String(summary.displacements)],
    ["proximityImpacts", "Buildings close to the new line", String(summary.proximityImpacts)],
    ["unparcelledArea", "Corridor outside any parcel", `${formatNumber(summary.unparcelledArea, 1)} ${area}`],
    ["corridorArea", "Right-of-way area", `${formatNumber(summary.corridorArea, 1)} ${area}`],
  ];
  return (
    <div className="space-y-4" data-testid="take-totals" aria-busy={pending}>
      <dl className="grid grid-cols-1 gap-y-1 text-sm">
        {figures.map(([key, label, value]) => (
          <div key={key} className="flex justify-between gap-2 border-b border-rule py-1">
            <dt className="text-ink-soft">{label}</dt>
            <dd className="text-right tabular-nums" data-testid={`total-${key}`}>{value}</dd>
          </div>
        ))}
      </dl>
      <div>
        <h3 className="mb-1 text-sm font-semibold">Estimated cost — an order-of-magnitude estimate, not an appraisal</h3>
        <dl className="text-sm">
          {COST_LINES.map((l) => (
            <div key={l.key} className="flex justify-between gap-2 py-0.5">
              <dt className="text-ink-soft">{l.label}</dt>
              <dd className="tabular-nums">{formatCost(summary.costLines[l.key])}</dd>
            </div>
          ))}
          <div className="mt-1 flex justify-between gap-2 border-t border-rule-strong pt-1 font-semibold">
            <dt>Total estimate</dt>
            <dd className="tabular-nums" data-testid="total-estimatedCost">{formatCost(summary.estimatedCost)}</dd>
          </div>
        </dl>
      </div>
    </div>
  );
}
