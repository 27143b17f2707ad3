import type { Table } from "@tanstack/react-table";

/** Checkboxes that show or hide a table's columns (those that may be hidden). */
export function ColumnPicker<Row>({ table, label = "Columns" }: { table: Table<Row>; label?: string }) {
  return (
    <details className="relative text-sm">
      <summary className="cursor-pointer rounded-control border border-rule-strong bg-sheet px-3 py-1.5 font-semibold">{label}</summary>
      <fieldset className="absolute right-0 z-20 mt-1 w-64 space-y-1 rounded-md bg-sheet p-3 shadow-sheet">
        <legend className="sr-only">Visible columns</legend>
        {table.getAllLeafColumns().filter((c) => c.getCanHide()).map((c) => (
          <label key={c.id} className="flex items-center gap-2">
            <input type="checkbox" checked={c.getIsVisible()} onChange={c.getToggleVisibilityHandler()} />
            {typeof c.columnDef.header === "string" ? c.columnDef.header : c.id}
          </label>
        ))}
      </fieldset>
    </details>
  );
}
