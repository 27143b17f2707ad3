import type { Route } from "./+types/api.v1.projects.$projectId.alternatives";
import { createAlternativeChecked } from "~/models/alternative-service.server";
import { listAlternatives, toAlternativeJson } from "~/models/alternatives.server";
import { readLatestSummary } from "~/models/alternative-impacts.server";
import { AlternativeCreateSchema } from "~/schemas/alternative-schemas";
import { ACCESS } from "~/utils/access";
import { apiHandler, readJsonBody, requireMethod } from "~/utils/api-route.server";
import { requireUser } from "~/utils/permissions.server";
import { requireProjectParam } from "~/utils/project-lookup.server";

/** `GET /api/v1/projects/:projectId/alternatives` → `{alternatives: [...]}` with their latest summaries. */
export const loader = apiHandler(async ({ request, params }: Route.LoaderArgs) => {
  const user = await requireUser(request, { roles: ACCESS.projects });
  const project = requireProjectParam(params.projectId, user);
  const list = listAlternatives(project.id).map((a) => toAlternativeJson(a, { summary: readLatestSummary(a.id) ?? null }));
  return Response.json({ alternatives: list });
});

/** `POST /api/v1/projects/:projectId/alternatives {name, alignment, corridor, rules?, …}` → 201 with its impacts summary. */
export const action = apiHandler(async ({ request, params }: Route.ActionArgs) => {
  requireMethod(request, "POST");
  const user = await requireUser(request, { roles: ACCESS.editAlternatives });
  const project = requireProjectParam(params.projectId, user);
  const body = await readJsonBody(request, AlternativeCreateSchema);
  const created = createAlternativeChecked(project, body, user.id);
  return Response.json(toAlternativeJson(created.alternative, { summary: created.summary }), { status: 201, headers: { Location: `/api/v1/alternatives/${created.alternative.id}` } });
});
