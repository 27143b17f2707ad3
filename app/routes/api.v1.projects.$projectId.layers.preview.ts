import type { Route } from "./+types/api.v1.projects.$projectId.layers.preview";
import { previewLayerUpload } from "~/models/layer-upload.server";
import { uploadJobIdOf } from "~/models/layer-upload-progress.server";
import { findProjectForUser } from "~/models/projects.server";
import { IdParamSchema, LayerPreviewFieldsSchema } from "~/schemas/layer-schemas";
import { ACCESS } from "~/utils/access";
import { apiError } from "~/utils/api-error.server";
import { apiHandler, requireMethod } from "~/utils/api-route.server";
import { withLayerUpload } from "~/utils/layer-upload-request.server";
import { requireUser } from "~/utils/permissions.server";

/**
 * `POST /api/v1/projects/:projectId/layers/preview` (planner; same multipart as the upload)
 * → `{fieldNames, sampleRows, mapping, featureCount, rejected, warnings, sourceCrs, workingCrs, bbox, ...}`; stores nothing.
 * An `Upload-Job-Id` header lets the client poll `.../layers/progress/:jobId` meanwhile.
 */
export const action = apiHandler(async ({ request, params }: Route.ActionArgs) => {
  requireMethod(request, "POST");
  const user = await requireUser(request, { roles: ACCESS.createProject });
  const id = IdParamSchema.safeParse(params.projectId);
  const project = id.success ? findProjectForUser(id.data, user) : undefined;
  if (!project) throw apiError("not_found", "No such project, or you are not a member of it.");
  return withLayerUpload(request, LayerPreviewFieldsSchema, async (upload, fields) => Response.json(await previewLayerUpload(project, user, upload, fields, uploadJobIdOf(request))));
});

export const loader = apiHandler(async () => apiError("method_not_allowed", "Use POST on this path.", undefined, { Allow: "POST" }));
