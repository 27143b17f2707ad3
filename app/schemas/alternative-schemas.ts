import { z } from "zod";
import { AlignmentSchema } from "./alignment-schemas";
import { CorridorSchema, TakeRulesSchema } from "./take-schemas";

// Not strict: a client may send back the `acceptedBy`/`acceptedAt` it read, and they are dropped here.
// Only the server stamps who accepted a check and when (stampAcceptances, in the save service).
const AcceptedCheckSchema = z.object({
  id: z.string().min(1).max(120),
  reason: z.string().trim().min(3, "Give a reason for accepting the check.").max(2000),
});

const AlternativeFields = {
  name: z.string().trim().min(1, "Name the alternative.").max(120),
  description: z.string().trim().max(4000),
  designSpeed: z.number().positive().max(400),
  speedUnit: z.enum(["km/h", "mph"]),
  emaxPercent: z.union([z.literal(4), z.literal(6), z.literal(8), z.literal(10), z.literal(12)]),
  alignment: AlignmentSchema,
  corridor: CorridorSchema,
  rules: TakeRulesSchema,
  acceptedChecks: z.array(AcceptedCheckSchema).max(500),
};

/** `POST /api/v1/projects/:projectId/alternatives {name, alignment, corridor, rules?, …}`. */
export const AlternativeCreateSchema = z.object({
  ...AlternativeFields,
  description: AlternativeFields.description.default(""),
  designSpeed: AlternativeFields.designSpeed.optional(),
  speedUnit: AlternativeFields.speedUnit.optional(),
  emaxPercent: AlternativeFields.emaxPercent.default(8),
  rules: AlternativeFields.rules.default({}),
  acceptedChecks: AlternativeFields.acceptedChecks.default([]),
});

/** `PUT /api/v1/alternatives/:id {version, …changes}`: `version` is the one the edit started from. */
export const AlternativeUpdateSchema = z
  .object({ version: z.number().int().positive(), ...AlternativeFields })
  .partial()
  .required({ version: true })
  .strict();

/** An unsaved what-if of an alternative (the editor while a PI is dragged). */
export const AlternativePreviewSchema = z.object({
  alignment: AlignmentSchema,
  corridor: CorridorSchema.optional(),
  rules: TakeRulesSchema.optional(),
  designSpeed: AlternativeFields.designSpeed.optional(),
  speedUnit: AlternativeFields.speedUnit.optional(),
  emaxPercent: AlternativeFields.emaxPercent.optional(),
  acceptedChecks: AlternativeFields.acceptedChecks.optional(),
  geometry: z.boolean().default(true),
});

/** `POST /api/v1/alternatives/:id/sweep`. */
export const SweepSchema = z
  .object({
    pointIndex: z.number().int().min(1),
    vary: z.enum(["radius", "radius1", "radius2", "delta1"]),
    from: z.number().finite().positive(),
    to: z.number().finite().positive(),
    steps: z.number().int().min(2).max(200),
  })
  .refine((s) => s.to !== s.from, { message: "`from` and `to` must differ.", path: ["to"] });

/** `POST /api/v1/takes`: stateless overlay for scripts. */
export const StatelessTakesSchema = z.object({
  units: z.enum(["m", "ft", "usft"]),
  alignment: AlignmentSchema.omit({ units: true }).extend({ units: z.enum(["m", "ft", "usft"]).optional() }),
  corridor: CorridorSchema,
  parcels: z.object({ type: z.literal("FeatureCollection"), features: z.array(z.unknown()).max(50_000) }),
  buildings: z.object({ type: z.literal("FeatureCollection"), features: z.array(z.unknown()).max(50_000) }).optional(),
  rules: TakeRulesSchema.optional(),
});
