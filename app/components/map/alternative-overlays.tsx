import { Layer, Source } from "react-map-gl/maplibre";
import { TAKE_FILL, TAKE_OPACITY } from "./outline-styles";
import type { OverlayData } from "./overlay-data";

/**
 * One alternative drawn over the fabric: right-of-way in its colour, the easement beyond it
 * dashed, the takes shaded partial or full, and the centreline. `showTakes` is off for the
 * alternatives a comparison shows as corridors only.
 */
export function AlternativeOverlays({ id, data, colour, showTakes = true, emphasis = true }: { id: string; data: OverlayData; colour: string; showTakes?: boolean; emphasis?: boolean }) {
  return (
    <>
      <Source id={`${id}-easement`} type="geojson" data={data.easement}>
        <Layer id={`${id}-easement-fill`} type="fill" paint={{ "fill-color": colour, "fill-opacity": emphasis ? 0.08 : 0.04 }} />
        <Layer id={`${id}-easement-line`} type="line" paint={{ "line-color": colour, "line-width": 1.2, "line-dasharray": [2, 2] }} />
      </Source>
      <Source id={`${id}-corridor`} type="geojson" data={data.corridor}>
        <Layer id={`${id}-corridor-fill`} type="fill" paint={{ "fill-color": colour, "fill-opacity": emphasis ? 0.18 : 0.3 }} />
        <Layer id={`${id}-corridor-line`} type="line" paint={{ "line-color": colour, "line-width": emphasis ? 2 : 1.5 }} />
      </Source>
      <Source id={`${id}-takes`} type="geojson" data={data.takes}>
        <Layer id={`${id}-takes-fill`} type="fill" layout={{ visibility: showTakes ? "visible" : "none" }} paint={{ "fill-color": TAKE_FILL, "fill-opacity": TAKE_OPACITY }} />
        <Layer id={`${id}-takes-line`} type="line" layout={{ visibility: showTakes ? "visible" : "none" }}
          paint={{ "line-color": "#3d1010", "line-width": ["match", ["get", "classification"], "full", 1.4, 0.6] }} />
      </Source>
      <Source id={`${id}-centreline`} type="geojson" data={data.centreline}>
        <Layer id={`${id}-centreline-line`} type="line" paint={{ "line-color": "#1e2422", "line-width": 1.6 }} />
      </Source>
    </>
  );
}
