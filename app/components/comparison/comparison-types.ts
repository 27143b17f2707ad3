import type { AlternativeSummary } from "~/components/alternatives/api-types";

/** `GET /api/v1/projects/:projectId/comparison` (and the comparison page's loader), as the browser reads it. */
export interface ComparisonAlternative {
  id: number;
  name: string;
  colour: string;
  status: string;
  version: number;
  summary: AlternativeSummary;
}

export interface ComparisonCell {
  alternativeId: number;
  takeArea: number;
  classification: "partial" | "full";
  estimatedCost: number;
}

export interface ComparisonRow {
  parcelId: string;
  owner: string | null;
  address: string | null;
  parcelArea: number;
  takes: ComparisonCell[];
}

export interface ComparisonJson {
  units: "m" | "ft" | "usft";
  alternatives: ComparisonAlternative[];
  matrix: ComparisonRow[];
}
