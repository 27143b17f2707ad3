import { useEffect } from "react";
import { z } from "zod";
import type { Route } from "./+types/work";
import { ACQUISITION_STATUSES } from "~/calculations/acquisition-status";
import { warmMapLibWhenIdle } from "~/components/map/map-warmup";
import { Card } from "~/components/ui/card";
import { Notice } from "~/components/ui/notice";
import { WorkFilters } from "~/components/parcel-work/work-filters";
import { arrangeWork, WORK_SORTS } from "~/components/parcel-work/work-sort";
import { WorkTable } from "~/components/parcel-work/work-table";
import { areaLabel, formatArea, formatEstimate } from "~/components/parcel-work/figures";
import { listAgentWork, toWorkItemJson } from "~/models/work-list.server";
import { ACCESS } from "~/utils/access";
import { requireUser } from "~/utils/permissions.server";

export function meta() {
  return [{ title: "My parcels · Takeline" }];
}

// Unknown values fall back to "all" rather than an error page: the filter lives in a shareable URL.
const QuerySchema = z.object({
  project: z.coerce.number().int().positive().optional().catch(undefined),
  status: z.enum(ACQUISITION_STATUSES).optional().catch(undefined),
  q: z.string().max(200).default("").catch(""),
  sort: z.enum(WORK_SORTS).default("station").catch("station"),
  released: z.literal("1").optional().catch(undefined),
});

/** The parcels assigned to the signed-in land agent, across projects, filtered and sorted as the URL says. */
export async function loader({ request }: Route.LoaderArgs) {
  const user = await requireUser(request, { roles: ACCESS.workList });
  const query = QuerySchema.parse(Object.fromEntries(new URL(request.url).searchParams));
  const all = listAgentWork(user.id, { includeReleased: true }).map(toWorkItemJson);
  const projects = [...new Map(all.map((w) => [w.projectId, { id: w.projectId, name: w.projectName }])).values()];
  const chosen = all.filter((w) => (query.released || w.state === "open") && (!query.project || w.projectId === query.project) && (!query.status || w.status === query.status));
  return {
    name: user.name,
    total: all.filter((w) => w.state === "open").length,
    rows: arrangeWork(chosen, query.sort, query.q),
    projects,
    values: { project: query.project ? String(query.project) : "", status: query.status ?? "", q: query.q, sort: query.sort, released: Boolean(query.released) },
  };
}

/** The land agent's home: only their parcels, each linking to its page with the map and history. */
export default function WorkList({ loaderData }: Route.ComponentProps) {
  // Each parcel opens on a map: have MapLibre ready by then.
  useEffect(() => warmMapLibWhenIdle(), []);
  const { name, total, rows, projects, values } = loaderData;
  const units = rows[0]?.units ?? "m";
  const sameUnits = rows.every((r) => r.units === units);
  return (
    <div className="space-y-6">
      <h1>My parcels</h1>
      {total === 0 ? (
        <Card>
          <p data-testid="work-list-empty">
            {name ? `${name}, no` : "No"} parcels are assigned to you yet. When a manager approves an alternative and assigns its parcels to you, you get an
            e-mail and they are listed here.
          </p>
        </Card>
      ) : (
        <Card
          title={`${rows.length} of ${total} parcels`}
          actions={
            sameUnits && rows.length > 0 ? (
              <span className="text-sm text-ink-soft" data-testid="work-totals">
                take {formatArea(rows.reduce((s, r) => s + r.takeArea, 0))} {areaLabel(units)} · est. cost {formatEstimate(rows.reduce((s, r) => s + r.estimatedCost, 0))}
              </span>
            ) : undefined
          }
        >
          <div className="mb-4">
            <WorkFilters values={values} projects={projects} />
          </div>
          <WorkTable rows={rows} empty="No parcel matches these filters." />
        </Card>
      )}
      <Notice>
        Take areas, remainders and costs are planning estimates from the approved alternative and the uploaded parcel fabric — not surveys, legal
        descriptions or appraisals.
      </Notice>
    </div>
  );
}
