import { Marker, type MarkerDragEvent } from "react-map-gl/maplibre";
import type { LngLat } from "./working-crs";

export interface PiMarkerHandlers {
  onSelect: (index: number) => void;
  onDrag: (index: number, lngLat: LngLat) => void;
  onDragEnd: (index: number) => void;
  /** Arrow keys move a focused point by one unit (ten with Shift), in working-CRS units. */
  onNudge: (index: number, dx: number, dy: number) => void;
  onDelete: (index: number) => void;
}

/** Name of point `index` of an alignment of `count` points: the ends are POB and POE. */
export function pointLabel(index: number, count: number): string {
  if (index === 0) return "POB";
  if (index === count - 1) return "POE";
  return `PI ${index}`;
}

const ARROWS: Record<string, [number, number]> = { ArrowLeft: [-1, 0], ArrowRight: [1, 0], ArrowUp: [0, 1], ArrowDown: [0, -1] };

/** The alignment's points as markers: draggable buttons when editable, plain labels otherwise. */
export function PiMarkers({ points, selected, editable, handlers }: { points: LngLat[]; selected: number | null; editable: boolean; handlers: PiMarkerHandlers }) {
  return (
    <>
      {points.map((p, i) => {
        const label = pointLabel(i, points.length);
        const end = i === 0 || i === points.length - 1;
        return (
          <Marker
            key={i}
            longitude={p[0]}
            latitude={p[1]}
            draggable={editable}
            onDragStart={() => handlers.onSelect(i)}
            onDrag={(e: MarkerDragEvent) => handlers.onDrag(i, [e.lngLat.lng, e.lngLat.lat])}
            onDragEnd={() => handlers.onDragEnd(i)}
            onClick={(e) => {
              e.originalEvent.stopPropagation();
              handlers.onSelect(i);
            }}
          >
            <button
              type="button"
              data-testid={`pi-marker-${i}`}
              aria-label={`${label}${editable ? ": drag to move, arrow keys to nudge, Delete to remove" : ""}`}
              aria-pressed={selected === i}
              onFocus={() => handlers.onSelect(i)}
              onKeyDown={(e) => {
                const arrow = ARROWS[e.key];
                if (editable && arrow) {
                  e.preventDefault();
                  const step = e.shiftKey ? 10 : 1;
                  handlers.onNudge(i, arrow[0] * step, arrow[1] * step);
                } else if (editable && (e.key === "Delete" || e.key === "Backspace")) {
                  e.preventDefault();
                  handlers.onDelete(i);
                }
              }}
              className={`flex h-6 min-w-6 items-center justify-center rounded-full border-2 px-1 text-[10px] font-bold shadow ${
                selected === i ? "border-ink bg-action text-white" : end ? "border-ink bg-sheet text-ink" : "border-action bg-sheet text-action-strong"
              } ${editable ? "cursor-move" : "cursor-pointer"}`}
            >
              {end ? label : i}
            </button>
          </Marker>
        );
      })}
    </>
  );
}
