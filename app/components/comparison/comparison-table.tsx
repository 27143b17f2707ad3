import { createColumnHelper, getCoreRowModel, getFilteredRowModel, getSortedRowModel, useReactTable, type SortingState, type VisibilityState } from "@tanstack/react-table";
import { useMemo, useState } from "react";
import { Link } from "react-router";
import { Badge } from "~/components/ui/badge";
import { areaUnitLabel, formatCost, formatNumber, lengthUnitLabel, type Units } from "~/components/alternatives/format";
import { ColumnPicker } from "./column-picker";
import type { ComparisonAlternative } from "./comparison-types";
import { DataTable } from "./data-table";

const col = createColumnHelper<ComparisonAlternative>();
const numeric = { numeric: true };
const CHECK_TONE = { pass: "action", accepted: "info", warnings: "caution" } as const;

function buildColumns(projectId: number, units: Units, selected: number | null, onSelect: (id: number) => void) {
  const len = lengthUnitLabel(units);
  const area = areaUnitLabel(units);
  return [
    col.display({
      id: "map", header: "On map", enableHiding: false,
      cell: (c) => <input type="radio" name="map-alternative" aria-label={`Show the takes of ${c.row.original.name} on the map`} checked={selected === c.row.original.id} onChange={() => onSelect(c.row.original.id)} />,
    }),
    col.accessor("name", {
      header: "Alternative", enableHiding: false,
      cell: (c) => (
        <span className="flex items-center gap-2 font-semibold">
          <span aria-hidden className="inline-block h-3 w-3 shrink-0 rounded-sm" style={{ background: c.row.original.colour }} />
          <Link to={`/projects/${projectId}/alternatives/${c.row.original.id}`}>{c.getValue()}</Link>
        </span>
      ),
    }),
    col.accessor("status", { header: "Status" }),
    col.accessor("version", { header: "Version", meta: numeric }),
    col.accessor((a) => a.summary.length, { id: "length", header: `Length (${len})`, meta: numeric, cell: (c) => formatNumber(c.getValue(), 1) }),
    col.accessor((a) => a.summary.minimumRadius ?? undefined, { id: "minimumRadius", header: `Min radius (${len})`, meta: numeric, sortUndefined: "last", cell: (c) => formatNumber(c.getValue(), 0) }),
    col.accessor((a) => a.summary.curveCount, { id: "curveCount", header: "Curves", meta: numeric }),
    col.accessor((a) => a.summary.checkStatus, { id: "checkStatus", header: "Design checks", cell: (c) => <Badge tone={CHECK_TONE[c.getValue()]}>{c.getValue() === "warnings" ? `${c.row.original.summary.checkWarnings - c.row.original.summary.checksAccepted} warnings` : c.getValue()}</Badge> }),
    col.accessor((a) => a.summary.parcelsAffected, { id: "parcelsAffected", header: "Parcels affected", meta: numeric }),
    col.accessor((a) => a.summary.partialTakes, { id: "partialTakes", header: "Partial takes", meta: numeric }),
    col.accessor((a) => a.summary.fullTakes, { id: "fullTakes", header: "Full takes", meta: numeric }),
    col.accessor((a) => a.summary.displacements, { id: "displacements", header: "Displacements", meta: numeric }),
    col.accessor((a) => a.summary.proximityImpacts, { id: "proximityImpacts", header: "Buildings close", meta: numeric }),
    col.accessor((a) => a.summary.takeArea, { id: "takeArea", header: `Take area (${area})`, meta: numeric, cell: (c) => formatNumber(c.getValue(), 0) }),
    col.accessor((a) => a.summary.easementArea, { id: "easementArea", header: `Easement (${area})`, meta: numeric, cell: (c) => formatNumber(c.getValue(), 0) }),
    col.accessor((a) => a.summary.unparcelledArea, { id: "unparcelledArea", header: `Outside parcels (${area})`, meta: numeric, cell: (c) => formatNumber(c.getValue(), 0) }),
    col.accessor((a) => a.summary.estimatedCost, { id: "estimatedCost", header: "Cost estimate", meta: numeric, cell: (c) => formatCost(c.getValue()) }),
  ];
}

/** The alternatives side by side: sort by any figure, filter by name or status, choose the columns. */
export function ComparisonTable({ projectId, units, alternatives, selected, onSelect }: { projectId: number; units: Units; alternatives: ComparisonAlternative[]; selected: number | null; onSelect: (id: number) => void }) {
  const [sorting, setSorting] = useState<SortingState>([]);
  const [filter, setFilter] = useState("");
  const [visibility, setVisibility] = useState<VisibilityState>({ status: false, version: false, proximityImpacts: false, unparcelledArea: false });
  const columns = useMemo(() => buildColumns(projectId, units, selected, onSelect), [projectId, units, selected, onSelect]);
  const table = useReactTable({
    data: alternatives,
    columns,
    state: { sorting, globalFilter: filter, columnVisibility: visibility },
    onSortingChange: setSorting,
    onGlobalFilterChange: setFilter,
    onColumnVisibilityChange: setVisibility,
    globalFilterFn: (row, _id, value: string) => `${row.original.name} ${row.original.status}`.toLowerCase().includes(value.trim().toLowerCase()),
    getRowId: (a) => String(a.id),
    getCoreRowModel: getCoreRowModel(),
    getSortedRowModel: getSortedRowModel(),
    getFilteredRowModel: getFilteredRowModel(),
  });
  return (
    <div className="space-y-3">
      <div className="flex flex-wrap items-center gap-3">
        <label className="flex items-center gap-2 text-sm">
          Filter
          <input type="search" value={filter} onChange={(e) => setFilter(e.target.value)} placeholder="Name or status" aria-label="Filter alternatives by name or status" className="rounded-control border border-rule-strong px-2 py-1" />
        </label>
        <div className="ml-auto"><ColumnPicker table={table} /></div>
      </div>
      <DataTable table={table} label="Alternatives compared" testId="comparison-table" />
    </div>
  );
}
