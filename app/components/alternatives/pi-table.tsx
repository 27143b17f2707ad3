import { flexRender, getCoreRowModel, useReactTable } from "@tanstack/react-table";
import { useEffect, useMemo, useRef, useState } from "react";
import type { AlignmentCurveInput, AlignmentInput, CurveSummary } from "~/geometry/alignment-types";
import { pointLabel } from "~/components/map/pi-markers";
import { curveKindOf, type CurveKind } from "./alignment-edits";
import { lengthUnitLabel } from "./format";
import { buildPiColumns, type PiColumnActions, type PiRow } from "./pi-table-columns";

export interface PiTableActions {
  onMove: (index: number, x: number, y: number) => void;
  onKind: (index: number, kind: CurveKind) => void;
  onCurve: (index: number, curve: AlignmentCurveInput) => void;
  onDelete: (index: number) => void;
  onSelect: (index: number) => void;
  /** Inserts a PI after point `index`; answers the new point's index (null when none was added). */
  onInsertAfter: (index: number) => number | null;
}

/**
 * The PIs as an editable table, in step with the map: coordinates, curve kind, radius or radii and
 * Δ1. "Insert after" adds a PI from the keyboard; focus then goes to the new PI's x so its
 * coordinates can be typed, and a polite live region says what happened.
 */
export function PiTable({ alignment, curves, selected, editable, error, actions }: {
  alignment: AlignmentInput;
  curves: CurveSummary[];
  selected: number | null;
  editable: boolean;
  error: string | null;
  actions: PiTableActions;
}) {
  const unit = lengthUnitLabel(alignment.units);
  const count = alignment.points.length;
  const tableRef = useRef<HTMLTableElement>(null);
  const [focusRow, setFocusRow] = useState<number | null>(null);
  const [announcement, setAnnouncement] = useState("");
  const rows = useMemo<PiRow[]>(() => alignment.points.map((p, i) => ({
    index: i,
    label: pointLabel(i, alignment.points.length),
    x: p.x,
    y: p.y,
    kind: curveKindOf(p),
    curve: p.curve,
    end: i === 0 || i === alignment.points.length - 1,
    delta1: p.curve?.type === "compound" ? ("delta1" in p.curve ? p.curve.delta1 : curves.find((c) => c.piIndex === i)?.delta1Deg) : undefined,
  })), [alignment, curves]);
  // Cells call the latest actions through a ref: columns rebuilt on every edit would be new
  // component types to React, remounting the inputs and dropping focus as one moves through a row.
  const latest = useRef(actions);
  useEffect(() => {
    latest.current = actions;
  }, [actions]);
  const columnActions = useMemo<PiColumnActions>(() => ({
    onMove: (i, x, y) => latest.current.onMove(i, x, y),
    onKind: (i, kind) => latest.current.onKind(i, kind),
    onCurve: (i, curve) => latest.current.onCurve(i, curve),
    onDelete: (i) => latest.current.onDelete(i),
    onInsert: (i) => {
      const at = latest.current.onInsertAfter(i);
      if (at === null) return;
      setFocusRow(at);
      setAnnouncement(`${pointLabel(at, count + 1)} inserted after ${pointLabel(i, count)}. Type its x and y.`);
    },
  }), [count]);
  const columns = useMemo(() => buildPiColumns(unit, editable, columnActions, count), [unit, editable, columnActions, count]);
  const table = useReactTable({ data: rows, columns, getCoreRowModel: getCoreRowModel(), getRowId: (r) => String(r.index) });

  useEffect(() => {
    if (focusRow === null) return;
    const input = tableRef.current?.querySelector<HTMLInputElement>(`tr[data-index="${focusRow}"] input`);
    if (!input) return;
    input.focus();
    input.select();
    setFocusRow(null);
  }, [focusRow, rows]);

  return (
    <div className="space-y-2">
      {error && <p role="alert" className="rounded-md border-l-4 border-danger bg-danger-tint px-3 py-2 text-sm text-danger" data-testid="geometry-error">{error} The map and totals show the last alignment that computed.</p>}
      <p className="sr-only" aria-live="polite" data-testid="pi-table-announcement">{announcement}</p>
      <div className="overflow-x-auto">
        <table ref={tableRef} className="w-full border-collapse text-sm" aria-label="Points of intersection" data-testid="pi-table">
          <thead>
            {table.getHeaderGroups().map((g) => (
              <tr key={g.id} className="border-b border-rule-strong text-left text-label text-ink-soft">
                {g.headers.map((h) => <th key={h.id} scope="col" className="px-2 py-2 font-semibold">{flexRender(h.column.columnDef.header, h.getContext())}</th>)}
              </tr>
            ))}
          </thead>
          <tbody>
            {table.getRowModel().rows.map((r) => (
              <tr key={r.id} data-index={r.original.index} aria-selected={selected === r.original.index} onFocusCapture={() => actions.onSelect(r.original.index)} onClick={() => actions.onSelect(r.original.index)}
                className={`border-b border-rule last:border-0 ${selected === r.original.index ? "bg-action-tint" : ""}`}>
                {r.getVisibleCells().map((c) => <td key={c.id} className="px-2 py-1">{flexRender(c.column.columnDef.cell, c.getContext())}</td>)}
              </tr>
            ))}
          </tbody>
        </table>
      </div>
    </div>
  );
}
