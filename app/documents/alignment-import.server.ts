import { z } from "zod";
import { ExchangeInputError, readLandXmlAlignments, readPiCsv } from "~/exchange";
import type { AlignmentInput } from "~/geometry/alignment-types";
import { GeometryInputError } from "~/geometry/errors";
import type { CorridorInput } from "~/geometry/take-types";
import type { LengthUnit } from "~/geometry/units";
import { createAlternativeChecked } from "~/models/alternative-service.server";
import { listAlternatives, type Alternative } from "~/models/alternatives.server";
import type { Project } from "~/models/projects.server";
import type { AlternativeSummary } from "~/calculations/alternative-summary";
import { CorridorSchema } from "~/schemas/take-schemas";
import { apiError, zodDetails } from "~/utils/api-error.server";

/** The text fields that may come with an imported file. */
export const ImportFieldsSchema = z.object({
  name: z.string().trim().max(120).optional(),
  description: z.string().trim().max(4000).default(""),
  /** JSON `{left, right, easement?, ranges?}`; default: the corridor of the project's first alternative. */
  corridor: z.string().max(64 * 1024).optional(),
});

/** One alignment read from a file, or why it could not be. */
export interface ReadAlignment {
  name: string;
  alignment: AlignmentInput | null;
  warnings: string[];
  error?: { code: string; message: string };
}

/**
 * Reads an uploaded alignment file: LandXML 1.2 (any file whose first non-blank character is "<")
 * with every `Alignment` in it, or a PI list CSV (one alignment). A file that cannot be read at
 * all is a 422 with the reader's code and row errors; single unreadable alignments come back with
 * `error` set.
 */
export function readAlignmentFile(text: string, fileName: string, project: Project): { format: "landxml" | "pi-csv"; alignments: ReadAlignment[] } {
  const body = text.replace(/^\uFEFF/, "");
  try {
    if (body.trimStart().startsWith("<")) {
      const crsCode = project.crs ? Number(/(\d+)$/.exec(project.crs)?.[1]) : null;
      const alignments = readLandXmlAlignments(body).map((a) => {
        const warnings = [...a.warnings];
        if (a.crs?.epsgCode && crsCode && a.crs.epsgCode !== crsCode) warnings.push(`The file's coordinate system is EPSG:${a.crs.epsgCode}, the project's ${project.crs}; coordinates were read as they are.`);
        return { name: a.name, alignment: a.alignment, warnings, ...(a.error ? { error: a.error } : {}) };
      });
      return { format: "landxml", alignments };
    }
    const alignment = readPiCsv(body, { units: project.units as LengthUnit });
    return { format: "pi-csv", alignments: [{ name: fileName.replace(/\.[^.]*$/, ""), alignment, warnings: [] }] };
  } catch (e) {
    if (e instanceof ExchangeInputError) throw apiError("unprocessable", e.message, { code: e.code, ...e.details });
    throw e;
  }
}

/** The corridor of imported alternatives: the one given, else the project's first alternative's. */
export function resolveImportCorridor(text: string | undefined, project: Project): CorridorInput {
  if (text === undefined || text.trim() === "") {
    const first = listAlternatives(project.id)[0];
    if (first) return first.corridor;
    throw apiError("unprocessable", "Give the right-of-way widths as a `corridor` field, e.g. {\"left\": 20, \"right\": 20}: the project has no alternative to take them from.", [{ path: "corridor", message: "required" }]);
  }
  let raw: unknown;
  try {
    raw = JSON.parse(text);
  } catch {
    throw apiError("unprocessable", "The `corridor` field is not valid JSON.", [{ path: "corridor", message: "not JSON" }]);
  }
  const parsed = CorridorSchema.safeParse(raw);
  if (!parsed.success) throw apiError("unprocessable", "The `corridor` field has invalid values.", zodDetails(parsed.error).map((d) => ({ ...d, path: `corridor.${d.path}` })));
  return parsed.data;
}

/**
 * Creates one alternative per readable alignment (through createAlternativeChecked, so each is
 * checked and its impacts computed). Names are kept unique within the project by adding " (2)",
 * " (3)", … Alignments that cannot be read are reported, not created.
 */
export function createImportedAlternatives(project: Project, read: ReadAlignment[], fields: z.infer<typeof ImportFieldsSchema>, corridor: CorridorInput, actorId: number) {
  const taken = new Set(listAlternatives(project.id).map((a) => a.name.toLowerCase()));
  const created: { alternative: Alternative; summary: AlternativeSummary; warnings: string[] }[] = [];
  const skipped: { name: string; code: string; message: string }[] = [];
  for (const r of read) {
    if (!r.alignment) skipped.push({ name: r.name, ...r.error! });
    else if (r.alignment.units !== project.units) skipped.push({ name: r.name, code: "unsupported_unit", message: `The alignment is in ${r.alignment.units}; the project works in ${project.units}.` });
  }
  const usable = read.filter((r) => r.alignment && r.alignment.units === project.units);
  usable.forEach((r, i) => {
    const base = (usable.length === 1 && fields.name ? fields.name : r.name || fields.name || `Imported alignment ${i + 1}`).slice(0, 110);
    const name = uniqueName(base, taken);
    try {
      const made = createAlternativeChecked(project, { name, description: fields.description, alignment: r.alignment!, corridor, rules: {}, emaxPercent: 8, acceptedChecks: [] }, actorId);
      taken.add(name.toLowerCase());
      created.push({ ...made, warnings: r.warnings });
    } catch (e) {
      // A corridor the alignment cannot carry (a width reaching a curve's centre) skips this one only.
      if (!(e instanceof GeometryInputError)) throw e;
      skipped.push({ name: r.name, code: e.code, message: e.message });
    }
  });
  return { created, skipped };
}

function uniqueName(base: string, taken: Set<string>): string {
  if (!taken.has(base.toLowerCase())) return base;
  for (let k = 2; ; k++) if (!taken.has(`${base} (${k})`.toLowerCase())) return `${base} (${k})`;
}
