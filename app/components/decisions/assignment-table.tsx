import type { AcquisitionStatus } from "~/calculations/acquisition-status";
import { formatStationRange } from "~/calculations/parcel-list-csv";
import { Table } from "~/components/ui/table";
import { areaLabel, formatArea, formatEstimate, type Units } from "../parcel-work/figures";
import { StatusBadge } from "~/components/parcel-work/status-badge";

export interface AssignableCase {
  caseId: number;
  parcelId: string;
  owner: string | null;
  takeArea: number;
  classification: "partial" | "full";
  estimatedCost: number;
  stationFrom: number;
  stationTo: number;
  agentEmail: string | null;
  agentName: string | null;
  status: AcquisitionStatus;
}

/** The preferred alternative's parcels in station order, with who works each; a checkbox per row when editable. */
export function AssignmentTable({ cases, units, selected, onToggle, colourOf }: { cases: AssignableCase[]; units: Units; selected: Set<string>; onToggle?: (id: string) => void; colourOf: Record<string, string> }) {
  return (
    <Table
      rows={cases}
      rowKey={(c) => c.caseId}
      empty="The preferred alternative takes no parcels."
      columns={[
        ...(onToggle
          ? [{ header: "Pick", cell: (c: AssignableCase) => <input type="checkbox" aria-label={`Select ${c.parcelId}`} checked={selected.has(c.parcelId)} onChange={() => onToggle(c.parcelId)} /> }]
          : []),
        { header: "Parcel", cell: (c) => <span className="font-semibold">{c.parcelId}</span> },
        { header: "Stations", cell: (c) => <span className="whitespace-nowrap tabular-nums">{formatStationRange(c, units)}</span> },
        { header: "Owner", cell: (c) => c.owner ?? "—" },
        { header: `Take (${areaLabel(units)})`, align: "right", cell: (c) => formatArea(c.takeArea) },
        { header: "Type", cell: (c) => c.classification },
        { header: "Est. cost", align: "right", cell: (c) => formatEstimate(c.estimatedCost) },
        {
          header: "Agent",
          cell: (c) => (
            <span className="flex items-center gap-1" data-testid={`agent-of-${c.parcelId}`}>
              <span className="inline-block h-3 w-3 rounded-sm" style={{ background: colourOf[c.parcelId] }} />
              {c.agentName ?? "unassigned"}
            </span>
          ),
        },
        { header: "Status", cell: (c) => <StatusBadge status={c.status} /> },
      ]}
    />
  );
}
