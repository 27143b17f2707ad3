import { flexRender, getCoreRowModel, useReactTable, type ColumnDef } from "@tanstack/react-table";
import { useMemo } from "react";

type Row = Record<string, unknown>;

/** The first rows of the uploaded attribute table; mapped columns are marked with our attribute name. */
export function SampleTable({ fieldNames, rows, mappedAs }: { fieldNames: string[]; rows: Row[]; mappedAs: Record<string, string> }) {
  const columns = useMemo<ColumnDef<Row>[]>(
    () =>
      fieldNames.map((name) => ({
        id: name,
        accessorFn: (row) => row[name],
        header: () => (
          <span>
            {name}
            {mappedAs[name] && <span className="ml-1 rounded bg-action-tint px-1 text-action-strong">→ {mappedAs[name]}</span>}
          </span>
        ),
        cell: (info) => String(info.getValue() ?? ""),
      })),
    [fieldNames, mappedAs],
  );
  const table = useReactTable({ data: rows, columns, getCoreRowModel: getCoreRowModel() });
  return (
    <div className="max-h-72 overflow-auto rounded-md border border-rule" data-testid="sample-table">
      <table className="w-full text-xs">
        <thead className="sticky top-0 bg-paper">
          {table.getHeaderGroups().map((g) => (
            <tr key={g.id}>
              {g.headers.map((h) => (
                <th key={h.id} className="px-2 py-1.5 text-left font-semibold whitespace-nowrap">{flexRender(h.column.columnDef.header, h.getContext())}</th>
              ))}
            </tr>
          ))}
        </thead>
        <tbody>
          {table.getRowModel().rows.map((r) => (
            <tr key={r.id} className="border-t border-rule">
              {r.getVisibleCells().map((c) => (
                <td key={c.id} className="px-2 py-1 whitespace-nowrap">{flexRender(c.column.columnDef.cell, c.getContext())}</td>
              ))}
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
