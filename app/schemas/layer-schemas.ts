import { z } from "zod";
import { CrsSchema } from "./project-schemas";

export const LayerKindSchema = z.enum(["parcels", "buildings"]);

/** Our attribute names → the file's field names; null clears a guess. */
export const FieldChoicesSchema = z
  .object({
    parcelId: z.string().min(1).nullable(),
    owner: z.string().min(1).nullable(),
    address: z.string().min(1).nullable(),
    landUse: z.string().min(1).nullable(),
    landValue: z.string().min(1).nullable(),
  })
  .partial()
  .strict();

/** `fields` arrives as JSON text in a multipart form. */
const FieldsJsonSchema = z.string().transform((text, ctx) => {
  try {
    return JSON.parse(text) as unknown;
  } catch {
    ctx.addIssue({ code: "custom", message: "fields must be a JSON object, e.g. {\"parcelId\": \"APN\"}." });
    return z.NEVER;
  }
}).pipe(FieldChoicesSchema);

const blankToUndefined = (v: unknown) => (v === "" ? undefined : v);

/** The text parts of a layer upload or preview (the file part is read separately). */
export const LayerUploadFieldsSchema = z.object({
  name: z.string().trim().min(1, "Give the layer a name.").max(120),
  kind: LayerKindSchema,
  sourceCrs: z.preprocess(blankToUndefined, CrsSchema.optional()),
  fields: z.preprocess(blankToUndefined, FieldsJsonSchema.optional()),
  replacesLayerId: z.preprocess(blankToUndefined, z.coerce.number().int().positive().optional()),
  landValueBasis: z.preprocess(blankToUndefined, z.enum(["total", "perArea"]).optional()),
});

/** A preview needs no name yet. */
export const LayerPreviewFieldsSchema = LayerUploadFieldsSchema.extend({
  name: z.string().trim().max(120).optional(),
});

export type LayerUploadFields = z.infer<typeof LayerUploadFieldsSchema>;

export const IdParamSchema = z.coerce.number().int().positive();

/** `?crs=working|wgs84&bbox=minx,miny,maxx,maxy` on the features route. */
export const FeatureQuerySchema = z.object({
  crs: z.enum(["working", "wgs84"]).default("working"),
  bbox: z
    .string()
    .transform((v) => v.split(",").map(Number))
    .refine((a) => a.length === 4 && a.every(Number.isFinite), "bbox is minx,miny,maxx,maxy as four numbers.")
    .refine((a) => a[0]! <= a[2]! && a[1]! <= a[3]!, "bbox needs minx ≤ maxx and miny ≤ maxy.")
    .transform((a) => a as [number, number, number, number])
    .optional(),
});

/** Tile coordinates in the XYZ scheme. */
export const TileParamsSchema = z.object({
  layerId: IdParamSchema,
  z: z.coerce.number().int().min(0).max(24),
  x: z.coerce.number().int().min(0),
  y: z.coerce.number().int().min(0),
});
