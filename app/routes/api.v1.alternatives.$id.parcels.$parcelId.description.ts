import type { Route } from "./+types/api.v1.alternatives.$id.parcels.$parcelId.description";
import { apiError } from "~/utils/api-error.server";
import { apiHandler } from "~/utils/api-route.server";
import { requireDescribedParcelTake } from "~/utils/parcel-take-lookup.server";

/**
 * `GET /api/v1/alternatives/:id/parcels/:parcelId/description` → the draft legal description of
 * the right-of-way take from the parcel: `{text, courses, area, closure, roundedClosure, parts, …}`
 * in the project's units. 404 when the alternative takes no right-of-way from the parcel.
 */
export const loader = apiHandler(async ({ request, params }: Route.LoaderArgs) => {
  const { alternative, sources, take, description } = await requireDescribedParcelTake(request, params);
  return Response.json({ alternativeId: alternative.id, version: sources.impacts.version, classification: take.classification, ...description });
});

export const action = apiHandler(async () => apiError("method_not_allowed", "Use GET on this path.", undefined, { Allow: "GET" }));
