import type { Route } from "./+types/api.v1.alternatives.$id.landxml";
import { attachmentHeaders, fileSlug } from "~/documents/file-names";
import { writeLandXmlAlignment } from "~/exchange";
import { parseEpsgCode } from "~/fabric/index.server";
import { computeAlignmentGeometry } from "~/geometry/compute-alignment-geometry";
import { ACCESS } from "~/utils/access";
import { apiError } from "~/utils/api-error.server";
import { apiHandler } from "~/utils/api-route.server";
import { requireUser } from "~/utils/permissions.server";
import { requireAlternativeParam } from "~/utils/project-lookup.server";

/** `GET /api/v1/alternatives/:id/landxml` → the alignment as a LandXML 1.2 file (CoordGeom Lines and Curves, stations, the working CRS). */
export const loader = apiHandler(async ({ request, params }: Route.LoaderArgs) => {
  const user = await requireUser(request, { roles: ACCESS.projects });
  const { alternative, project } = requireAlternativeParam(params.id, user);
  const epsg = project.crs ? parseEpsgCode(project.crs) : null;
  const xml = writeLandXmlAlignment({
    name: alternative.name,
    alignment: alternative.alignment,
    geometry: computeAlignmentGeometry(alternative.alignment),
    projectName: project.name,
    ...(project.crs ? { crsName: project.crs } : {}),
    ...(epsg !== null ? { epsgCode: epsg } : {}),
  });
  return new Response(xml, { headers: attachmentHeaders("application/xml; charset=utf-8", `${fileSlug(project.name)}-${fileSlug(alternative.name)}.xml`) });
});

export const action = apiHandler(async () => apiError("method_not_allowed", "Use GET on this path.", undefined, { Allow: "GET" }));
