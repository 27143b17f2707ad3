import { Link } from "react-router";
import { Badge } from "~/components/ui/badge";
import { Table } from "~/components/ui/table";
import type { AlternativeSummary } from "./api-types";
import { areaUnitLabel, formatCost, formatNumber, lengthUnitLabel, type Units } from "./format";

export interface AlternativeListItem {
  id: number;
  name: string;
  colour: string;
  status: string;
  version: number;
  summary: AlternativeSummary | null;
}

/** The project's alternatives with their headline figures, each linking to its editor. */
export function AlternativeList({ projectId, units, alternatives }: { projectId: number; units: Units; alternatives: AlternativeListItem[] }) {
  return (
    <Table
      rows={alternatives}
      rowKey={(a) => a.id}
      empty="No alternatives yet."
      columns={[
        {
          header: "Alternative",
          cell: (a) => (
            <span className="flex items-center gap-2">
              <span aria-hidden className="inline-block h-3 w-3 rounded-sm" style={{ background: a.colour }} />
              <Link to={`/projects/${projectId}/alternatives/${a.id}`} className="font-semibold">{a.name}</Link>
            </span>
          ),
        },
        { header: "Status", cell: (a) => <Badge>{a.status}</Badge> },
        { header: "Version", cell: (a) => a.version, align: "right" },
        { header: `Length (${lengthUnitLabel(units)})`, cell: (a) => formatNumber(a.summary?.length, 0), align: "right" },
        { header: "Parcels (partial / full)", cell: (a) => (a.summary ? `${a.summary.parcelsAffected} (${a.summary.partialTakes} / ${a.summary.fullTakes})` : "—"), align: "right" },
        { header: `Take (${areaUnitLabel(units)})`, cell: (a) => formatNumber(a.summary?.takeArea, 0), align: "right" },
        { header: "Cost estimate", cell: (a) => formatCost(a.summary?.estimatedCost), align: "right" },
      ]}
    />
  );
}
