import type { Route } from "./+types/api.v1.alternatives.$id.parcels.$parcelId.exhibit[.]pdf";
import { attachmentHeaders, fileSlug } from "~/documents/file-names";
import { writeTakeExhibit } from "~/documents/take-exhibit.server";
import { describeParcelTake, findParcelTake, readAlternativeSources } from "~/documents/take-sources.server";
import { ACCESS } from "~/utils/access";
import { apiError } from "~/utils/api-error.server";
import { apiHandler } from "~/utils/api-route.server";
import { requireUser } from "~/utils/permissions.server";
import { requireAlternativeParam } from "~/utils/project-lookup.server";

/** `GET /api/v1/alternatives/:id/parcels/:parcelId/exhibit.pdf` → the take exhibit of the parcel (PDF); 404 when nothing is taken. */
export const loader = apiHandler(async ({ request, params }: Route.LoaderArgs) => {
  const user = await requireUser(request, { roles: ACCESS.projects });
  const { alternative, project } = requireAlternativeParam(params.id, user);
  const sources = readAlternativeSources(alternative, project);
  const found = findParcelTake(sources, params.parcelId);
  const description = found ? describeParcelTake(sources, found.take, found.parcel) : null;
  if (!found || !description) throw apiError("not_found", `The ${alternative.name} alternative takes no right-of-way from parcel ${params.parcelId}.`);
  const pdf = await writeTakeExhibit(sources, found.take, found.parcel, description);
  const name = `${fileSlug(alternative.name)}-${fileSlug(params.parcelId)}-exhibit.pdf`;
  return new Response(new Uint8Array(pdf), { headers: attachmentHeaders("application/pdf", name, "inline") });
});

export const action = apiHandler(async () => apiError("method_not_allowed", "Use GET on this path.", undefined, { Allow: "GET" }));
