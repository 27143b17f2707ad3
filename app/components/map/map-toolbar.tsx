import { useState } from "react";
import { Button } from "~/components/ui/button";
import type { ParcelColouring } from "./parcel-styles";
import type { ParcelHit } from "./parcel-search";
import type { MapLayerInfo } from "./project-map";

/** Layer toggles, colouring, zoom to layer and search, above the map. */
export function MapToolbar(props: {
  layers: MapLayerInfo[];
  hidden: Set<number>;
  onToggle: (id: number) => void;
  colouring: ParcelColouring;
  onColouring: (c: ParcelColouring) => void;
  onZoomTo: (layer?: MapLayerInfo) => void;
  search: (q: string) => Promise<ParcelHit[]>;
  onFound: (hit: ParcelHit) => void;
}) {
  const [query, setQuery] = useState("");
  const [hits, setHits] = useState<ParcelHit[] | "searching" | { error: string } | null>(null);
  const find = async () => {
    setHits("searching");
    try {
      setHits(await props.search(query));
    } catch (e) {
      setHits({ error: e instanceof Error ? e.message : String(e) });
    }
  };
  return (
    <div className="flex flex-wrap items-end gap-4 text-sm">
      <fieldset className="flex flex-wrap gap-3">
        <legend className="sr-only">Layers</legend>
        {props.layers.map((l) => (
          <label key={l.id} className="flex items-center gap-1.5">
            <input type="checkbox" checked={!props.hidden.has(l.id)} onChange={() => props.onToggle(l.id)} />
            {l.name}
            <button type="button" className="text-xs text-action underline" onClick={() => props.onZoomTo(l)}>zoom</button>
          </label>
        ))}
      </fieldset>
      <label className="flex items-center gap-2">
        Colour parcels by
        <select value={props.colouring} onChange={(e) => props.onColouring(e.target.value as ParcelColouring)} className="rounded-control border border-rule-strong px-2 py-1">
          <option value="landUse">land use</option>
          <option value="landValue">land value per area</option>
        </select>
      </label>
      <form className="relative ml-auto flex gap-2" role="search" onSubmit={(e) => { e.preventDefault(); void find(); }}>
        <input aria-label="Find a parcel by ID, owner or address" placeholder="Parcel ID, owner or address" value={query} onChange={(e) => setQuery(e.target.value)} className="w-56 rounded-control border border-rule-strong px-2 py-1" />
        <Button type="submit" variant="secondary">Find</Button>
        {hits && (
          <ul className="absolute top-full right-0 z-20 mt-1 max-h-64 w-80 overflow-auto rounded-md bg-sheet p-1 shadow-sheet" aria-live="polite">
            {hits === "searching" && <li className="p-2 text-ink-soft">Searching…</li>}
            {typeof hits === "object" && "error" in hits && <li className="p-2 text-danger">{hits.error}</li>}
            {Array.isArray(hits) && hits.length === 0 && <li className="p-2 text-ink-soft">No parcel in the project's layers matches.</li>}
            {Array.isArray(hits) && hits.map((h) => (
              <li key={`${h.layerId}-${h.parcel.parcelId}`}>
                <button type="button" className="w-full rounded p-2 text-left hover:bg-paper" onClick={() => { props.onFound(h); setHits(null); }}>
                  <strong>{h.parcel.parcelId}</strong> · {h.parcel.owner ?? "—"}{h.parcel.address ? ` · ${h.parcel.address}` : ""}
                </button>
              </li>
            ))}
          </ul>
        )}
      </form>
    </div>
  );
}
