import type { MultiPolygon, Polygon } from "geojson";
import type { AlternativeSummary } from "~/calculations/alternative-summary";
import type { ReviewedCheck, CheckAcceptance } from "~/calculations/check-acceptances";
import type { ParcelImpactJson } from "~/calculations/impact-json";
import type { SweepStep, SweepVariable } from "~/calculations/curve-sweep";
import type { AlignmentElement, AlignmentInput, CurveSummary, KeyStation } from "~/geometry/alignment-types";
import type { CorridorInput, TakeRules } from "~/geometry/take-types";

/** JSON shapes of the alternatives API as the browser reads them (see the README's API table). */
export type { AlternativeSummary, CheckAcceptance, ParcelImpactJson, ReviewedCheck, SweepStep, SweepVariable };

export type AreaGeometry = Polygon | MultiPolygon;

export interface TakeOutline {
  parcelId: string;
  classification: "partial" | "full";
  geometry: AreaGeometry;
}

/** Everything drawn for one alternative, in the working CRS. */
export interface AlternativeOutlines {
  corridor: AreaGeometry;
  easement: AreaGeometry | null;
  takes: TakeOutline[];
}

/** `POST /api/v1/alternatives/:id/preview` answer. */
export interface PreviewResult {
  geometry: { length: number; elements: AlignmentElement[]; curves: CurveSummary[]; stations: KeyStation[] };
  centerline: { type: "LineString"; coordinates: [number, number][] };
  checks: ReviewedCheck[];
  summary: AlternativeSummary;
  parcels: ParcelImpactJson[];
  outlines: AlternativeOutlines;
}

export type SpeedUnit = "km/h" | "mph";

/** What the planner edits; the editor keeps whole copies of it for undo. */
export interface AlternativeDraft {
  alignment: AlignmentInput;
  corridor: CorridorInput;
  designSpeed: number;
  speedUnit: SpeedUnit;
  emaxPercent: number;
  /** This alternative's own take and cost rules; missing keys come from the project, then the defaults. */
  rules?: Partial<TakeRules>;
  acceptedChecks: CheckAcceptance[];
}

/** `GET /api/v1/alternatives/:id` (the fields the UI uses). */
export interface AlternativeJson extends AlternativeDraft {
  id: number;
  projectId: number;
  name: string;
  description: string;
  colour: string;
  status: "draft" | "submitted" | "approved" | "returned" | "superseded";
  version: number;
  summary?: AlternativeSummary | null;
}

export interface SweepRequest {
  pointIndex: number;
  vary: SweepVariable;
  from: number;
  to: number;
  steps: number;
}

export interface SweepResult {
  steps: SweepStep[];
  minimumRadius: number | null;
}

/** The API's error envelope `{error: {code, message, details?}}`. */
export interface ApiErrorBody {
  error: { code: string; message: string; details?: unknown };
}
