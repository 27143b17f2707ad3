import type { ReactNode } from "react";

export type Column<Row> = { header: string; cell: (row: Row) => ReactNode; align?: "left" | "right"; className?: string };

/** A plain data table; numbers align right so columns of areas and costs can be compared by eye. */
export function Table<Row>({ columns, rows, rowKey, empty }: { columns: Column<Row>[]; rows: Row[]; rowKey: (row: Row) => string | number; empty?: ReactNode }) {
  if (rows.length === 0 && empty) return <p className="text-sm text-ink-soft">{empty}</p>;
  return (
    <div className="overflow-x-auto">
      <table className="w-full border-collapse text-sm">
        <thead>
          <tr className="border-b border-rule-strong text-left text-label text-ink-soft">
            {columns.map((c) => (
              <th key={c.header} scope="col" className={`px-3 py-2 font-semibold ${c.align === "right" ? "text-right" : ""}`}>
                {c.header}
              </th>
            ))}
          </tr>
        </thead>
        <tbody>
          {rows.map((row) => (
            <tr key={rowKey(row)} className="border-b border-rule last:border-0 hover:bg-paper/60">
              {columns.map((c) => (
                <td key={c.header} className={`px-3 py-2 ${c.align === "right" ? "text-right tabular-nums" : ""} ${c.className ?? ""}`}>
                  {c.cell(row)}
                </td>
              ))}
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
