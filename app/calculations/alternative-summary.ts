import type { AlignmentGeometry } from "~/geometry/compute-alignment-geometry";
import type { TakeResult } from "~/geometry/take-types";
import type { ReviewedCheck } from "./check-acceptances";

/** What the comparison shows of one alternative (lengths and areas in the project's units). */
export interface AlternativeSummary {
  length: number;
  minimumRadius: number | null;
  curveCount: number;
  /** "pass" when every check is met; "accepted" when each unmet one was accepted with a reason; else "warnings". */
  checkStatus: "pass" | "accepted" | "warnings";
  checkWarnings: number;
  checksAccepted: number;
  corridorArea: number;
  parcelsAffected: number;
  partialTakes: number;
  fullTakes: number;
  /** Parcels that give only temporary easement, no right-of-way. */
  easementOnly: number;
  displacements: number;
  proximityImpacts: number;
  takeArea: number;
  easementArea: number;
  unparcelledArea: number;
  estimatedCost: number;
  costLines: { land: number; buildings: number; severance: number; easement: number; administrative: number; contingency: number };
}

/** Sums an alignment, its reviewed checks and its takes into one comparable row. */
export function summarizeAlternative(geometry: AlignmentGeometry, checks: ReviewedCheck[], takes: TakeResult): AlternativeSummary {
  const radii = geometry.elements.flatMap((e) => (e.type === "arc" ? [e.radius] : []));
  const warnings = checks.filter((c) => c.severity === "warning");
  const accepted = warnings.filter((c) => c.accepted).length;
  const costLines = { land: 0, buildings: 0, severance: 0, easement: 0, administrative: 0, contingency: 0 };
  for (const p of takes.parcels) for (const k of Object.keys(costLines) as (keyof typeof costLines)[]) costLines[k] += p.cost[k];
  return {
    length: geometry.length,
    minimumRadius: radii.length ? Math.min(...radii) : null,
    curveCount: geometry.curves.length,
    checkStatus: warnings.length === 0 ? "pass" : accepted === warnings.length ? "accepted" : "warnings",
    checkWarnings: warnings.length,
    checksAccepted: accepted,
    corridorArea: takes.corridorArea,
    parcelsAffected: takes.totals.parcelsAffected,
    partialTakes: takes.totals.partialTakes,
    fullTakes: takes.totals.fullTakes,
    easementOnly: takes.parcels.filter((p) => !(p.takeArea > 0)).length,
    displacements: takes.totals.displacements,
    proximityImpacts: takes.totals.proximityImpacts,
    takeArea: takes.totals.parcelTakeArea,
    easementArea: takes.totals.parcelEasementArea,
    unparcelledArea: takes.totals.unparcelledArea,
    estimatedCost: takes.totals.estimatedCost,
    costLines,
  };
}
