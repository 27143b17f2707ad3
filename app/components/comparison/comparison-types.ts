import type { AlternativeSummary } from "~/components/alternatives/api-types";
import type { ComparisonCell, ComparisonRow } from "~/calculations/comparison-rows";

export type { ComparisonCell, ComparisonRow };

/** `GET /api/v1/projects/:projectId/comparison` (and the comparison page's loader), as the browser reads it. */
export interface ComparisonAlternative {
  id: number;
  name: string;
  colour: string;
  status: string;
  version: number;
  summary: AlternativeSummary;
}

export interface ComparisonJson {
  units: "m" | "ft" | "usft";
  alternatives: ComparisonAlternative[];
  matrix: ComparisonRow[];
}
