import { LAND_USE_CLASSES, VALUE_LEGEND, type ParcelColouring } from "./parcel-styles";

export function MapLegend({ colouring, valueUnit }: { colouring: ParcelColouring; valueUnit: string }) {
  const items = colouring === "landUse" ? LAND_USE_CLASSES : VALUE_LEGEND;
  return (
    <div className="absolute bottom-8 left-3 z-10 rounded-md bg-sheet/95 p-3 text-xs shadow-sheet" aria-label="Legend">
      <p className="mb-1 font-semibold">{colouring === "landUse" ? "Land use" : `Land value per ${valueUnit}`}</p>
      <ul className="space-y-0.5">
        {items.map((i) => (
          <li key={i.label} className="flex items-center gap-2">
            <span className="inline-block h-3 w-4 rounded-sm border border-rule-strong" style={{ background: i.colour }} />
            {i.label}
          </li>
        ))}
      </ul>
    </div>
  );
}
