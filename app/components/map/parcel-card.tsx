export type ParcelSummary = { parcelId: string; owner?: string; address?: string; landUse?: string; area?: number; landValue?: number };

/** What a click on a parcel shows. Areas are grid values in the working CRS. */
export function ParcelCard({ parcel, areaUnit, onClose }: { parcel: ParcelSummary; areaUnit: string; onClose: () => void }) {
  const rows: [string, string][] = [
    ["Parcel ID", parcel.parcelId],
    ["Owner", parcel.owner || "—"],
    ["Address", parcel.address || "—"],
    ["Land use", parcel.landUse || "—"],
    ["Area", parcel.area === undefined ? "—" : `${parcel.area.toLocaleString(undefined, { maximumFractionDigits: 1 })} ${areaUnit}`],
    ["Land value", parcel.landValue === undefined ? "—" : parcel.landValue.toLocaleString(undefined, { maximumFractionDigits: 0 })],
  ];
  return (
    <div className="absolute top-3 right-3 z-10 w-72 rounded-lg bg-sheet p-4 text-sm shadow-sheet" data-testid="parcel-card">
      <div className="mb-2 flex items-center justify-between">
        <h3 className="font-semibold">Parcel</h3>
        <button type="button" onClick={onClose} aria-label="Close parcel card" className="font-bold">×</button>
      </div>
      <dl className="space-y-1">
        {rows.map(([k, v]) => (
          <div key={k} className="flex justify-between gap-3">
            <dt className="text-ink-soft">{k}</dt>
            <dd className="text-right">{v}</dd>
          </div>
        ))}
      </dl>
    </div>
  );
}
