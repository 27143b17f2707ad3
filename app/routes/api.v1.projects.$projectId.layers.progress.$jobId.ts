import type { Route } from "./+types/api.v1.projects.$projectId.layers.progress.$jobId";
import { readUploadJob, UploadJobIdSchema } from "~/models/layer-upload-progress.server";
import { findProjectForUser } from "~/models/projects.server";
import { IdParamSchema } from "~/schemas/layer-schemas";
import { ACCESS } from "~/utils/access";
import { apiError } from "~/utils/api-error.server";
import { apiHandler } from "~/utils/api-route.server";
import { requireUser } from "~/utils/permissions.server";

/**
 * `GET /api/v1/projects/:projectId/layers/progress/:jobId` → `{jobId, stage, label, done, total,
 * fraction, finished}` for an upload or preview the caller sent with that `Upload-Job-Id`
 * header; 404 for any other job (someone else's, expired, or never started).
 */
export const loader = apiHandler(async ({ request, params }: Route.LoaderArgs) => {
  const user = await requireUser(request, { roles: ACCESS.createProject });
  const id = IdParamSchema.safeParse(params.projectId);
  const jobId = UploadJobIdSchema.safeParse(params.jobId);
  const project = id.success ? findProjectForUser(id.data, user) : undefined;
  const job = project && jobId.success ? readUploadJob(jobId.data, user, project.id) : undefined;
  if (!job) throw apiError("not_found", "No such upload job for you in this project.");
  return Response.json(job, { headers: { "Cache-Control": "no-store" } });
});

export const action = apiHandler(async () => apiError("method_not_allowed", "Use GET on this path.", undefined, { Allow: "GET" }));
