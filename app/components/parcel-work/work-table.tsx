import { Link } from "react-router";
import { Table } from "~/components/ui/table";
import type { AcquisitionStatus } from "~/calculations/acquisition-status";
import type { ParcelListRow } from "~/calculations/parcel-list-csv";
import { areaLabel, formatArea, formatDay, formatEstimate, type Units } from "./figures";
import { StatusBadge } from "./status-badge";

/** A case on the agent's work list: the parcel's line of their parcel list, and where the case stands. */
export interface WorkRow extends Omit<ParcelListRow, "stationFrom" | "stationTo"> {
  caseId: number;
  projectName: string;
  alternativeName: string;
  version: number;
  units: Units;
  status: AcquisitionStatus;
  state: "open" | "released";
  assignedAt: string | null;
  statusChangedAt: string;
  lastNote: string | null;
}

/** The agent's parcels: take, remainder, take type, estimated cost, status, dates and the latest note. */
export function WorkTable({ rows, empty }: { rows: WorkRow[]; empty: string }) {
  return (
    <Table
      rows={rows}
      rowKey={(r) => r.caseId}
      empty={empty}
      columns={[
        { header: "Parcel", cell: (r) => <Link to={`/work/${r.caseId}`} className="font-semibold">{r.parcelId}</Link> },
        { header: "Project", cell: (r) => <span>{r.projectName}<span className="block text-xs text-ink-soft">{r.alternativeName}, version {r.version}</span></span> },
        { header: "Owner and address", cell: (r) => <span>{r.owner ?? "—"}<span className="block text-xs text-ink-soft">{r.address ?? ""}</span></span> },
        { header: "Take", align: "right", cell: (r) => `${formatArea(r.takeArea)} ${areaLabel(r.units)}` },
        { header: "Remainder", align: "right", cell: (r) => `${formatArea(r.remainderArea)} ${areaLabel(r.units)}` },
        { header: "Type", cell: (r) => r.classification },
        { header: "Est. cost", align: "right", cell: (r) => formatEstimate(r.estimatedCost) },
        { header: "Status", cell: (r) => <StatusBadge status={r.status} released={r.state === "released"} /> },
        { header: "Since", cell: (r) => <span className="whitespace-nowrap">{formatDay(r.statusChangedAt)}<span className="block text-xs text-ink-soft">assigned {formatDay(r.assignedAt)}</span></span> },
        { header: "Latest note", cell: (r) => <span className="line-clamp-2 text-xs text-ink-soft">{r.lastNote ?? ""}</span> },
      ]}
    />
  );
}
