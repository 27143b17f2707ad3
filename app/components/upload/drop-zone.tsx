import { useRef, useState } from "react";

const ACCEPT = ".zip,.geojson,.json,.gpkg";

/** Drop a file here or pick one: a zipped Shapefile, GeoJSON or GeoPackage. */
export function DropZone({ file, onFile }: { file: File | null; onFile: (f: File) => void }) {
  const input = useRef<HTMLInputElement>(null);
  const [over, setOver] = useState(false);
  return (
    <div
      onDragOver={(e) => { e.preventDefault(); setOver(true); }}
      onDragLeave={() => setOver(false)}
      onDrop={(e) => { e.preventDefault(); setOver(false); const f = e.dataTransfer.files[0]; if (f) onFile(f); }}
      className={`flex min-h-20 items-center justify-between gap-4 rounded-md border-2 border-dashed px-4 py-3 text-sm ${over ? "border-action bg-action-tint" : "border-rule-strong bg-paper"}`}
    >
      <span>{file ? <><strong>{file.name}</strong> · {(file.size / 1024 / 1024).toFixed(2)} MB</> : "Drop a zipped Shapefile, GeoJSON or GeoPackage here"}</span>
      <button type="button" onClick={() => input.current?.click()} className="font-semibold text-action underline">choose a file</button>
      <input ref={input} type="file" accept={ACCEPT} className="sr-only" aria-label="Parcel file" onChange={(e) => { const f = e.target.files?.[0]; if (f) onFile(f); }} />
    </div>
  );
}
