import type { ParcelTake } from "../geometry/take-types";

/** One alternative's totals, each the plain sum or count of its rows (the same definitions as TakeTotals). */
export interface ImpactSummary {
  parcelsAffected: number;
  fullTakes: number;
  partialTakes: number;
  takeArea: number;
  easementArea: number;
  remainderArea: number;
  /** Buildings hit (displacements) and buildings left near the new line, counted over parcels. */
  displacements: number;
  proximityImpacts: number;
  cost: ParcelTake["cost"];
}

/** Sums rows: counts of parcels and classes, Σ areas, Σ buildings hit/near, Σ each cost line. */
export function summarizeImpactRows(rows: readonly ParcelTake[]): ImpactSummary {
  const s: ImpactSummary = {
    parcelsAffected: rows.length,
    fullTakes: 0,
    partialTakes: 0,
    takeArea: 0,
    easementArea: 0,
    remainderArea: 0,
    displacements: 0,
    proximityImpacts: 0,
    cost: { land: 0, buildings: 0, severance: 0, easement: 0, administrative: 0, contingency: 0, total: 0 },
  };
  for (const r of rows) {
    if (r.classification === "full") s.fullTakes++;
    else s.partialTakes++;
    s.takeArea += r.takeArea;
    s.easementArea += r.easementArea;
    s.remainderArea += r.remainderArea;
    s.displacements += r.buildingsHit.length;
    s.proximityImpacts += r.buildingsNear.length;
    for (const k of Object.keys(s.cost) as (keyof ParcelTake["cost"])[]) s.cost[k] += r.cost[k];
  }
  return s;
}
