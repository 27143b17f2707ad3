import { data, useLoaderData } from "react-router";
import { z } from "zod";
import type { Route } from "./+types/projects.$projectId.alternatives.$alternativeId";
import { AlternativeEditor } from "~/components/alternatives/alternative-editor";
import type { AlternativeJson } from "~/components/alternatives/api-types";
import { DownloadLinks } from "~/components/exports/download-links";
import { Card } from "~/components/ui/card";
import { findCrsByCode, parseEpsgCode } from "~/fabric/index.server";
import { readImpacts } from "~/models/alternative-impacts.server";
import { findAlternativeForUser, toAlternativeJson } from "~/models/alternatives.server";
import { listProjectLayers } from "~/models/layers.server";
import { findProjectForUser } from "~/models/projects.server";
import { ACCESS, mayOpen } from "~/utils/access";
import { env } from "~/utils/env.server";
import { requireUser } from "~/utils/permissions.server";

const ParamsSchema = z.object({ projectId: z.coerce.number().int().positive(), alternativeId: z.coerce.number().int().positive() });

export function meta({ data: d }: Route.MetaArgs) {
  return [{ title: `${d?.alternative.name ?? "Alternative"} · Takeline` }];
}

/** The alternative with its stored impacts, the project's map layers and take rules, and the working CRS for reprojection in the browser. */
export async function loader({ request, params }: Route.LoaderArgs) {
  const user = await requireUser(request, { roles: ACCESS.projects });
  const parsed = ParamsSchema.safeParse(params);
  const project = parsed.success ? findProjectForUser(parsed.data.projectId, user) : undefined;
  const alternative = project && parsed.success ? findAlternativeForUser(parsed.data.alternativeId, user) : undefined;
  if (!project || !alternative || alternative.projectId !== project.id) throw data(null, { status: 404 });
  const code = project.crs ? parseEpsgCode(project.crs) : null;
  const layers = listProjectLayers(project.id)
    .filter((l) => l.status === "active")
    .map((l) => ({ id: l.id, kind: l.kind, name: l.name, bbox: l.bbox }));
  return {
    project: { id: project.id, name: project.name, units: project.units, takeRules: project.takeRules ?? null },
    alternative: toAlternativeJson(alternative, { summary: readImpacts(alternative, project).summary }),
    layers,
    basemapStyleUrl: env().BASEMAP_STYLE_URL,
    crsDefinition: code === null ? null : (findCrsByCode(code)?.proj4 ?? null),
    // A submission awaiting a decision cannot change (the API answers 409); an approved version
    // stays frozen on record and an edit saves as the next draft version.
    editable: mayOpen(user.role, "editAlternatives") && alternative.status !== "submitted",
  };
}

export default function AlternativePage() {
  const { project, alternative, layers, basemapStyleUrl, crsDefinition, editable } = useLoaderData<typeof loader>();
  if (!crsDefinition) {
    return (
      <Card title={alternative.name}>
        <p className="text-sm">This project has no working coordinate system Takeline knows, so the alternative cannot be drawn. Upload a parcel layer first.</p>
      </Card>
    );
  }
  return (
    <>
      <AlternativeEditor
        key={alternative.id}
        alternative={alternative as unknown as AlternativeJson}
        projectId={project.id}
        projectName={project.name}
        layers={layers}
        basemapStyleUrl={basemapStyleUrl}
        crsDefinition={crsDefinition}
        projectRules={project.takeRules}
        editable={editable}
      />
      <DownloadLinks kind="alternative" alternativeId={alternative.id} />
    </>
  );
}
