import { data, useLoaderData } from "react-router";
import { z } from "zod";
import type { Route } from "./+types/projects.$projectId.comparison";
import type { AlternativeDraft } from "~/components/alternatives/api-types";
import { ComparisonView } from "~/components/comparison/comparison-view";
import { DownloadLinks } from "~/components/exports/download-links";
import type { ComparisonJson } from "~/components/comparison/comparison-types";
import { findCrsByCode, parseEpsgCode } from "~/fabric/index.server";
import { listAlternatives } from "~/models/alternatives.server";
import { readComparison } from "~/models/comparison.server";
import { listProjectLayers } from "~/models/layers.server";
import { findProjectForUser } from "~/models/projects.server";
import { ACCESS } from "~/utils/access";
import { env } from "~/utils/env.server";
import { requireUser } from "~/utils/permissions.server";

const ParamsSchema = z.object({ projectId: z.coerce.number().int().positive() });

export function meta({ data: d }: Route.MetaArgs) {
  return [{ title: `Compare alternatives · ${d?.project.name ?? "Project"} · Takeline` }];
}

/** Every alternative's summary and the parcel × alternative matrix, with each one's saved inputs for the map. */
export async function loader({ request, params }: Route.LoaderArgs) {
  const user = await requireUser(request, { roles: ACCESS.projects });
  const parsed = ParamsSchema.safeParse(params);
  const project = parsed.success ? findProjectForUser(parsed.data.projectId, user) : undefined;
  if (!project) throw data(null, { status: 404 });
  const code = project.crs ? parseEpsgCode(project.crs) : null;
  const drafts = listAlternatives(project.id).map((a) => ({
    id: a.id,
    draft: { alignment: a.alignment, corridor: a.corridor, designSpeed: a.designSpeed, speedUnit: a.speedUnit, emaxPercent: a.emaxPercent, acceptedChecks: a.acceptedChecks },
  }));
  return {
    project: { id: project.id, name: project.name },
    comparison: readComparison(project),
    drafts,
    layers: listProjectLayers(project.id).filter((l) => l.status === "active").map((l) => ({ id: l.id, kind: l.kind, name: l.name, bbox: l.bbox })),
    basemapStyleUrl: env().BASEMAP_STYLE_URL,
    crsDefinition: code === null ? null : (findCrsByCode(code)?.proj4 ?? null),
  };
}

export default function ComparisonPage() {
  const d = useLoaderData<typeof loader>();
  return (
    <>
      <ComparisonView
        project={d.project}
        comparison={d.comparison as unknown as ComparisonJson}
        drafts={d.drafts as unknown as { id: number; draft: AlternativeDraft }[]}
        layers={d.layers}
        basemapStyleUrl={d.basemapStyleUrl}
        crsDefinition={d.crsDefinition}
      />
      <DownloadLinks kind="comparison" projectId={d.project.id} />
    </>
  );
}
