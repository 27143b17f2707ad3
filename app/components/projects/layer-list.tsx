import { useState } from "react";
import { Button } from "~/components/ui/button";
import { Table } from "~/components/ui/table";
import { downloadTextFile, writeLayerWarningsCsv, type LayerWarningRow } from "./layer-warnings-csv";

export interface LayerListItem {
  id: number;
  kind: "parcels" | "buildings";
  name: string;
  featureCount: number;
  sourceCrs: string;
  /** All the layer's warnings, or null for a layer stored before warnings were kept. */
  warningCount: number | null;
  /** The first of them (the page shows at most this many; the download has them all). */
  warnings: LayerWarningRow[];
}

const KIND_LABELS: Record<LayerWarningRow["kind"], string> = { overlap: "overlap", repair: "repaired", file: "file" };

function warningsLabel(count: number | null): string {
  if (count === null) return "not recorded";
  return count === 0 ? "none" : `${count.toLocaleString("en-US")} warning${count === 1 ? "" : "s"}`;
}

/** Fetches every warning of the layer from the layers API and offers them as CSV. */
async function downloadWarnings(projectId: number, layer: LayerListItem): Promise<void> {
  const res = await fetch(`/api/v1/projects/${projectId}/layers`, { headers: { accept: "application/json" } });
  if (!res.ok) throw new Error(`The warnings could not be read (${res.status}).`);
  const body = (await res.json()) as { layers: { id: number; warnings: LayerWarningRow[] | null }[] };
  const warnings = body.layers.find((l) => l.id === layer.id)?.warnings ?? [];
  downloadTextFile(writeLayerWarningsCsv(warnings), `layer-${layer.id}-warnings.csv`);
}

function LayerWarnings({ projectId, layer }: { projectId: number; layer: LayerListItem }) {
  const [error, setError] = useState<string | null>(null);
  const count = layer.warningCount ?? 0;
  return (
    <details className="rounded-md border border-rule px-3 py-2" data-testid={`layer-warnings-${layer.id}`}>
      <summary className="cursor-pointer text-sm font-semibold">
        {layer.name}: {warningsLabel(count)} from the upload checks
      </summary>
      <div className="mt-3 space-y-3">
        <div className="flex items-center justify-between gap-3">
          <p className="text-xs text-ink-soft">
            The layer was loaded with these. Fix them at the source and upload the layer again.
            {count > layer.warnings.length && ` The first ${layer.warnings.length} are listed; the download has all ${count}.`}
          </p>
          <Button variant="secondary" onClick={() => downloadWarnings(projectId, layer).then(() => setError(null), (e: Error) => setError(e.message))}>
            Download as CSV
          </Button>
        </div>
        {error && <p role="alert" className="text-sm font-semibold text-danger">{error}</p>}
        <Table
          rows={layer.warnings.map((w, i) => ({ ...w, i }))}
          rowKey={(w) => w.i}
          columns={[
            { header: "Kind", cell: (w) => KIND_LABELS[w.kind] },
            { header: "Rows", cell: (w) => (w.rows.length ? w.rows.join(", ") : "—") },
            { header: "Parcel IDs", cell: (w) => (w.parcelIds.length ? w.parcelIds.map((p) => p ?? "?").join(", ") : "—") },
            { header: "Reason", cell: (w) => w.reason },
          ]}
        />
      </div>
    </details>
  );
}

/** The project's active layers with their feature counts and the warnings their upload left. */
export function LayerList({ projectId, layers }: { projectId: number; layers: LayerListItem[] }) {
  return (
    <div className="space-y-3">
      <Table
        rows={layers}
        rowKey={(l) => l.id}
        empty="No layers yet."
        columns={[
          { header: "Layer", cell: (l) => l.name },
          { header: "Holds", cell: (l) => (l.kind === "parcels" ? "parcels" : "building footprints") },
          { header: "Features", cell: (l) => l.featureCount.toLocaleString("en-US"), align: "right" },
          { header: "Source CRS", cell: (l) => l.sourceCrs },
          { header: "Warnings", cell: (l) => <span data-testid={`layer-warning-count-${l.id}`}>{warningsLabel(l.warningCount)}</span>, align: "right" },
        ]}
      />
      {layers.filter((l) => (l.warningCount ?? 0) > 0).map((l) => <LayerWarnings key={l.id} projectId={projectId} layer={l} />)}
    </div>
  );
}
