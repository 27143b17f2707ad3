import { useMemo } from "react";
import type { Feature, FeatureCollection } from "geojson";
import type { FilterSpecification } from "maplibre-gl";
import { Layer, Source } from "react-map-gl/maplibre";
import { TAKE_FILL, TAKE_OPACITY } from "./outline-styles";
import type { OverlayData } from "./overlay-data";

type OverlayKind = "easement" | "corridor" | "take" | "centreline";

const isKind = (kind: OverlayKind): FilterSpecification => ["==", ["get", "overlayKind"], kind];

/**
 * Every part of one drawing in a single collection, each feature tagged with its part. One
 * GeoJSON source means one `setData` and one worker re-tiling per edit, so the map redraws
 * once per preview rather than once per part (software WebGL makes each redraw count).
 */
function combineOverlay(data: OverlayData, showTakes: boolean): FeatureCollection {
  const tagged = (fc: FeatureCollection, kind: OverlayKind): Feature[] => fc.features.map((f) => ({ ...f, properties: { ...f.properties, overlayKind: kind } }));
  return {
    type: "FeatureCollection",
    features: [...tagged(data.easement, "easement"), ...tagged(data.corridor, "corridor"), ...(showTakes ? tagged(data.takes, "take") : []), ...tagged(data.centreline, "centreline")],
  };
}

/**
 * One alternative drawn over the fabric: right-of-way in its colour, the easement beyond it
 * dashed, the takes shaded partial or full, and the centreline. `showTakes` is off for the
 * alternatives a comparison shows as corridors only.
 */
export function AlternativeOverlays({ id, data, colour, showTakes = true, emphasis = true }: { id: string; data: OverlayData; colour: string; showTakes?: boolean; emphasis?: boolean }) {
  const combined = useMemo(() => combineOverlay(data, showTakes), [data, showTakes]);
  return (
    <Source id={`${id}-drawing`} type="geojson" data={combined}>
      <Layer id={`${id}-easement-fill`} type="fill" filter={isKind("easement")} paint={{ "fill-color": colour, "fill-opacity": emphasis ? 0.08 : 0.04 }} />
      <Layer id={`${id}-easement-line`} type="line" filter={isKind("easement")} paint={{ "line-color": colour, "line-width": 1.2, "line-dasharray": [2, 2] }} />
      <Layer id={`${id}-corridor-fill`} type="fill" filter={isKind("corridor")} paint={{ "fill-color": colour, "fill-opacity": emphasis ? 0.18 : 0.3 }} />
      <Layer id={`${id}-corridor-line`} type="line" filter={isKind("corridor")} paint={{ "line-color": colour, "line-width": emphasis ? 2 : 1.5 }} />
      <Layer id={`${id}-takes-fill`} type="fill" filter={isKind("take")} paint={{ "fill-color": TAKE_FILL, "fill-opacity": TAKE_OPACITY }} />
      <Layer id={`${id}-takes-line`} type="line" filter={isKind("take")} paint={{ "line-color": "#3d1010", "line-width": ["match", ["get", "classification"], "full", 1.4, 0.6] }} />
      <Layer id={`${id}-centreline-line`} type="line" filter={isKind("centreline")} paint={{ "line-color": "#1e2422", "line-width": 1.6 }} />
    </Source>
  );
}
