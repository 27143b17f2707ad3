import { useMemo } from "react";
import Map, { Layer, NavigationControl, ScaleControl, Source } from "react-map-gl/maplibre";
import { AlternativeOverlays } from "./alternative-overlays";
import { FabricLayers } from "./fabric-layers";
import { markMapReady, useSharedMapProps } from "./map-lib";
import { TAKE_FILL, TAKE_OPACITY, TAKE_STYLES } from "./outline-styles";
import { EMPTY_OVERLAY, type OverlayData } from "./overlay-data";
import type { MapLayerInfo } from "./project-map";
import { boundsOf, type WorkingCrs, type Xy } from "./working-crs";

export interface ComparedAlternative {
  id: number;
  name: string;
  colour: string;
  /** Alignment points in the working CRS (to frame the map before the outlines arrive). */
  points: Xy[];
  overlay: OverlayData | null;
}

/** Every alternative's corridor in its own colour; the selected one on top with its takes. */
export function ComparisonMap({ layers, basemapStyleUrl, metric, crs, alternatives, selected }: { layers: MapLayerInfo[]; basemapStyleUrl: string; metric: boolean; crs: WorkingCrs; alternatives: ComparedAlternative[]; selected: number | null }) {
  const bounds = useMemo(() => boundsOf(alternatives.flatMap((a) => a.points.map((p) => crs.toLngLat(p)))), []); // eslint-disable-line react-hooks/exhaustive-deps
  // MapLibre keeps layers in the order they were added, so the selected takes have a source of their own, drawn last.
  const selectedTakes = alternatives.find((a) => a.id === selected)?.overlay?.takes ?? EMPTY_OVERLAY.takes;
  const mapProps = useSharedMapProps(basemapStyleUrl, layers, { dim: true });
  return (
    <div className="relative h-[480px] overflow-hidden rounded-lg border border-rule" data-testid="comparison-map">
      {mapProps && (
        <Map
          {...mapProps}
          initialViewState={bounds ? { bounds, fitBoundsOptions: { padding: 50 } } : { longitude: 0, latitude: 20, zoom: 1 }}
          onLoad={markMapReady}
        >
          <NavigationControl position="top-left" showCompass={false} />
          <ScaleControl position="bottom-right" unit={metric ? "metric" : "imperial"} />
          <FabricLayers layers={layers} dim />
          {alternatives.map((a) => (
            <AlternativeOverlays key={a.id} id={`cmp-${a.id}`} data={a.overlay ?? EMPTY_OVERLAY} colour={a.colour} showTakes={false} emphasis={a.id === selected} />
          ))}
          <Source id="cmp-selected-takes" type="geojson" data={selectedTakes}>
            <Layer id="cmp-selected-takes-fill" type="fill" paint={{ "fill-color": TAKE_FILL, "fill-opacity": TAKE_OPACITY }} />
            <Layer id="cmp-selected-takes-line" type="line" paint={{ "line-color": "#3d1010", "line-width": 0.8 }} />
          </Source>
        </Map>
      )}
      <div className="absolute bottom-8 left-3 z-10 rounded-md bg-sheet/95 p-3 text-xs shadow-sheet" aria-label="Legend">
        <ul className="space-y-0.5">
          {alternatives.map((a) => (
            <li key={a.id} className="flex items-center gap-2">
              <span className="inline-block h-3 w-4 rounded-sm" style={{ background: a.colour }} />
              {a.name}{a.id === selected ? " (takes shown)" : ""}
            </li>
          ))}
          <li className="flex items-center gap-2"><span className="inline-block h-3 w-4 rounded-sm" style={{ background: TAKE_STYLES.partial.colour }} />{TAKE_STYLES.partial.label}</li>
          <li className="flex items-center gap-2"><span className="inline-block h-3 w-4 rounded-sm" style={{ background: TAKE_STYLES.full.colour }} />{TAKE_STYLES.full.label}</li>
        </ul>
      </div>
    </div>
  );
}
