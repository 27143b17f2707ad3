import { useMemo } from "react";
import type { FeatureCollection, LineString, MultiPolygon, Polygon } from "geojson";
import Map, { Layer, NavigationControl, ScaleControl, Source } from "react-map-gl/maplibre";
import { AlternativeOverlays } from "./alternative-overlays";
import { markMapReady, useSharedMapProps } from "./map-lib";
import { TAKE_STYLES } from "./outline-styles";
import { toOverlayData } from "./overlay-data";
import { createWorkingCrs } from "./working-crs";

export interface ParcelCaseDrawing {
  crsDefinition: string;
  corridor: Polygon;
  easement: MultiPolygon | null;
  takes: { parcelId: string; classification: "partial" | "full"; geometry: MultiPolygon }[];
  centerline: LineString;
  parcelLayerId: number | null;
  parcelBounds: [number, number, number, number] | null;
  /** The parcel and its neighbours (WGS84), drawn instead of the project's whole fabric. */
  fabric: FeatureCollection;
}

/**
 * One parcel of a land agent's work list: the neighbouring parcels, the approved alternative's
 * right-of-way and easement in its colour, this parcel's take shaded and the parcel outlined. Read only.
 */
export function ParcelCaseMap({ drawing, parcelId, colour, basemapStyleUrl, metric }: { drawing: ParcelCaseDrawing; parcelId: string; colour: string; basemapStyleUrl: string; metric: boolean }) {
  const data = useMemo(() => toOverlayData(drawing, createWorkingCrs(drawing.crsDefinition), { colour }), [drawing, colour]);
  const bounds = drawing.parcelBounds ?? undefined;
  const mapProps = useSharedMapProps(basemapStyleUrl);
  return (
    <div className="relative h-[420px] overflow-hidden rounded-lg border border-rule" data-testid="parcel-case-map">
      {mapProps && (
        <Map
          {...mapProps}
          initialViewState={bounds ? { bounds, fitBoundsOptions: { padding: 80, maxZoom: 18 } } : { longitude: 0, latitude: 20, zoom: 1 }}
          onLoad={markMapReady}
        >
          <NavigationControl position="top-left" showCompass={false} />
          <ScaleControl position="bottom-right" unit={metric ? "metric" : "imperial"} />
          <Source id="case-fabric" type="geojson" data={drawing.fabric}>
            <Layer id="case-fabric-fill" type="fill" paint={{ "fill-color": "#ebe7dc", "fill-opacity": 0.5 }} />
            <Layer id="case-fabric-line" type="line" paint={{ "line-color": "#5b5446", "line-width": 0.8 }} />
          </Source>
          <AlternativeOverlays id="case" data={data} colour={colour} />
          <Layer id="case-parcel-outline" type="line" source="case-fabric" filter={["==", ["get", "parcelId"], parcelId]} paint={{ "line-color": "#1e2422", "line-width": 3 }} />
        </Map>
      )}
      <div className="absolute bottom-8 left-3 z-10 rounded-md bg-sheet/95 p-3 text-xs shadow-sheet" aria-label="Legend">
        <ul className="space-y-0.5">
          <li className="flex items-center gap-2"><span className="inline-block h-0.5 w-4 bg-ink" />Parcel {parcelId}</li>
          <li className="flex items-center gap-2"><span className="inline-block h-3 w-4 rounded-sm" style={{ background: colour, opacity: 0.5 }} />New right-of-way</li>
          <li className="flex items-center gap-2"><span className="inline-block h-3 w-4 rounded-sm" style={{ background: TAKE_STYLES.partial.colour }} />{TAKE_STYLES.partial.label}</li>
          <li className="flex items-center gap-2"><span className="inline-block h-3 w-4 rounded-sm" style={{ background: TAKE_STYLES.full.colour }} />{TAKE_STYLES.full.label}</li>
        </ul>
      </div>
    </div>
  );
}
