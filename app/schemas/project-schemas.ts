import { z } from "zod";

export const LengthUnitSchema = z.enum(["m", "ft", "usft"]);

/** A projected working CRS as "EPSG:<code>". Whether the code is projected is checked where definitions are known. */
export const CrsSchema = z
  .string()
  .trim()
  .regex(/^EPSG:\d{4,6}$/i, "Write the coordinate system as EPSG:<code>, e.g. EPSG:32617.")
  .transform((v) => v.toUpperCase());

/** A combined (grid-to-ground) scale factor; real ones sit within a few hundred ppm of 1. */
export const ScaleFactorSchema = z.coerce.number().gt(0.99, "A combined scale factor is close to 1 (0.99–1.01).").lt(1.01, "A combined scale factor is close to 1 (0.99–1.01).");

export const ProjectFormSchema = z.object({
  name: z.string().trim().min(1, "Give the project a name.").max(120),
  description: z.string().trim().max(2000).default(""),
  units: LengthUnitSchema,
  crs: z.union([z.literal("").transform(() => undefined), CrsSchema]).optional(),
  scaleFactor: z.union([z.literal("").transform(() => undefined), ScaleFactorSchema]).optional(),
});
