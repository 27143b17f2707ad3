export const TARGETS = [
  { key: "parcelId", label: "Parcel ID", required: true },
  { key: "owner", label: "Owner", required: false },
  { key: "address", label: "Situs address", required: false },
  { key: "landUse", label: "Land use", required: false },
  { key: "landValue", label: "Land value", required: false },
] as const;
export type TargetKey = (typeof TARGETS)[number]["key"];
export type Mapping = Partial<Record<TargetKey, string>>;

/** Which file field holds each of our attributes; pre-filled with the server's guesses. */
export function FieldMapping({ fieldNames, mapping, onChange, featureIdOption }: { fieldNames: string[]; mapping: Mapping; onChange: (m: Mapping) => void; featureIdOption: boolean }) {
  return (
    <div className="grid grid-cols-2 gap-3 md:grid-cols-5">
      {TARGETS.map((t) => (
        <label key={t.key} className="space-y-1 text-label font-semibold">
          <span className="block">{t.label}{t.required ? " *" : ""}</span>
          <select
            aria-label={`Field for ${t.label}`}
            value={mapping[t.key] ?? ""}
            onChange={(e) => onChange({ ...mapping, [t.key]: e.target.value || undefined })}
            className="block w-full rounded-control border border-rule-strong bg-sheet px-2 py-1.5 text-sm font-normal"
          >
            <option value="">— none —</option>
            {t.key === "parcelId" && featureIdOption && <option value="@id">feature id</option>}
            {fieldNames.map((f) => <option key={f} value={f}>{f}</option>)}
          </select>
        </label>
      ))}
    </div>
  );
}
