import { useEffect } from "react";
import { Link, useLoaderData } from "react-router";
import type { Route } from "./+types/projects._index";
import { warmMapLibWhenIdle } from "~/components/map/map-warmup";
import { buttonClass } from "~/components/ui/button";
import { Card } from "~/components/ui/card";
import { Table } from "~/components/ui/table";
import { listProjectsForUser } from "~/models/projects.server";
import { ACCESS, mayOpen } from "~/utils/access";
import { requireUser } from "~/utils/permissions.server";
import { UNIT_LABELS } from "~/utils/unit-labels";

export function meta() {
  return [{ title: "Projects · Takeline" }];
}

export async function loader({ request }: Route.LoaderArgs) {
  const user = await requireUser(request, { roles: ACCESS.projects });
  return { projects: listProjectsForUser(user), mayCreate: mayOpen(user.role, "createProject") };
}

export default function Projects() {
  // A project opens on its map: have MapLibre ready by then.
  useEffect(() => warmMapLibWhenIdle(), []);
  const { projects, mayCreate } = useLoaderData<typeof loader>();
  return (
    <div className="space-y-6">
      <div className="flex items-center justify-between">
        <h1>Projects</h1>
        {mayCreate && <Link to="/projects/new" className={buttonClass("primary")}>New project</Link>}
      </div>
      <Card>
        <Table
          rows={projects}
          rowKey={(p) => p.id}
          empty="You are not a member of any project yet."
          columns={[
            { header: "Project", cell: (p) => <Link to={`/projects/${p.id}`}>{p.name}</Link> },
            { header: "Description", cell: (p) => <span className="text-ink-soft">{p.description}</span> },
            { header: "Units", cell: (p) => UNIT_LABELS[p.units] },
            { header: "Working CRS", cell: (p) => p.crs ?? "from first layer" },
          ]}
        />
      </Card>
    </div>
  );
}
