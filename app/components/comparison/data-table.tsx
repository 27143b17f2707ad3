import { flexRender, type Table } from "@tanstack/react-table";

const SORT_LABEL = { asc: "ascending", desc: "descending" } as const;

/**
 * Renders a TanStack table: sortable headers are buttons (keyboard operable) and the header
 * cell carries aria-sort; numeric columns (meta.numeric) align right.
 */
export function DataTable<Row>({ table, label, testId, rowClass }: { table: Table<Row>; label: string; testId?: string; rowClass?: (row: Row) => string }) {
  return (
    <div className="overflow-x-auto">
      <table className="w-full border-collapse text-sm" aria-label={label} data-testid={testId}>
        <thead>
          {table.getHeaderGroups().map((g) => (
            <tr key={g.id} className="border-b border-rule-strong text-left text-label text-ink-soft">
              {g.headers.map((h) => {
                const sorted = h.column.getIsSorted();
                const numeric = (h.column.columnDef.meta as { numeric?: boolean } | undefined)?.numeric;
                const title = flexRender(h.column.columnDef.header, h.getContext());
                return (
                  <th key={h.id} scope="col" aria-sort={sorted ? SORT_LABEL[sorted] : undefined} className={`px-2 py-2 font-semibold ${numeric ? "text-right" : ""}`}>
                    {h.column.getCanSort() ? (
                      <button type="button" onClick={h.column.getToggleSortingHandler()} className="inline-flex items-center gap-1 font-semibold hover:text-ink">
                        {title}
                        <span aria-hidden>{sorted === "asc" ? "▲" : sorted === "desc" ? "▼" : "↕"}</span>
                      </button>
                    ) : title}
                  </th>
                );
              })}
            </tr>
          ))}
        </thead>
        <tbody>
          {table.getRowModel().rows.map((r) => (
            <tr key={r.id} className={`border-b border-rule last:border-0 hover:bg-paper/60 ${rowClass?.(r.original) ?? ""}`}>
              {r.getVisibleCells().map((c) => {
                const meta = c.column.columnDef.meta as { numeric?: boolean; nowrap?: boolean } | undefined;
                return <td key={c.id} className={`px-2 py-1.5 ${meta?.numeric ? "text-right tabular-nums whitespace-nowrap" : ""} ${meta?.nowrap ? "whitespace-nowrap" : ""}`}>{flexRender(c.column.columnDef.cell, c.getContext())}</td>;
              })}
            </tr>
          ))}
        </tbody>
      </table>
      {table.getRowModel().rows.length === 0 && <p className="p-3 text-sm text-ink-soft">Nothing matches the filter.</p>}
    </div>
  );
}
