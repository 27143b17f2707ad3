import { Link } from "react-router";
import type { Route } from "./+types/decisions";
import { ProgressPanel } from "~/components/decisions/progress-panel";
import { Card } from "~/components/ui/card";
import { Notice } from "~/components/ui/notice";
import { formatDay } from "~/components/parcel-work/figures";
import { listDecisionOverview } from "~/models/decision-overview.server";
import { ACCESS } from "~/utils/access";
import { requireUser } from "~/utils/permissions.server";

export function meta() {
  return [{ title: "Decisions · Takeline" }];
}

/** Projects awaiting a decision first, then the others; each with its preferred alternative's progress. */
export async function loader({ request }: Route.LoaderArgs) {
  const user = await requireUser(request, { roles: ACCESS.decisions });
  const states = listDecisionOverview(user);
  return { projects: [...states].sort((a, b) => Number(b.awaiting.length > 0) - Number(a.awaiting.length > 0) || a.project.name.localeCompare(b.project.name)) };
}

export default function Decisions({ loaderData }: Route.ComponentProps) {
  const { projects } = loaderData;
  const waiting = projects.filter((p) => p.awaiting.length > 0).length;
  return (
    <div className="space-y-6">
      <h1>Decisions</h1>
      <p className="text-ink-soft" data-testid="awaiting-count">{waiting === 0 ? "No project awaits a decision." : `${waiting} ${waiting === 1 ? "project awaits" : "projects await"} a decision.`}</p>
      {projects.length === 0 && <Card><p className="text-sm">You are not a member of any project yet.</p></Card>}
      {projects.map(({ project, awaiting, preferred, progress }) => (
        <Card key={project.id} title={<Link to={`/projects/${project.id}/decision`}>{project.name}</Link>}>
          <div className="grid gap-6 md:grid-cols-2">
            <div>
              <h3 className="mb-2 text-label font-semibold text-ink-soft">Awaiting decision</h3>
              {awaiting.length === 0 ? (
                <p className="text-sm">Nothing.</p>
              ) : (
                <ul className="space-y-1 text-sm" data-testid={`awaiting-${project.id}`}>
                  {awaiting.map((a) => (
                    <li key={a.alternativeId}>
                      <Link to={`/projects/${project.id}/decision`}>{a.name}</Link>, version {a.version}
                      <span className="text-ink-soft"> — submitted {formatDay(a.submittedAt)}{a.submittedBy ? ` by ${a.submittedBy}` : ""}</span>
                    </li>
                  ))}
                </ul>
              )}
            </div>
            <div>
              <h3 className="mb-2 text-label font-semibold text-ink-soft">Preferred alternative</h3>
              {preferred && progress ? (
                <div className="space-y-2">
                  <p className="text-sm"><strong>{preferred.alternativeName}</strong>, version {preferred.version} (approved {formatDay(preferred.approvedAt)})</p>
                  <ProgressPanel progress={progress} compact />
                </div>
              ) : (
                <p className="text-sm">None approved yet.</p>
              )}
            </div>
          </div>
        </Card>
      ))}
      <Notice>Costs are order-of-magnitude estimates, not appraisals; “committed” sums the estimates of the parcels agreed or acquired.</Notice>
    </div>
  );
}
