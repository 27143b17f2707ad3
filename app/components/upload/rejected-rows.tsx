import { Button } from "~/components/ui/button";
import { Table } from "~/components/ui/table";

export type RejectedRow = { row: number; reason: string };

function downloadCsv(rows: RejectedRow[], fileName: string) {
  const text = ["row,reason", ...rows.map((r) => `${r.row},"${r.reason.replace(/"/g, '""')}"`)].join("\n") + "\n";
  const url = URL.createObjectURL(new Blob([text], { type: "text/csv" }));
  const a = document.createElement("a");
  a.href = url;
  a.download = fileName;
  a.click();
  URL.revokeObjectURL(url);
}

/** Rows the checks refused, with the reasons, downloadable so they can be fixed at the source. */
export function RejectedRows({ rows, warnings }: { rows: RejectedRow[]; warnings: string[] }) {
  return (
    <div className="space-y-3">
      {warnings.length > 0 && (
        <ul className="list-disc space-y-1 pl-5 text-sm text-caution">
          {warnings.map((w) => <li key={w}>{w}</li>)}
        </ul>
      )}
      {rows.length > 0 && (
        <>
          <div className="flex items-center justify-between">
            <p className="text-sm font-semibold">{rows.length} row{rows.length === 1 ? "" : "s"} refused</p>
            <Button variant="secondary" onClick={() => downloadCsv(rows, "refused-rows.csv")}>Download the list</Button>
          </div>
          <Table rows={rows.slice(0, 200)} rowKey={(r) => `${r.row}-${r.reason}`} columns={[{ header: "Row", cell: (r) => r.row, align: "right" }, { header: "Reason", cell: (r) => r.reason }]} />
        </>
      )}
    </div>
  );
}
