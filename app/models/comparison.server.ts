import { db, type Db } from "~/utils/db.server";
import { readImpacts } from "./alternative-impacts.server";
import { listAlternatives, type Alternative } from "./alternatives.server";
import type { Project } from "./projects.server";
import type { AlternativeSummary } from "~/calculations/alternative-summary";
import type { ComparisonRow } from "~/calculations/comparison-rows";

export interface Comparison {
  units: string;
  alternatives: { id: number; name: string; colour: string; status: Alternative["status"]; version: number; summary: AlternativeSummary }[];
  matrix: ComparisonRow[];
}

/** Every alternative's summary and the parcel × alternative matrix of takes (parcels in ID order). */
export function readComparison(project: Project, tx: Db = db()): Comparison {
  const alternatives = listAlternatives(project.id, tx);
  const rows = new Map<string, ComparisonRow>();
  const summaries = alternatives.map((a) => {
    const impacts = readImpacts(a, project, tx);
    for (const p of impacts.parcels) {
      const row = rows.get(p.parcelId) ?? { parcelId: p.parcelId, owner: p.owner, address: p.address, parcelArea: p.parcelArea, takes: [] };
      row.takes.push({ alternativeId: a.id, takeArea: p.takeArea, classification: p.classification, estimatedCost: p.cost.total });
      rows.set(p.parcelId, row);
    }
    return { id: a.id, name: a.name, colour: a.colour, status: a.status, version: a.version, summary: impacts.summary };
  });
  const matrix = [...rows.values()].sort((x, y) => x.parcelId.localeCompare(y.parcelId, "en", { numeric: true }));
  return { units: project.units, alternatives: summaries, matrix };
}
