import { Link } from "react-router";
import type { AlternativeState } from "~/calculations/alternative-lifecycle";
import { Table } from "~/components/ui/table";
import { areaLabel, formatArea, formatEstimate, type Units } from "../parcel-work/figures";
import { LifecycleBadge } from "./lifecycle-badge";

export interface SummaryRow {
  id: number;
  name: string;
  colour: string;
  status: AlternativeState;
  version: number;
  preferredVersion: number | null;
  summary: {
    length: number;
    minimumRadius: number | null;
    checkStatus: "pass" | "accepted" | "warnings";
    parcelsAffected: number;
    partialTakes: number;
    fullTakes: number;
    displacements: number;
    takeArea: number;
    easementArea: number;
    estimatedCost: number;
  };
}

const CHECKS = { pass: "all met", accepted: "accepted with reasons", warnings: "warnings open" } as const;

/** The comparison summary the decision is made on: one row per alternative, its state and figures. */
export function AlternativesSummaryTable({ rows, units, projectId }: { rows: SummaryRow[]; units: Units; projectId: number }) {
  const len = units === "m" ? "m" : units === "ft" ? "ft" : "US ft";
  return (
    <Table
      rows={rows}
      rowKey={(r) => r.id}
      empty="This project has no alternatives yet."
      columns={[
        {
          header: "Alternative",
          cell: (r) => (
            <span className="flex items-center gap-2">
              <span className="inline-block h-3 w-3 rounded-sm" style={{ background: r.colour }} />
              <Link to={`/projects/${projectId}/alternatives/${r.id}`}>{r.name}</Link>
            </span>
          ),
        },
        {
          header: "State",
          cell: (r) => (
            <span className="space-x-1">
              <LifecycleBadge state={r.status} />
              {r.preferredVersion !== null && r.status !== "approved" && <span className="text-xs text-ink-soft">preferred: version {r.preferredVersion}</span>}
            </span>
          ),
        },
        { header: "Version", align: "right", cell: (r) => r.version },
        { header: `Length (${len})`, align: "right", cell: (r) => formatArea(r.summary.length) },
        { header: `Min. radius (${len})`, align: "right", cell: (r) => (r.summary.minimumRadius === null ? "—" : formatArea(r.summary.minimumRadius)) },
        { header: "Design checks", cell: (r) => CHECKS[r.summary.checkStatus] },
        { header: "Parcels (partial / full)", align: "right", cell: (r) => `${r.summary.parcelsAffected} (${r.summary.partialTakes} / ${r.summary.fullTakes})` },
        { header: "Displacements", align: "right", cell: (r) => r.summary.displacements },
        { header: `Take (${areaLabel(units)})`, align: "right", cell: (r) => formatArea(r.summary.takeArea) },
        { header: `Easement (${areaLabel(units)})`, align: "right", cell: (r) => formatArea(r.summary.easementArea) },
        { header: "Est. cost", align: "right", cell: (r) => formatEstimate(r.summary.estimatedCost) },
      ]}
    />
  );
}
