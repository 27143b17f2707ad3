import { describedParcelTake, readAlternativeSources, type AlternativeSources } from "~/documents/take-sources.server";
import { ACCESS } from "./access";
import { apiError } from "./api-error.server";
import { requireUser } from "./permissions.server";
import { requireAlternativeParam } from "./project-lookup.server";

/**
 * For the per-parcel document routes: the signed-in member's alternative `:id`, its document
 * sources, and parcel `:parcelId`'s take with its legal description. 404 (API envelope) when the
 * alternative takes no right-of-way from the parcel.
 */
export async function requireDescribedParcelTake(request: Request, params: { id?: string; parcelId?: string }) {
  const user = await requireUser(request, { roles: ACCESS.projects });
  const { alternative, project } = requireAlternativeParam(params.id, user);
  const sources: AlternativeSources = readAlternativeSources(alternative, project);
  const parcelId = params.parcelId ?? "";
  const found = describedParcelTake(sources, parcelId);
  if (!found) throw apiError("not_found", `The ${alternative.name} alternative takes no right-of-way from parcel ${parcelId}.`);
  return { alternative, sources, parcelId, ...found };
}
