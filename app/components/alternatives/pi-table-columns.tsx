import { createColumnHelper } from "@tanstack/react-table";
import type { AlignmentCurveInput } from "~/geometry/alignment-types";
import type { CurveKind } from "./alignment-edits";
import { NumberInput } from "./number-input";

export type PiRow = { index: number; label: string; x: number; y: number; kind: CurveKind; curve?: AlignmentCurveInput; end: boolean; delta1?: number };

/** What the table's cells can do (the PI table's actions, plus inserting with focus handled by the table). */
export interface PiColumnActions {
  onMove: (index: number, x: number, y: number) => void;
  onKind: (index: number, kind: CurveKind) => void;
  onCurve: (index: number, curve: AlignmentCurveInput) => void;
  onDelete: (index: number) => void;
  onInsert: (index: number) => void;
}

const col = createColumnHelper<PiRow>();
const rowButton = "rounded-control px-2 py-1 text-sm font-semibold whitespace-nowrap disabled:opacity-40";

/** Columns of the PI table: point, x, y, curve kind, R or R1, R2, Δ1, and (when editable) insert and delete. */
export function buildPiColumns(unit: string, editable: boolean, a: PiColumnActions, count: number) {
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
          id: "insert",
          header: () => <span className="sr-only">Insert</span>,
          cell: (c) => (
            <button type="button" onClick={() => a.onInsert(c.row.original.index)} aria-label={`Insert a PI after ${c.row.original.label}`}
              className={`${rowButton} text-action hover:bg-action-tint`}>Insert after</button>
          ),
        }), col.display({
          id: "delete",
          header: () => <span className="sr-only">Delete</span>,
          cell: (c) => (
            <button type="button" disabled={count <= 2} onClick={() => a.onDelete(c.row.original.index)} aria-label={`Delete ${c.row.original.label}`}
              className={`${rowButton} text-danger hover:bg-danger-tint`}>Delete</button>
          ),
        })]
      : []),
  ];
}
