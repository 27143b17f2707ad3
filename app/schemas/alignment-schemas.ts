import { z } from "zod";
import { LengthSchema, LengthUnitsSchema, StationSchema } from "./survey-fields";

const CoordinateSchema = z.number().finite();

/** A PI's curve, exactly as the issue-3 alignment format writes it. */
export const AlignmentCurveSchema = z.union([
  z.object({ type: z.literal("simple"), radius: LengthSchema }).strict(),
  z.object({ type: z.literal("compound"), radius1: LengthSchema, radius2: LengthSchema, delta1: z.number().finite() }).strict(),
  z.object({ type: z.literal("compound"), radius1: LengthSchema, radius2: LengthSchema, tangentPC: LengthSchema }).strict(),
]);

/**
 * `{units, startStation, points: [{x, y, curve?}], stationEquations?}` — coordinates in the
 * working CRS in `units`; the first and last points carry no curve (the engine says so if they do).
 */
export const AlignmentSchema = z.object({
  units: LengthUnitsSchema,
  startStation: StationSchema.default(0),
  points: z.array(z.object({ x: CoordinateSchema, y: CoordinateSchema, curve: AlignmentCurveSchema.optional() })).min(2, "An alignment needs a start and an end point.").max(2000),
  stationEquations: z.array(z.object({ back: StationSchema, ahead: StationSchema })).max(100).optional(),
});

export const DesignCheckSchema = z.object({
  designSpeed: z.number().positive().max(400).optional(),
  speedUnit: z.enum(["km/h", "mph"]).optional(),
  emaxPercent: z.union([z.literal(4), z.literal(6), z.literal(8), z.literal(10), z.literal(12)]).optional(),
  context: z.enum(["open-road", "intersection"]).optional(),
});

/** `POST /api/v1/alignments/geometry`. */
export const AlignmentGeometryRequestSchema = z.object({
  alignment: AlignmentSchema,
  design: DesignCheckSchema.optional(),
  offsets: z.array(z.number().finite()).max(20).optional(),
  chordTolerance: z.number().positive().optional(),
  /** Failed checks the planner accepted, by check id, each with the reason (kept with the alternative). */
  acceptedChecks: z.array(z.object({ id: z.string().min(1).max(120), reason: z.string().trim().min(3, "Give a reason for accepting the check.").max(2000) })).max(500).optional(),
});
