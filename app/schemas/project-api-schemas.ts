import { findCrsByCode, parseEpsgCode, resolveCrs } from "~/fabric/index.server";
import { ProjectFormSchema } from "./project-schemas";

/** Whether an "EPSG:nnnn" code is a projected CRS in the shipped list with a unit areas can be converted from. */
export function usableWorkingCrs(code: string): boolean {
  const epsg = parseEpsgCode(code);
  const entry = epsg === null ? undefined : findCrsByCode(epsg);
  if (!entry || entry.kind !== "projected") return false;
  return resolveCrs({ epsg: entry.code }).unit !== null;
}

/** `POST /api/v1/projects`: the form's fields, with the working CRS checked against the shipped EPSG list. */
export const ProjectCreateSchema = ProjectFormSchema.refine((p) => p.crs === undefined || usableWorkingCrs(p.crs), {
  path: ["crs"],
  message: "The working CRS must be a projected coordinate system in metres or feet from Takeline's EPSG list, e.g. EPSG:32617.",
});
