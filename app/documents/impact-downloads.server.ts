import { Readable } from "node:stream";
import { z } from "zod";
import { parseEpsgCode } from "~/fabric/index.server";
import { streamImpactCsv, streamImpactGeoJson, streamImpactXlsx, writeImpactShapefileZip, type ImpactExportSheet } from "~/exports/index.server";
import { listAlternatives } from "~/models/alternatives.server";
import type { Alternative } from "~/models/alternatives.server";
import type { Project } from "~/models/projects.server";
import { apiError, zodDetails } from "~/utils/api-error.server";
import { attachmentHeaders, fileSlug } from "./file-names";
import { readAlternativeSources, readTakeGeometries } from "./take-sources.server";

/** `?format=` of the impacts and comparison endpoints (JSON when absent) and `?crs=` of the GeoJSON. */
export const ImpactQuerySchema = z.object({
  format: z.enum(["json", "csv", "xlsx", "geojson", "shapefile"]).default("json"),
  crs: z.enum(["wgs84", "working"]).default("wgs84"),
});
export type ImpactQuery = z.infer<typeof ImpactQuerySchema>;

/** Reads `?format` and `?crs`; a value outside the lists is a 400 naming the allowed ones. */
export function readImpactQuery(request: Request): ImpactQuery {
  const params = Object.fromEntries(new URL(request.url).searchParams);
  const parsed = ImpactQuerySchema.safeParse({ format: params.format || undefined, crs: params.crs || undefined });
  if (!parsed.success) throw apiError("bad_request", "Unknown export option: format is json, csv, xlsx, geojson or shapefile; crs is wgs84 or working.", zodDetails(parsed.error));
  return parsed.data;
}

const TYPES = {
  csv: "text/csv; charset=utf-8",
  xlsx: "application/vnd.openxmlformats-officedocument.spreadsheetml.sheet",
  // RFC 7946 §12 registers application/geo+json.
  geojson: "application/geo+json",
  shapefile: "application/zip",
} as const;
const EXTENSIONS = { csv: "csv", xlsx: "xlsx", geojson: "geojson", shapefile: "zip" } as const;

/** One alternative's impact table as a download in `format`. */
export function downloadAlternativeImpacts(alternative: Alternative, project: Project, query: ImpactQuery & { format: keyof typeof TYPES }): Promise<Response> {
  const name = `${fileSlug(project.name)}-${fileSlug(alternative.name)}-impacts`;
  return respond([alternative], project, query, name);
}

/** Every alternative of the project, one sheet (or block of rows) each. */
export function downloadComparison(project: Project, query: ImpactQuery & { format: keyof typeof TYPES }): Promise<Response> {
  const alternatives = listAlternatives(project.id);
  if (alternatives.length === 0 && query.format !== "csv") throw apiError("unprocessable", "The project has no alternatives to export yet.");
  return respond(alternatives, project, query, `${fileSlug(project.name)}-comparison`);
}

async function respond(alternatives: Alternative[], project: Project, query: ImpactQuery & { format: keyof typeof TYPES }, baseName: string): Promise<Response> {
  const geo = query.format === "geojson" || query.format === "shapefile";
  const epsg = project.crs ? parseEpsgCode(project.crs) : null;
  if (geo && epsg === null) throw apiError("unprocessable", "The project has no working coordinate system yet (load a parcel layer first), so its takes cannot be exported as maps.");
  const sheets = alternatives.map((a) => sheetOf(a, project, geo));
  const headers = attachmentHeaders(TYPES[query.format], `${baseName}.${EXTENSIONS[query.format]}`);
  switch (query.format) {
    case "csv":
      return new Response(encodeStream(streamImpactCsv(sheets)), { headers });
    case "geojson":
      return new Response(encodeStream(streamImpactGeoJson(sheets, { workingEpsg: epsg!, output: query.crs })), { headers });
    case "xlsx":
      return new Response(Readable.toWeb(streamImpactXlsx(sheets, { projectName: project.name })) as ReadableStream<Uint8Array>, { headers });
    case "shapefile": {
      const { zip, warnings } = writeImpactShapefileZip(sheets, { workingEpsg: epsg!, layerName: fileSlug(baseName).slice(0, 60) });
      headers.set("Takeline-Export-Warnings", String(warnings.length));
      return new Response(zip as Uint8Array<ArrayBuffer>, { headers });
    }
  }
}

function sheetOf(alternative: Alternative, project: Project, withGeometry: boolean): ImpactExportSheet {
  const sources = readAlternativeSources(alternative, project);
  const geometry = withGeometry ? readTakeGeometries(sources) : new Map();
  const { summary } = sources.impacts;
  return {
    alternativeName: alternative.name,
    units: sources.units,
    rows: sources.impacts.parcels.map((p) => ({ ...p, geometry: geometry.get(p.parcelId) ?? null })),
    corridorArea: summary.corridorArea,
    unparcelledArea: summary.unparcelledArea,
  };
}

/** `ReadableStream.from` (Node ≥ 20.6, WHATWG Streams); the DOM typings do not declare it yet. */
const streamFrom = (ReadableStream as unknown as { from<T>(source: AsyncIterable<T>): ReadableStream<T> }).from.bind(ReadableStream);

/** A stream of the generator's text as UTF-8 bytes: the body is written as the rows are formatted. */
function encodeStream(chunks: AsyncGenerator<string>): ReadableStream<Uint8Array> {
  const encoder = new TextEncoder();
  async function* bytes() {
    for await (const text of chunks) yield encoder.encode(text);
  }
  return streamFrom(bytes());
}
