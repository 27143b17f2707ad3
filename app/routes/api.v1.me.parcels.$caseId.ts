import type { Route } from "./+types/api.v1.me.parcels.$caseId";
import { updateAgentCase } from "~/models/parcel-case-updates.server";
import { findAgentCase, listCaseEvents, toWorkItemJson } from "~/models/work-list.server";
import { CasePatchSchema } from "~/schemas/decision-schemas";
import { IdParamSchema } from "~/schemas/layer-schemas";
import { ACCESS } from "~/utils/access";
import { apiError } from "~/utils/api-error.server";
import { apiHandler, readJsonBody, requireMethod } from "~/utils/api-route.server";
import { requireUser } from "~/utils/permissions.server";

function caseIdOf(param: string | undefined): number {
  const id = IdParamSchema.safeParse(param);
  if (!id.success) throw apiError("not_found", "No such parcel in your work list.");
  return id.data;
}

function withHistory(caseId: number, item: Parameters<typeof toWorkItemJson>[0]) {
  return { ...toWorkItemJson(item), history: listCaseEvents(caseId).map((e) => ({ at: e.at.toISOString(), kind: e.kind, from: e.fromValue, to: e.toValue, note: e.note, by: e.actorName })) };
}

/** `GET /api/v1/me/parcels/:caseId` (land agent) → the parcel with its history; 404 unless it is assigned to you. */
export const loader = apiHandler(async ({ request, params }: Route.LoaderArgs) => {
  const user = await requireUser(request, { roles: ACCESS.workList });
  const caseId = caseIdOf(params.caseId);
  const item = findAgentCase(caseId, user.id);
  if (!item) throw apiError("not_found", "No such parcel in your work list.");
  return Response.json(withHistory(caseId, item));
});

/** `PATCH /api/v1/me/parcels/:caseId {status?, note?}` (land agent) → 200 the parcel; 409 for a move the status rules refuse or a released parcel. */
export const action = apiHandler(async ({ request, params }: Route.ActionArgs) => {
  requireMethod(request, "PATCH");
  const user = await requireUser(request, { roles: ACCESS.workList });
  const caseId = caseIdOf(params.caseId);
  const body = await readJsonBody(request, CasePatchSchema);
  return Response.json(withHistory(caseId, updateAgentCase(caseId, user.id, body)));
});
