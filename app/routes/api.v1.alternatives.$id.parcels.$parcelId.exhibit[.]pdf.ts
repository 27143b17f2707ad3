import type { Route } from "./+types/api.v1.alternatives.$id.parcels.$parcelId.exhibit[.]pdf";
import { attachmentHeaders, fileSlug } from "~/documents/file-names";
import { writeTakeExhibit } from "~/documents/take-exhibit.server";
import { apiError } from "~/utils/api-error.server";
import { apiHandler } from "~/utils/api-route.server";
import { requireDescribedParcelTake } from "~/utils/parcel-take-lookup.server";

/** `GET /api/v1/alternatives/:id/parcels/:parcelId/exhibit.pdf` → the take exhibit of the parcel (PDF); 404 when nothing is taken. */
export const loader = apiHandler(async ({ request, params }: Route.LoaderArgs) => {
  const { alternative, sources, parcelId, take, parcel, description } = await requireDescribedParcelTake(request, params);
  const pdf = await writeTakeExhibit(sources, take, parcel, description);
  const name = `${fileSlug(alternative.name)}-${fileSlug(parcelId)}-exhibit.pdf`;
  return new Response(new Uint8Array(pdf), { headers: attachmentHeaders("application/pdf", name, "inline") });
});

export const action = apiHandler(async () => apiError("method_not_allowed", "Use GET on this path.", undefined, { Allow: "GET" }));
