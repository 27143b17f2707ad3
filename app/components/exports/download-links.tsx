import { useEffect, useState } from "react";
import { Card } from "~/components/ui/card";
import { buttonClass } from "~/components/ui/button";

type Props = { kind: "alternative"; alternativeId: number } | { kind: "comparison"; projectId: number };

const TABLE_FORMATS = [
  { format: "csv", label: "CSV" },
  { format: "xlsx", label: "Excel (XLSX)" },
  { format: "geojson", label: "GeoJSON" },
  { format: "shapefile", label: "Shapefile (zip)" },
] as const;

/**
 * Downloads for an alternative (impact table in four formats, the alignment as LandXML, and a
 * take exhibit or draft legal description per parcel) or for the comparison (every alternative's
 * impact table and the project report PDF). Plain links: the browser sends the session cookie.
 */
export function DownloadLinks(props: Props) {
  const base = props.kind === "alternative" ? `/api/v1/alternatives/${props.alternativeId}/impacts` : `/api/v1/projects/${props.projectId}/comparison`;
  return (
    <Card title="Downloads" className="mt-6">
      <div className="space-y-3 text-sm">
        <p className="flex flex-wrap items-center gap-2">
          <span className="font-semibold">Impact table:</span>
          {TABLE_FORMATS.map((f) => (
            <a key={f.format} className={buttonClass("secondary")} href={`${base}?format=${f.format}`} download>
              {f.label}
            </a>
          ))}
        </p>
        {props.kind === "alternative" ? <AlternativeDocuments alternativeId={props.alternativeId} /> : <ReportLink projectId={props.projectId} />}
        <p className="text-xs text-ink-soft">Costs are order-of-magnitude estimates. Descriptions and exhibits are drafts for review and sealing by a licensed surveyor.</p>
      </div>
    </Card>
  );
}

function ReportLink({ projectId }: { projectId: number }) {
  return (
    <p className="flex flex-wrap items-center gap-2">
      <span className="font-semibold">Report:</span>
      <a className={buttonClass("secondary")} href={`/api/v1/projects/${projectId}/report.pdf`} target="_blank" rel="noreferrer">
        Alternatives report (PDF)
      </a>
    </p>
  );
}

/** LandXML, and per parcel with a right-of-way take its exhibit (PDF) and description (JSON). */
function AlternativeDocuments({ alternativeId }: { alternativeId: number }) {
  const [parcels, setParcels] = useState<string[] | null>(null);
  const [parcel, setParcel] = useState("");
  useEffect(() => {
    let live = true;
    fetch(`/api/v1/alternatives/${alternativeId}/impacts`, { headers: { accept: "application/json" } })
      .then((r) => (r.ok ? (r.json() as Promise<{ parcels: { parcelId: string; takeArea: number }[] }>) : { parcels: [] }))
      .then((d) => {
        if (!live) return;
        const ids = d.parcels.filter((p) => p.takeArea > 0).map((p) => p.parcelId);
        setParcels(ids);
        setParcel(ids[0] ?? "");
      })
      .catch(() => live && setParcels([]));
    return () => {
      live = false;
    };
  }, [alternativeId]);
  const at = (what: string) => `/api/v1/alternatives/${alternativeId}/parcels/${encodeURIComponent(parcel)}/${what}`;
  return (
    <>
      <p className="flex flex-wrap items-center gap-2">
        <span className="font-semibold">Alignment:</span>
        <a className={buttonClass("secondary")} href={`/api/v1/alternatives/${alternativeId}/landxml`} download>
          LandXML 1.2
        </a>
      </p>
      <p className="flex flex-wrap items-center gap-2">
        <label htmlFor={`take-parcel-${alternativeId}`} className="font-semibold">
          Take of parcel:
        </label>
        <select id={`take-parcel-${alternativeId}`} className="rounded-control border border-rule-strong px-2 py-1.5" value={parcel} onChange={(e) => setParcel(e.target.value)} disabled={!parcels?.length}>
          {parcels === null && <option value="">Loading…</option>}
          {parcels?.length === 0 && <option value="">No right-of-way takes</option>}
          {parcels?.map((id) => <option key={id} value={id}>{id}</option>)}
        </select>
        {parcel && (
          <>
            <a className={buttonClass("secondary")} href={at("exhibit.pdf")} target="_blank" rel="noreferrer">
              Exhibit (PDF)
            </a>
            <a className={buttonClass("quiet")} href={at("description")} target="_blank" rel="noreferrer">
              Legal description (JSON)
            </a>
          </>
        )}
      </p>
    </>
  );
}
