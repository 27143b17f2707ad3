import { createColumnHelper, getCoreRowModel, getFilteredRowModel, getPaginationRowModel, getSortedRowModel, useReactTable, type SortingState } from "@tanstack/react-table";
import { useMemo, useState } from "react";
import { Button } from "~/components/ui/button";
import { formatNumber } from "~/components/alternatives/format";
import type { ComparisonAlternative, ComparisonRow } from "./comparison-types";
import { DataTable } from "./data-table";

const col = createColumnHelper<ComparisonRow>();
const numeric = { numeric: true };

function buildColumns(alternatives: ComparisonAlternative[], areaUnit: string) {
  return [
    col.accessor("parcelId", { header: "Parcel", meta: { nowrap: true } }),
    col.accessor((r) => r.owner ?? "", { id: "owner", header: "Owner" }),
    col.accessor((r) => r.address ?? "", { id: "address", header: "Address" }),
    col.accessor("parcelArea", { header: `Parcel area (${areaUnit})`, meta: numeric, cell: (c) => formatNumber(c.getValue(), 0) }),
    col.accessor((r) => r.takes.length, { id: "takenBy", header: "Alternatives taking it", meta: numeric }),
    ...alternatives.map((a) =>
      col.accessor((r) => r.takes.find((t) => t.alternativeId === a.id)?.takeArea, {
        id: `alt-${a.id}`,
        header: `${a.name} (${areaUnit})`,
        meta: numeric,
        sortUndefined: "last",
        cell: (c) => {
          const take = c.row.original.takes.find((t) => t.alternativeId === a.id);
          if (!take) return <span className="text-ink-soft">—</span>;
          return (
            <span className="inline-flex items-center gap-1.5">
              {formatNumber(take.takeArea, 1)}
              <abbr title={take.classification === "full" ? "full take" : "partial take"} className={`rounded px-1 text-[10px] font-bold no-underline ${take.classification === "full" ? "bg-danger-tint text-danger" : "bg-take-tint text-take"}`}>
                {take.classification === "full" ? "full" : "part"}
              </abbr>
            </span>
          );
        },
      }),
    ),
  ];
}

/** Which parcels each alternative takes and how much: sort by any column, filter by text or by alternative. */
export function ParcelMatrixTable({ alternatives, rows, areaUnit }: { alternatives: ComparisonAlternative[]; rows: ComparisonRow[]; areaUnit: string }) {
  const [sorting, setSorting] = useState<SortingState>([]);
  const [filter, setFilter] = useState("");
  const [takenBy, setTakenBy] = useState("any");
  const data = useMemo(() => rows.filter((r) => takenBy === "any" || (takenBy === "all" ? r.takes.length === alternatives.length : takenBy === "one" ? r.takes.length === 1 : r.takes.some((t) => `alt-${t.alternativeId}` === takenBy))), [rows, takenBy, alternatives.length]);
  const columns = useMemo(() => buildColumns(alternatives, areaUnit), [alternatives, areaUnit]);
  const table = useReactTable({
    data,
    columns,
    state: { sorting, globalFilter: filter },
    onSortingChange: setSorting,
    onGlobalFilterChange: setFilter,
    globalFilterFn: (row, _id, value: string) => `${row.original.parcelId} ${row.original.owner ?? ""} ${row.original.address ?? ""}`.toLowerCase().includes(value.trim().toLowerCase()),
    getRowId: (r) => r.parcelId,
    getCoreRowModel: getCoreRowModel(),
    getSortedRowModel: getSortedRowModel(),
    getFilteredRowModel: getFilteredRowModel(),
    getPaginationRowModel: getPaginationRowModel(),
    initialState: { pagination: { pageSize: 25, pageIndex: 0 } },
    autoResetPageIndex: true,
  });
  const page = table.getState().pagination;
  const count = table.getFilteredRowModel().rows.length;
  return (
    <div className="space-y-3">
      <div className="flex flex-wrap items-center gap-3 text-sm">
        <label className="flex items-center gap-2">
          Find
          <input type="search" value={filter} onChange={(e) => setFilter(e.target.value)} placeholder="Parcel, owner or address" aria-label="Filter parcels by ID, owner or address" className="rounded-control border border-rule-strong px-2 py-1" />
        </label>
        <label className="flex items-center gap-2">
          Taken by
          <select value={takenBy} onChange={(e) => setTakenBy(e.target.value)} className="rounded-control border border-rule-strong px-2 py-1">
            <option value="any">any alternative</option>
            <option value="all">every alternative</option>
            <option value="one">one alternative only</option>
            {alternatives.map((a) => <option key={a.id} value={`alt-${a.id}`}>{a.name}</option>)}
          </select>
        </label>
        <span className="text-ink-soft" role="status">{count} parcel{count === 1 ? "" : "s"}</span>
      </div>
      <DataTable table={table} label="Parcels by alternative" testId="parcel-matrix" />
      <div className="flex items-center gap-3 text-sm">
        <Button variant="secondary" onClick={() => table.previousPage()} disabled={!table.getCanPreviousPage()}>Previous</Button>
        <span>Page {page.pageIndex + 1} of {Math.max(1, table.getPageCount())}</span>
        <Button variant="secondary" onClick={() => table.nextPage()} disabled={!table.getCanNextPage()}>Next</Button>
      </div>
    </div>
  );
}
