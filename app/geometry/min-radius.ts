import { GeometryInputError } from "./errors";
import { EMAX_OPTIONS_PERCENT, MIN_RADIUS_SOURCE, SIDE_FRICTION_METRIC, SIDE_FRICTION_US } from "./side-friction";
import { requireFinite } from "./validate";

/** Design speed unit: km/h gives radii in metres, mph in feet. */
export type SpeedUnit = "km/h" | "mph";

/** Inputs of {@link computeMinimumRadius}. */
export interface MinimumRadiusInput {
  designSpeed: number;
  speedUnit: SpeedUnit;
  /** Maximum superelevation, percent: one of 4, 6, 8, 10, 12. */
  emaxPercent: number;
}

/** Minimum radius for a design speed, in ft (mph) or m (km/h). */
export interface MinimumRadius {
  calculated: number;
  /** Rounded as Table 3-7 prints it: US to 1 ft below 1000 ft and 10 ft above; metric to 1 m. */
  rounded: number;
  unit: "ft" | "m";
  fmax: number;
  source: string;
}

/**
 * Point-mass formula Rmin = V²/(15(e + f)) (V mph, R ft) or V²/(127(e + f)) (V km/h, R m) with
 * the limiting e = emax/100 and f = fmax of AASHTO Green Book 2018 Table 3-7. Throws
 * `out_of_range` for a speed not in the table or an emax not among 4, 6, 8, 10, 12 %.
 */
export function computeMinimumRadius(input: MinimumRadiusInput): MinimumRadius {
  const v = requireFinite(input.designSpeed, "designSpeed");
  const e = requireFinite(input.emaxPercent, "emaxPercent");
  if (!(EMAX_OPTIONS_PERCENT as readonly number[]).includes(e)) {
    throw new GeometryInputError("out_of_range", `emaxPercent must be one of ${EMAX_OPTIONS_PERCENT.join(", ")}, got ${e}`, { field: "emaxPercent" });
  }
  if (input.speedUnit !== "km/h" && input.speedUnit !== "mph") {
    throw new GeometryInputError("invalid_unit", `speedUnit must be "km/h" or "mph", got ${JSON.stringify(input.speedUnit)}`, { field: "speedUnit" });
  }
  const us = input.speedUnit === "mph";
  const table = us ? SIDE_FRICTION_US : SIDE_FRICTION_METRIC;
  const fmax = table[v];
  if (fmax === undefined) {
    throw new GeometryInputError("out_of_range", `design speed ${v} ${input.speedUnit} is not a row of Table 3-7 (${Object.keys(table).join(", ")})`, {
      field: "designSpeed",
    });
  }
  const calculated = (v * v) / ((us ? 15 : 127) * (e / 100 + fmax));
  const rounded = us && calculated >= 1000 ? Math.round(calculated / 10) * 10 : Math.round(calculated);
  return { calculated, rounded, unit: us ? "ft" : "m", fmax, source: MIN_RADIUS_SOURCE };
}
