import { useState } from "react";
import { useRevalidator } from "react-router";
import { Button } from "~/components/ui/button";
import { Field, SelectField } from "~/components/ui/field";
import { CrsPicker } from "./crs-picker";
import { DropZone } from "./drop-zone";
import { FieldMapping, type Mapping } from "./field-mapping";
import { UploadProgress } from "./progress-bar";
import { RejectedRows, type OverlapRow, type RejectedRow, type RepairedRow } from "./rejected-rows";
import { SampleTable } from "./sample-table";
import { sendWithProgress, type UploadPhase } from "./send-with-progress";

type Preview = { fieldNames: string[]; sampleRows: Record<string, unknown>[]; mapping: Mapping; featureCount: number; rejected: RejectedRow[]; repaired: RepairedRow[]; overlaps: OverlapRow[]; areaUnit: string; warnings: string[]; sourceCrs: string };
type ApiError = { error: { code: string; message: string; details?: unknown } };
type Step = { kind: "choose" } | { kind: "busy"; phase: UploadPhase } | { kind: "mapping"; preview: Preview } | { kind: "done"; count: number; rejected: RejectedRow[]; repaired: RepairedRow[]; overlaps: OverlapRow[]; areaUnit: string; warnings: string[] };

function errorOf(body: unknown): ApiError["error"] {
  return (body as ApiError | null)?.error ?? { code: "internal", message: "The server gave no answer." };
}

/** Upload a parcel or building layer: preview, check the attribute mapping, then load it in one go. */
export function LayerUpload({ projectId }: { projectId: number }) {
  const [file, setFile] = useState<File | null>(null);
  const [name, setName] = useState("");
  const [kind, setKind] = useState<"parcels" | "buildings">("parcels");
  const [sourceCrs, setSourceCrs] = useState("");
  const [needsCrs, setNeedsCrs] = useState(false);
  const [mapping, setMapping] = useState<Mapping>({});
  const [step, setStep] = useState<Step>({ kind: "choose" });
  const [error, setError] = useState<ApiError["error"] | null>(null);
  const revalidator = useRevalidator();

  const form = (withFields: boolean) => {
    const f = new FormData();
    f.set("file", file!);
    f.set("name", name || file!.name);
    f.set("kind", kind);
    if (sourceCrs) f.set("sourceCrs", sourceCrs);
    if (withFields) f.set("fields", JSON.stringify(Object.fromEntries(Object.entries(mapping).filter(([, v]) => v))));
    return f;
  };
  const send = async (path: string, withFields: boolean) => {
    setError(null);
    setStep({ kind: "busy", phase: { phase: "uploading", fraction: 0 } });
    try {
      const base = `/api/v1/projects/${projectId}/layers`;
      return await sendWithProgress(`${base}${path}`, base, form(withFields), (phase) => setStep({ kind: "busy", phase }));
    } catch (e) {
      setStep({ kind: "choose" });
      setError({ code: "network", message: e instanceof Error ? e.message : String(e) });
      return null;
    }
  };
  const preview = async () => {
    const answer = await send("/preview", false);
    if (!answer) return;
    if (answer.status !== 200) {
      const err = errorOf(answer.body);
      setNeedsCrs(err.code === "missing_crs");
      setError(err);
      setStep({ kind: "choose" });
      return;
    }
    const p = answer.body as Preview;
    setMapping(p.mapping);
    setStep({ kind: "mapping", preview: p });
  };
  const commit = async () => {
    const answer = await send("", true);
    if (!answer) return;
    if (answer.status !== 201) {
      setError(errorOf(answer.body));
      setStep({ kind: "choose" });
      return;
    }
    const body = answer.body as { featureCount: number; rejected: RejectedRow[]; repaired: RepairedRow[]; overlaps: OverlapRow[]; areaUnit: string; warnings: string[] };
    setStep({ kind: "done", count: body.featureCount, rejected: body.rejected, repaired: body.repaired, overlaps: body.overlaps, areaUnit: body.areaUnit, warnings: body.warnings });
    revalidator.revalidate();
  };

  return (
    <div className="space-y-4" data-testid="layer-upload">
      {(step.kind === "choose" || step.kind === "done") && (
        <div className="grid gap-4 md:grid-cols-[1fr_16rem_12rem] md:items-end">
          <DropZone file={file} onFile={(f) => { setFile(f); setName(f.name.replace(/\.(zip|geojson|json|gpkg)$/i, "")); setStep({ kind: "choose" }); setError(null); }} />
          <Field label="Layer name" value={name} onChange={(e) => setName(e.target.value)} />
          <SelectField label="Layer holds" value={kind} onChange={(e) => setKind(e.target.value as "parcels" | "buildings")} options={[{ value: "parcels", label: "parcels" }, { value: "buildings", label: "building footprints" }]} />
        </div>
      )}
      {needsCrs && step.kind === "choose" && <CrsPicker value={sourceCrs} onChange={setSourceCrs} />}
      {step.kind === "choose" && file && <Button onClick={preview}>Read the file</Button>}
      {step.kind === "busy" && <UploadProgress phase={step.phase} />}
      {error && (
        <div role="alert" className="space-y-2 rounded-md bg-danger-tint px-4 py-3 text-sm text-danger">
          <p className="font-semibold">{error.message}</p>
          <p className="text-ink">Nothing was loaded; the project is as it was.</p>
          {Array.isArray((error.details as { rejected?: unknown })?.rejected) && <RejectedRows rows={(error.details as { rejected: RejectedRow[] }).rejected} warnings={[]} />}
        </div>
      )}
      {step.kind === "mapping" && (
        <div className="space-y-4">
          <p className="text-sm">{step.preview.featureCount.toLocaleString()} features read, in {step.preview.sourceCrs}. Check which fields hold what, then load.</p>
          <FieldMapping fieldNames={step.preview.fieldNames} mapping={mapping} onChange={setMapping} featureIdOption />
          <SampleTable fieldNames={step.preview.fieldNames} rows={step.preview.sampleRows} mappedAs={Object.fromEntries(Object.entries(mapping).filter(([, v]) => v).map(([k, v]) => [v as string, k]))} />
          <RejectedRows rows={step.preview.rejected} warnings={step.preview.warnings} repaired={step.preview.repaired} overlaps={step.preview.overlaps} areaUnit={step.preview.areaUnit} />
          <div className="flex gap-2">
            <Button onClick={commit} disabled={kind === "parcels" && !mapping.parcelId}>Load {step.preview.featureCount.toLocaleString()} {kind}</Button>
            <Button variant="secondary" onClick={() => setStep({ kind: "choose" })}>Back</Button>
          </div>
        </div>
      )}
      {step.kind === "done" && (
        <div role="status" className="space-y-2 rounded-md bg-action-tint px-4 py-3 text-sm">
          <p className="font-semibold">Loaded {step.count.toLocaleString()} {kind}.</p>
          <RejectedRows rows={step.rejected} warnings={step.warnings} repaired={step.repaired} overlaps={step.overlaps} areaUnit={step.areaUnit} />
        </div>
      )}
    </div>
  );
}
