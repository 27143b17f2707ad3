import type { Route } from "./+types/api.v1.projects.$projectId.alternatives.import";
import { createImportedAlternatives, ImportFieldsSchema, readAlignmentFile, resolveImportCorridor } from "~/documents/alignment-import.server";
import { toAlternativeJson } from "~/models/alternatives.server";
import { ACCESS } from "~/utils/access";
import { apiError, zodDetails } from "~/utils/api-error.server";
import { apiHandler, requireMethod } from "~/utils/api-route.server";
import { readMultipartUpload } from "~/utils/multipart-upload.server";
import { requireUser } from "~/utils/permissions.server";
import { requireProjectParam } from "~/utils/project-lookup.server";

/** Alignment files are small text: 10 MB holds a LandXML file of tens of thousands of elements. */
const MAX_IMPORT_BYTES = 10 * 2 ** 20;

/**
 * `POST /api/v1/projects/:projectId/alternatives/import` (multipart: `file`, optional `name`,
 * `description`, `corridor` JSON) → 201 `{format, alternatives: [...], skipped: [...]}`: a new
 * alternative per alignment of a LandXML 1.2 file, or one from a PI list CSV.
 */
export const action = apiHandler(async ({ request, params }: Route.ActionArgs) => {
  requireMethod(request, "POST");
  const user = await requireUser(request, { roles: ACCESS.editAlternatives });
  const project = requireProjectParam(params.projectId, user);
  const upload = await readMultipartUpload(request, MAX_IMPORT_BYTES);
  try {
    if (!upload.file) throw apiError("bad_request", "Send the alignment file (LandXML or a PI list CSV) as a `file` part.");
    const fields = ImportFieldsSchema.safeParse(upload.fields);
    if (!fields.success) throw apiError("unprocessable", "The form has invalid fields.", zodDetails(fields.error));
    const text = decodeUtf8(await upload.readFileBytes());
    const read = readAlignmentFile(text, upload.file.fileName, project);
    const corridor = resolveImportCorridor(fields.data.corridor, project);
    const { created, skipped } = createImportedAlternatives(project, read.alignments, fields.data, corridor, user.id);
    if (created.length === 0) throw apiError("unprocessable", `No alignment in the file could be imported${skipped[0] ? `: ${skipped[0].message}` : "."}`, { skipped });
    const alternatives = created.map((c) => toAlternativeJson(c.alternative, { summary: c.summary, warnings: c.warnings }));
    return Response.json({ format: read.format, alternatives, skipped }, { status: 201 });
  } finally {
    await upload.cleanup();
  }
});

export const loader = apiHandler(async () => apiError("method_not_allowed", "Use POST on this path.", undefined, { Allow: "POST" }));

function decodeUtf8(bytes: Uint8Array): string {
  try {
    return new TextDecoder("utf-8", { fatal: true }).decode(bytes);
  } catch {
    throw apiError("unprocessable", "The file is not UTF-8 text; save the LandXML or CSV file as UTF-8 and send it again.");
  }
}
