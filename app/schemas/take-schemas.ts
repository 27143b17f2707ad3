import { z } from "zod";
import { LengthSchema, StationSchema } from "./survey-fields";

const Width = LengthSchema.min(0, "A width cannot be negative.").max(10_000);

/** A stretch where the right-of-way widens or narrows, tapering over `transition`. */
export const CorridorRangeSchema = z
  .object({
    fromStation: StationSchema,
    toStation: StationSchema,
    left: Width.optional(),
    right: Width.optional(),
    transition: Width.default(0),
  })
  .refine((r) => r.toStation > r.fromStation, { message: "A width range must end ahead of where it starts.", path: ["toStation"] });

/** `{left, right, easement?, ranges?}`: right-of-way half-widths either side of the centreline, looking ahead. */
export const CorridorSchema = z
  .object({
    left: Width,
    right: Width,
    easement: Width.optional(),
    ranges: z.array(CorridorRangeSchema).max(200).optional(),
  })
  .refine((c) => c.left + c.right > 0, { message: "The right-of-way needs a width on at least one side.", path: ["left"] });

const Money = z.number().finite().min(0).max(1e12);
const Percent = z.number().finite().min(0).max(1000);

/** Take and cost rules; every key optional (missing ones come from the project, then the defaults). */
export const TakeRulesSchema = z
  .object({
    remnantMinArea: z.number().finite().min(0),
    remnantMinFraction: z.number().finite().min(0).max(1),
    landValuePerArea: Money,
    buildingValue: Money,
    severancePercent: Percent,
    easementRatePerArea: Money,
    adminCostPerParcel: Money,
    contingencyPercent: Percent,
    proximityDistance: Width,
  })
  .partial()
  .strict();

export type TakeRulesOverrides = z.infer<typeof TakeRulesSchema>;
