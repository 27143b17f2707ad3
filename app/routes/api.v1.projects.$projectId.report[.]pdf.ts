import type { Route } from "./+types/api.v1.projects.$projectId.report[.]pdf";
import { attachmentHeaders, fileSlug } from "~/documents/file-names";
import { writeProjectReport } from "~/documents/project-report.server";
import { ACCESS } from "~/utils/access";
import { apiError } from "~/utils/api-error.server";
import { apiHandler } from "~/utils/api-route.server";
import { requireUser } from "~/utils/permissions.server";
import { requireProjectParam } from "~/utils/project-lookup.server";

/** `GET /api/v1/projects/:projectId/report.pdf` → the alternatives report (comparison tables, map figure, parcel table) as a PDF. */
export const loader = apiHandler(async ({ request, params }: Route.LoaderArgs) => {
  const user = await requireUser(request, { roles: ACCESS.projects });
  const project = requireProjectParam(params.projectId, user);
  const pdf = await writeProjectReport(project);
  return new Response(new Uint8Array(pdf), { headers: attachmentHeaders("application/pdf", `${fileSlug(project.name)}-alternatives-report.pdf`, "inline") });
});

export const action = apiHandler(async () => apiError("method_not_allowed", "Use GET on this path.", undefined, { Allow: "GET" }));
