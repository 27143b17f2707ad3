import { useState } from "react";
import { rowsToCsv, rowsToText, type ReportRow } from "~/calculations/report-rows";
import { Button } from "~/components/ui/button";

/** Copy the results as aligned text, or download them as CSV. */
export function ResultActions({ rows, fileName }: { rows: ReportRow[]; fileName: string }) {
  const [copied, setCopied] = useState(false);
  const copy = async () => {
    await navigator.clipboard.writeText(rowsToText(rows));
    setCopied(true);
    setTimeout(() => setCopied(false), 2000);
  };
  const download = () => {
    const url = URL.createObjectURL(new Blob([rowsToCsv(rows)], { type: "text/csv" }));
    const a = document.createElement("a");
    a.href = url;
    a.download = fileName;
    a.click();
    URL.revokeObjectURL(url);
  };
  return (
    <div className="flex gap-2">
      <Button variant="secondary" onClick={copy}>{copied ? "Copied" : "Copy results"}</Button>
      <Button variant="secondary" onClick={download}>Download CSV</Button>
    </div>
  );
}

export function ResultTable({ rows }: { rows: ReportRow[] }) {
  return (
    <table className="w-full text-sm" data-testid="curve-elements">
      <tbody>
        {rows.map((r) => (
          <tr key={r.element} className="border-b border-rule last:border-0">
            <th scope="row" className="py-1.5 pr-4 text-left font-semibold">{r.element}</th>
            <td className="py-1.5 text-right font-mono tabular-nums">{r.value}</td>
            <td className="w-14 py-1.5 pl-2 text-ink-soft">{r.unit}</td>
          </tr>
        ))}
      </tbody>
    </table>
  );
}
