import type { Route } from "./+types/api.v1.projects.$projectId.comparison";
import { downloadComparison, readImpactQuery } from "~/documents/impact-downloads.server";
import { readComparison } from "~/models/comparison.server";
import { ACCESS } from "~/utils/access";
import { apiError } from "~/utils/api-error.server";
import { apiHandler } from "~/utils/api-route.server";
import { requireUser } from "~/utils/permissions.server";
import { requireProjectParam } from "~/utils/project-lookup.server";

/**
 * `GET /api/v1/projects/:projectId/comparison` → `{units, alternatives: [{…, summary}], matrix: [{parcelId, …, takes}]}`;
 * `?format=csv|xlsx|geojson|shapefile` streams every alternative's impact table as that file instead.
 */
export const loader = apiHandler(async ({ request, params }: Route.LoaderArgs) => {
  const user = await requireUser(request, { roles: ACCESS.projects });
  const query = readImpactQuery(request);
  const project = requireProjectParam(params.projectId, user);
  if (query.format !== "json") return downloadComparison(project, { ...query, format: query.format });
  return Response.json({ projectId: project.id, ...readComparison(project) });
});

export const action = apiHandler(async () => apiError("method_not_allowed", "Use GET on this path.", undefined, { Allow: "GET" }));
