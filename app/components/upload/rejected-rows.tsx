import { Button } from "~/components/ui/button";
import { Table } from "~/components/ui/table";

export type RejectedRow = { row: number; reason: string };
export type RepairedRow = { row: number; repairs: string[] };
export type OverlapRow = { rows: [number, number]; parcelIds: [string | null, string | null]; area: number };

function downloadCsv(header: string, lines: [number, string][], fileName: string) {
  const text = [header, ...lines.map(([row, note]) => `${row},"${note.replace(/"/g, '""')}"`)].join("\n") + "\n";
  const url = URL.createObjectURL(new Blob([text], { type: "text/csv" }));
  const a = document.createElement("a");
  a.href = url;
  a.download = fileName;
  a.click();
  URL.revokeObjectURL(url);
}

/** A counted, downloadable table of rows with one note each. */
function RowNotes({ title, noun, header, lines, fileName }: { title: string; noun: string; header: string; lines: [number, string][]; fileName: string }) {
  if (lines.length === 0) return null;
  return (
    <>
      <div className="flex items-center justify-between">
        <p className="text-sm font-semibold">{lines.length} row{lines.length === 1 ? "" : "s"} {title}</p>
        <Button variant="secondary" onClick={() => downloadCsv(header, lines, fileName)}>Download the list</Button>
      </div>
      <Table rows={lines.slice(0, 200)} rowKey={([row, note]) => `${row}-${note}`} columns={[{ header: "Row", cell: ([row]) => row, align: "right" }, { header: noun, cell: ([, note]) => note }]} />
    </>
  );
}

const overlapNote = (o: OverlapRow, unit: string) => `overlaps row ${o.rows[1]} (${o.parcelIds[0] ?? "?"} / ${o.parcelIds[1] ?? "?"}) by ${o.area.toFixed(2)} ${unit}²`;

/**
 * Rows the checks refused, with the reasons; rows kept after a safe geometry repair, with what
 * was done; parcels that overlap (a warning: they are loaded). All downloadable, to be fixed at the source.
 */
export function RejectedRows({ rows, warnings, repaired = [], overlaps = [], areaUnit = "m" }: { rows: RejectedRow[]; warnings: string[]; repaired?: RepairedRow[]; overlaps?: OverlapRow[]; areaUnit?: string }) {
  return (
    <div className="space-y-3">
      {warnings.length > 0 && (
        <ul className="list-disc space-y-1 pl-5 text-sm text-caution">
          {warnings.map((w) => <li key={w}>{w}</li>)}
        </ul>
      )}
      <RowNotes title="refused" noun="Reason" header="row,reason" lines={rows.map((r) => [r.row, r.reason])} fileName="refused-rows.csv" />
      <RowNotes title="repaired and kept" noun="Repair" header="row,repair" lines={repaired.map((r) => [r.row, r.repairs.join("; ")])} fileName="repaired-rows.csv" />
      <RowNotes title="overlapping another parcel (largest first)" noun="Overlap" header="row,overlap" lines={overlaps.map((o) => [o.rows[0], overlapNote(o, areaUnit)])} fileName="overlapping-parcels.csv" />
    </div>
  );
}
