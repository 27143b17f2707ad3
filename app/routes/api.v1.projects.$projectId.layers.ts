import type { Route } from "./+types/api.v1.projects.$projectId.layers";
import { commitLayerUpload } from "~/models/layer-upload.server";
import { uploadJobIdOf } from "~/models/layer-upload-progress.server";
import { listProjectLayers, toLayerJson } from "~/models/layers.server";
import { findProjectForUser } from "~/models/projects.server";
import { IdParamSchema, LayerUploadFieldsSchema } from "~/schemas/layer-schemas";
import { ACCESS } from "~/utils/access";
import { apiError } from "~/utils/api-error.server";
import { apiHandler, requireMethod } from "~/utils/api-route.server";
import { withLayerUpload } from "~/utils/layer-upload-request.server";
import { requireUser } from "~/utils/permissions.server";
import type { PublicUser } from "~/models/users.server";

/** The project if the caller is a member (or admin); else the 404 envelope. */
function memberProject(projectId: string | undefined, user: PublicUser) {
  const id = IdParamSchema.safeParse(projectId);
  const project = id.success ? findProjectForUser(id.data, user) : undefined;
  if (!project) throw apiError("not_found", "No such project, or you are not a member of it.");
  return project;
}

/** `GET /api/v1/projects/:projectId/layers` → `{layers: [...]}` with feature counts, active first. */
export const loader = apiHandler(async ({ request, params }: Route.LoaderArgs) => {
  const user = await requireUser(request, { roles: ACCESS.projects });
  const project = memberProject(params.projectId, user);
  return Response.json({ layers: listProjectLayers(project.id).map(toLayerJson) });
});

/**
 * `POST /api/v1/projects/:projectId/layers` (planner; multipart `file`, `name`, `kind`,
 * `sourceCrs?`, `fields?`, `replacesLayerId?`) → `201 {id, kind, featureCount, rejected, warnings, sourceCrs, bbox, ...}`.
 * Membership is checked before the body is read, so a non-member cannot make the server read a file.
 * An `Upload-Job-Id` header lets the client poll `.../layers/progress/:jobId` while the file is processed.
 */
export const action = apiHandler(async ({ request, params }: Route.ActionArgs) => {
  requireMethod(request, "POST");
  const user = await requireUser(request, { roles: ACCESS.createProject });
  const project = memberProject(params.projectId, user);
  return withLayerUpload(request, LayerUploadFieldsSchema, async (upload, fields) =>
    Response.json(await commitLayerUpload(project, user, upload, fields, uploadJobIdOf(request)), { status: 201 }));
});
