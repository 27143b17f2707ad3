import { z } from "zod";
import { parseAngleDeg } from "~/geometry/angles";
import { GeometryInputError } from "~/geometry/errors";
import { parseStation } from "~/geometry/stations";

export const LengthUnitsSchema = z.enum(["m", "ft", "usft"]);

/** Runs an engine parser inside zod so a bad value becomes a field issue, not a thrown error. */
function viaEngine<T>(parse: (v: string | number) => T) {
  return (value: string | number, ctx: z.RefinementCtx): T => {
    try {
      return parse(value);
    } catch (error) {
      ctx.addIssue({ code: "custom", message: error instanceof GeometryInputError ? error.message : String(error) });
      return z.NEVER;
    }
  };
}

/** An angle as decimal degrees or a DMS string (`38°15'20"`, `38-15-20`, `38 15 20.5`). */
export const AngleSchema = z.union([z.number(), z.string().max(40)]).transform(viaEngine((v) => parseAngleDeg(v)));

/** A station as a number in the request's units or a station string (`3+415.250`, `12+34.56`). */
export const StationSchema = z
  .union([z.number(), z.string().max(40)])
  .transform(viaEngine((v) => (typeof v === "number" ? v : parseStation(v))));

/** A finite length; the engine checks the sign and range with messages that name the quantity. */
export const LengthSchema = z.number().finite();
