import type { Route } from "./+types/api.v1.alternatives.$id.parcels.$parcelId.description";
import { describeParcelTake, findParcelTake, readAlternativeSources } from "~/documents/take-sources.server";
import { ACCESS } from "~/utils/access";
import { apiError } from "~/utils/api-error.server";
import { apiHandler } from "~/utils/api-route.server";
import { requireUser } from "~/utils/permissions.server";
import { requireAlternativeParam } from "~/utils/project-lookup.server";

/**
 * `GET /api/v1/alternatives/:id/parcels/:parcelId/description` → the draft legal description of
 * the right-of-way take from the parcel: `{text, courses, area, closure, roundedClosure, parts, …}`
 * in the project's units. 404 when the alternative takes no right-of-way from the parcel.
 */
export const loader = apiHandler(async ({ request, params }: Route.LoaderArgs) => {
  const user = await requireUser(request, { roles: ACCESS.projects });
  const { alternative, project } = requireAlternativeParam(params.id, user);
  const sources = readAlternativeSources(alternative, project);
  const found = findParcelTake(sources, params.parcelId);
  const description = found ? describeParcelTake(sources, found.take, found.parcel) : null;
  if (!found || !description) throw apiError("not_found", `The ${alternative.name} alternative takes no right-of-way from parcel ${params.parcelId}.`);
  return Response.json({ alternativeId: alternative.id, version: sources.impacts.version, classification: found.take.classification, ...description });
});

export const action = apiHandler(async () => apiError("method_not_allowed", "Use GET on this path.", undefined, { Allow: "GET" }));
