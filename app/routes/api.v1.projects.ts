import type { Route } from "./+types/api.v1.projects";
import { createProjectAudited, listProjectsForUser, toProjectJson } from "~/models/projects.server";
import { ProjectCreateSchema } from "~/schemas/project-api-schemas";
import { ACCESS } from "~/utils/access";
import { apiHandler, readJsonBody, requireMethod } from "~/utils/api-route.server";
import { requireUser } from "~/utils/permissions.server";

/** `GET /api/v1/projects` → `{projects: [...]}`: the caller's projects (members; admins see all). */
export const loader = apiHandler(async ({ request }: Route.LoaderArgs) => {
  const user = await requireUser(request, { roles: ACCESS.projects });
  return Response.json({ projects: listProjectsForUser(user).map(toProjectJson) });
});

/** `POST /api/v1/projects {name, units, description?, crs?, scaleFactor?}` (planner) → `201` the project. */
export const action = apiHandler(async ({ request }: Route.ActionArgs) => {
  requireMethod(request, "POST");
  const user = await requireUser(request, { roles: ACCESS.createProject });
  const body = await readJsonBody(request, ProjectCreateSchema);
  return Response.json(toProjectJson(createProjectAudited(body, user)), { status: 201 });
});
