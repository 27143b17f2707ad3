import { findAlternativeForUser, type Alternative } from "~/models/alternatives.server";
import { findProjectForUser, type Project } from "~/models/projects.server";
import { IdParamSchema } from "~/schemas/layer-schemas";
import type { Role } from "./roles";
import { apiError } from "./api-error.server";

type Caller = { id: number; role: Role };

/** The project named by a route param, or the API's 404 (also for projects the caller is not a member of). */
export function requireProjectParam(param: string | undefined, user: Caller): Project {
  const id = IdParamSchema.safeParse(param);
  const project = id.success ? findProjectForUser(id.data, user) : undefined;
  if (!project) throw apiError("not_found", "No such project, or you are not a member of it.");
  return project;
}

/** The alternative named by a route param with its project, or the API's 404. */
export function requireAlternativeParam(param: string | undefined, user: Caller): { alternative: Alternative; project: Project } {
  const id = IdParamSchema.safeParse(param);
  const alternative = id.success ? findAlternativeForUser(id.data, user) : undefined;
  const project = alternative ? findProjectForUser(alternative.projectId, { id: user.id, role: "admin" }) : undefined;
  if (!alternative || !project) throw apiError("not_found", "No such alternative, or you are not a member of its project.");
  return { alternative, project };
}
