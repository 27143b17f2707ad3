import type { SpeedUnit } from "./min-radius";

/** Inputs of the design checks. Without `designSpeed` the radius and speed-based checks are skipped. */
export interface DesignCheckInput {
  designSpeed?: number;
  speedUnit?: SpeedUnit;
  /** Maximum superelevation, percent (4, 6, 8, 10, 12). Default 8. */
  emaxPercent?: number;
  /** Ratio limit for compound radii: 1.5 open road, 2.0 intersections and ramps. Default "open-road". */
  context?: "open-road" | "intersection";
  /** Override of the broken-back minimum tangent, alignment units (default 15·V ft per mph, from memory). */
  brokenBackMinTangent?: number;
  /** Override of the minimum tangent between reverse curves, alignment units (default 0.6·V m per km/h). */
  reverseMinTangent?: number;
}

/** One design-check result. Checks never block; the app stores accepted exceptions by `id`. */
export interface DesignCheckResult {
  id: string;
  piIndex?: number;
  severity: "ok" | "warning";
  message: string;
  value: number;
  limit: number;
  source: string;
}
