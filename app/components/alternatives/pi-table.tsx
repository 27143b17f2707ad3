import { createColumnHelper, flexRender, getCoreRowModel, useReactTable } from "@tanstack/react-table";
import { useMemo } from "react";
import type { AlignmentCurveInput, AlignmentInput, CurveSummary } from "~/geometry/alignment-types";
import { pointLabel } from "~/components/map/pi-markers";
import { curveKindOf, type CurveKind } from "./alignment-edits";
import { lengthUnitLabel } from "./format";
import { NumberInput } from "./number-input";

type Row = { index: number; label: string; x: number; y: number; kind: CurveKind; curve?: AlignmentCurveInput; end: boolean; delta1?: number };

export interface PiTableActions {
  onMove: (index: number, x: number, y: number) => void;
  onKind: (index: number, kind: CurveKind) => void;
  onCurve: (index: number, curve: AlignmentCurveInput) => void;
  onDelete: (index: number) => void;
  onSelect: (index: number) => void;
}

const col = createColumnHelper<Row>();

/** The PIs as an editable table, in step with the map: coordinates, curve kind, radius or radii and Δ1. */
export function PiTable({ alignment, curves, selected, editable, error, actions }: {
  alignment: AlignmentInput;
  curves: CurveSummary[];
  selected: number | null;
  editable: boolean;
  error: string | null;
  actions: PiTableActions;
}) {
  const unit = lengthUnitLabel(alignment.units);
  const rows = useMemo<Row[]>(() => alignment.points.map((p, i) => ({
    index: i,
    label: pointLabel(i, alignment.points.length),
    x: p.x,
    y: p.y,
    kind: curveKindOf(p),
    curve: p.curve,
    end: i === 0 || i === alignment.points.length - 1,
    delta1: p.curve?.type === "compound" ? ("delta1" in p.curve ? p.curve.delta1 : curves.find((c) => c.piIndex === i)?.delta1Deg) : undefined,
  })), [alignment, curves]);
  const columns = useMemo(() => buildColumns(unit, editable, actions, alignment.points.length), [unit, editable, actions, alignment.points.length]);
  const table = useReactTable({ data: rows, columns, getCoreRowModel: getCoreRowModel(), getRowId: (r) => String(r.index) });

  return (
    <div className="space-y-2">
      {error && <p role="alert" className="rounded-md border-l-4 border-danger bg-danger-tint px-3 py-2 text-sm text-danger" data-testid="geometry-error">{error} The map and totals show the last alignment that computed.</p>}
      <div className="overflow-x-auto">
        <table className="w-full border-collapse text-sm" aria-label="Points of intersection" data-testid="pi-table">
          <thead>
            {table.getHeaderGroups().map((g) => (
              <tr key={g.id} className="border-b border-rule-strong text-left text-label text-ink-soft">
                {g.headers.map((h) => <th key={h.id} scope="col" className="px-2 py-2 font-semibold">{flexRender(h.column.columnDef.header, h.getContext())}</th>)}
              </tr>
            ))}
          </thead>
          <tbody>
            {table.getRowModel().rows.map((r) => (
              <tr key={r.id} aria-selected={selected === r.original.index} onFocusCapture={() => actions.onSelect(r.original.index)} onClick={() => actions.onSelect(r.original.index)}
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

function buildColumns(unit: string, editable: boolean, a: PiTableActions, count: number) {
  const num = (label: string, value: number, commit: (v: number) => void, min?: number, max?: number) =>
    editable ? <NumberInput label={label} value={value} onCommit={commit} min={min} max={max} className="min-w-28" /> : <span className="block text-right tabular-nums">{value.toLocaleString("en", { maximumFractionDigits: 3 })}</span>;
  return [
    col.accessor("label", { header: "Point", cell: (c) => <span className="font-semibold whitespace-nowrap">{c.getValue()}</span> }),
    col.accessor("x", { header: `x (${unit})`, cell: (c) => num(`${c.row.original.label} x`, c.getValue(), (v) => a.onMove(c.row.original.index, v, c.row.original.y)) }),
    col.accessor("y", { header: `y (${unit})`, cell: (c) => num(`${c.row.original.label} y`, c.getValue(), (v) => a.onMove(c.row.original.index, c.row.original.x, v)) }),
    col.accessor("kind", {
      header: "Curve",
      cell: (c) => {
        const r = c.row.original;
        if (r.end) return <span className="text-ink-soft">—</span>;
        if (!editable) return r.kind === "none" ? "angle point" : r.kind;
        return (
          <select aria-label={`${r.label} curve`} value={r.kind} onChange={(e) => a.onKind(r.index, e.target.value as CurveKind)} className="rounded-control border border-rule-strong bg-sheet px-2 py-1">
            <option value="none">none (angle point)</option>
            <option value="simple">simple</option>
            <option value="compound">compound</option>
          </select>
        );
      },
    }),
    col.display({
      id: "radius",
      header: `R or R1 (${unit})`,
      cell: (c) => {
        const r = c.row.original;
        if (r.curve?.type === "simple") return num(`${r.label} radius`, r.curve.radius, (v) => a.onCurve(r.index, { type: "simple", radius: v }), 0.001);
        if (r.curve?.type === "compound") return num(`${r.label} radius 1`, r.curve.radius1, (v) => a.onCurve(r.index, { ...r.curve, radius1: v } as AlignmentCurveInput), 0.001);
        return null;
      },
    }),
    col.display({
      id: "radius2",
      header: `R2 (${unit})`,
      cell: (c) => {
        const r = c.row.original;
        return r.curve?.type === "compound" ? num(`${r.label} radius 2`, r.curve.radius2, (v) => a.onCurve(r.index, { ...r.curve, radius2: v } as AlignmentCurveInput), 0.001) : null;
      },
    }),
    col.display({
      id: "delta1",
      header: "Δ1 (°)",
      cell: (c) => {
        const r = c.row.original;
        if (r.curve?.type !== "compound" || r.delta1 === undefined) return null;
        const { radius1, radius2 } = r.curve;
        return num(`${r.label} delta 1`, r.delta1, (v) => a.onCurve(r.index, { type: "compound", radius1, radius2, delta1: v }), 0.0001, 179.9999);
      },
    }),
    ...(editable
      ? [col.display({
          id: "delete",
          header: () => <span className="sr-only">Delete</span>,
          cell: (c) => (
            <button type="button" disabled={count <= 2} onClick={() => a.onDelete(c.row.original.index)} aria-label={`Delete ${c.row.original.label}`}
              className="rounded-control px-2 py-1 text-sm font-semibold text-danger hover:bg-danger-tint disabled:opacity-40">Delete</button>
          ),
        })]
      : []),
  ];
}
