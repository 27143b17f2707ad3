import { data, Link } from "react-router";
import { z } from "zod";
import type { Route } from "./+types/work.$caseId";
import { ParcelCaseMap } from "~/components/map/parcel-case-map";
import { Card } from "~/components/ui/card";
import { Notice } from "~/components/ui/notice";
import { CaseHistory } from "~/components/parcel-work/case-history";
import { CaseUpdateForm } from "~/components/parcel-work/case-update-form";
import { areaLabel, formatArea, formatDay, formatEstimate } from "~/components/parcel-work/figures";
import { StatusBadge } from "~/components/parcel-work/status-badge";
import { formatStationRange } from "~/calculations/parcel-list-csv";
import { readCaseDrawing } from "~/models/case-drawing.server";
import { findAlternativeForUser } from "~/models/alternatives.server";
import { updateAgentCase } from "~/models/parcel-case-updates.server";
import { findProjectForUser } from "~/models/projects.server";
import { findAgentCase, listCaseEvents, toWorkItemJson } from "~/models/work-list.server";
import { CasePatchSchema } from "~/schemas/decision-schemas";
import { ACCESS } from "~/utils/access";
import { refusalAsFormData } from "~/utils/api-refusal.server";
import { env } from "~/utils/env.server";
import { readForm } from "~/utils/form.server";
import { requireUser } from "~/utils/permissions.server";

const ParamsSchema = z.object({ caseId: z.coerce.number().int().positive() });

export function meta({ data: d }: Route.MetaArgs) {
  return [{ title: `${d?.item.parcelId ?? "Parcel"} · My parcels · Takeline` }];
}

async function loadCase(request: Request, params: unknown) {
  const user = await requireUser(request, { roles: ACCESS.workList });
  const parsed = ParamsSchema.safeParse(params);
  const found = parsed.success ? findAgentCase(parsed.data.caseId, user.id) : undefined;
  // Another agent's parcel is not found, exactly like one that does not exist.
  if (!found) throw data(null, { status: 404 });
  return { user, found };
}

/** One of my parcels: its take as approved, a map of the take, its status and history. */
export async function loader({ request, params }: Route.LoaderArgs) {
  const { user, found } = await loadCase(request, params);
  const item = toWorkItemJson(found);
  // The agent is a member of the project their parcel belongs to; read the project as such.
  const project = findProjectForUser(item.projectId, { id: user.id, role: "admin" })!;
  const alternative = findAlternativeForUser(item.alternativeId, { id: user.id, role: "admin" });
  return {
    item,
    stationRange: formatStationRange(item, item.units),
    events: listCaseEvents(item.caseId).map((e) => ({ ...e, at: e.at.toISOString() })),
    drawing: readCaseDrawing(project, item.alternativeId, item.version, item.parcelId, item.classification) ?? null,
    colour: alternative?.colour ?? "#d9480f",
    basemapStyleUrl: env().BASEMAP_STYLE_URL,
  };
}

/** Status and note from the page's form, through the same model (and rules) as the API's PATCH. */
export async function action({ request, params }: Route.ActionArgs) {
  const { user, found } = await loadCase(request, params);
  const form = await readForm(request);
  const parsed = CasePatchSchema.safeParse({ ...(form.status ? { status: form.status } : {}), ...(form.note?.trim() ? { note: form.note } : {}) });
  if (!parsed.success) return data({ ok: false as const, error: parsed.error.issues[0]?.message ?? "Check the form.", details: null }, { status: 422 });
  try {
    updateAgentCase(found.c.id, user.id, parsed.data);
    return { ok: true as const, error: null, details: null };
  } catch (error) {
    return refusalAsFormData(error);
  }
}

export default function ParcelCasePage({ loaderData, actionData }: Route.ComponentProps) {
  const { item, stationRange, events, drawing, colour, basemapStyleUrl } = loaderData;
  const area = areaLabel(item.units);
  const figures: [string, string][] = [
    ["Take", `${formatArea(item.takeArea)} ${area}`],
    ["Easement", `${formatArea(item.easementArea)} ${area}`],
    ["Remainder", `${formatArea(item.remainderArea)} ${area}`],
    ["Parcel area", `${formatArea(item.parcelArea)} ${area}`],
    ["Type of take", item.classification],
    ["Buildings displaced", String(item.buildingsHit)],
    ["Estimated cost", formatEstimate(item.estimatedCost)],
    ["Stations", stationRange],
  ];
  return (
    <div className="space-y-6">
      <p className="text-sm"><Link to="/work">← My parcels</Link></p>
      <div className="flex flex-wrap items-center gap-3">
        <h1>Parcel {item.parcelId}</h1>
        <StatusBadge status={item.status} released={item.state === "released"} />
      </div>
      <p className="text-ink-soft">
        {item.owner ?? "Owner unknown"} · {item.address ?? "no address"} — {item.projectName}, {item.alternativeName} (version {item.version})
      </p>
      <Notice>The take, remainder and cost are planning estimates from the approved alternative — not a survey, a legal description or an appraisal.</Notice>
      <div className="grid gap-6 lg:grid-cols-3">
        <Card title="The take" className="lg:col-span-2">
          {drawing ? (
            <ParcelCaseMap drawing={drawing} parcelId={item.parcelId} colour={colour} basemapStyleUrl={basemapStyleUrl} metric={item.units === "m"} />
          ) : (
            <p className="text-sm text-ink-soft">No map: the project has no working coordinate system Takeline knows.</p>
          )}
          <dl className="mt-4 grid grid-cols-2 gap-3 text-sm md:grid-cols-4" data-testid="case-figures">
            {figures.map(([k, v]) => (
              <div key={k}><dt className="text-label text-ink-soft">{k}</dt><dd className="font-semibold tabular-nums">{v}</dd></div>
            ))}
          </dl>
        </Card>
        <Card title="Work this parcel">
          <p className="mb-3 text-xs text-ink-soft">Assigned {formatDay(item.assignedAt)} · status since {formatDay(item.statusChangedAt)}</p>
          {item.state === "released" ? (
            <p className="text-sm">The preferred alternative no longer takes this parcel; its case is closed.</p>
          ) : (
            <CaseUpdateForm key={`${item.status}-${events.length}`} status={item.status} error={actionData?.ok === false ? actionData.error : null} />
          )}
        </Card>
      </div>
      <Card title="History">
        <CaseHistory events={events} />
      </Card>
    </div>
  );
}
