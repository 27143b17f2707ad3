import type { Route } from "./+types/work";
import { Card } from "~/components/ui/card";
import { Notice } from "~/components/ui/notice";
import { ACCESS } from "~/utils/access";
import { requireUser } from "~/utils/permissions.server";

export function meta() {
  return [{ title: "My parcels · Takeline" }];
}

export async function loader({ request }: Route.LoaderArgs) {
  const user = await requireUser(request, { roles: ACCESS.workList });
  return { name: user.name };
}

/** The land agent's home. Parcels appear here once a manager approves an alternative and assigns them. */
export default function WorkList({ loaderData }: Route.ComponentProps) {
  return (
    <div className="space-y-6">
      <h1>My parcels</h1>
      <Card>
        <p data-testid="work-list-empty">
          {loaderData.name ? `${loaderData.name}, no` : "No"} parcels are assigned to you yet. When a manager approves an alternative and assigns
          its parcels to you, you get an e-mail and they are listed here.
        </p>
      </Card>
      <Notice>Take areas and costs shown to land agents are planning estimates, not surveys or appraisals.</Notice>
    </div>
  );
}
