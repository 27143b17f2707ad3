import { z } from "zod";
import { AngleSchema, LengthSchema, LengthUnitsSchema, StationSchema } from "./survey-fields";

/** `POST /api/v1/curves/simple` (issue 3 contract). */
export const SimpleCurveRequestSchema = z
  .object({
    units: LengthUnitsSchema,
    radius: LengthSchema.optional(),
    degree: AngleSchema.optional(),
    definition: z.enum(["arc", "chord"]).optional(),
    delta: AngleSchema,
    piStation: StationSchema.optional(),
    stakingInterval: LengthSchema.positive().optional(),
  })
  .refine((v) => v.radius !== undefined || v.degree !== undefined, { message: "Give radius, or degree with its definition.", path: ["radius"] })
  .refine((v) => v.degree === undefined || v.definition !== undefined, { message: "Say whether the degree is on an arc or a chord.", path: ["definition"] });

const COMPOUND_LENGTHS = ["radius1", "radius2", "tangentPC", "tangentPT", "subTangent1", "subTangent2", "length1", "length2", "longChord"] as const;
const COMPOUND_ANGLES = ["delta", "delta1", "delta2", "chordAnglePC", "chordAnglePT"] as const;

/** `given` of `POST /api/v1/curves/compound`: any of these; the solver says what is missing. */
export const CompoundGivenSchema = z
  .object({
    ...Object.fromEntries(COMPOUND_LENGTHS.map((k) => [k, LengthSchema.optional()])),
    ...Object.fromEntries(COMPOUND_ANGLES.map((k) => [k, AngleSchema.optional()])),
    commonTangentParallelToLongChord: z.boolean().optional(),
  } as Record<(typeof COMPOUND_LENGTHS)[number], z.ZodOptional<typeof LengthSchema>> &
    Record<(typeof COMPOUND_ANGLES)[number], z.ZodOptional<typeof AngleSchema>> & { commonTangentParallelToLongChord: z.ZodOptional<z.ZodBoolean> })
  .strict();

export const CompoundCurveRequestSchema = z.object({
  units: LengthUnitsSchema,
  given: CompoundGivenSchema,
  pcStation: StationSchema.optional(),
});
