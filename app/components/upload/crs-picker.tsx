import { useEffect, useMemo, useState } from "react";

type CrsEntry = { code: number; name: string; kind: string; unit: string };

/**
 * Pick the file's coordinate system when it has no .prj. The list ships with the app
 * (`/crs/epsg.json`), so this works with no internet.
 */
export function CrsPicker({ value, onChange }: { value: string; onChange: (epsg: string) => void }) {
  const [entries, setEntries] = useState<CrsEntry[]>([]);
  const [query, setQuery] = useState("");
  useEffect(() => {
    fetch("/crs/epsg.json")
      .then((r) => r.json() as Promise<{ entries: CrsEntry[] }>)
      .then((d) => setEntries(d.entries))
      .catch(() => setEntries([]));
  }, []);
  const matches = useMemo(() => {
    const q = query.trim().toLowerCase();
    if (q.length < 2) return [];
    return entries.filter((e) => String(e.code).startsWith(q.replace(/^epsg:/, "")) || e.name.toLowerCase().includes(q)).slice(0, 30);
  }, [entries, query]);
  return (
    <div className="space-y-1">
      <label className="block text-label font-semibold" htmlFor="crs-search">Coordinate system of the file</label>
      <input id="crs-search" value={query} onChange={(e) => setQuery(e.target.value)} placeholder="EPSG code or name, e.g. 2229 or UTM zone 17N"
        className="block w-full rounded-control border border-rule-strong bg-sheet px-3 py-2 text-sm" />
      {value && <p className="text-xs text-ink-soft">Chosen: {value}</p>}
      {matches.length > 0 && (
        <ul className="max-h-48 overflow-auto rounded-md border border-rule bg-sheet text-sm" role="listbox" aria-label="Coordinate systems">
          {matches.map((m) => (
            <li key={m.code} role="option" aria-selected={value === `EPSG:${m.code}`}>
              <button type="button" className="w-full px-3 py-1.5 text-left hover:bg-paper" onClick={() => { onChange(`EPSG:${m.code}`); setQuery(""); }}>
                EPSG:{m.code} · {m.name} <span className="text-ink-soft">({m.unit})</span>
              </button>
            </li>
          ))}
        </ul>
      )}
    </div>
  );
}
