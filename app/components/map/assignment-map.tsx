import { useMemo } from "react";
import type { ExpressionSpecification } from "maplibre-gl";
import Map, { Layer, NavigationControl, ScaleControl, type MapLayerMouseEvent } from "react-map-gl/maplibre";
import { AlternativeOverlays } from "./alternative-overlays";
import { FabricLayers } from "./fabric-layers";
import { markMapReady, useSharedMapProps } from "./map-lib";
import { toOverlayData } from "./overlay-data";
import type { ParcelCaseDrawing } from "./parcel-case-map";
import type { MapLayerInfo } from "./project-map";
import { boundsOf, createWorkingCrs, type LngLat } from "./working-crs";

/**
 * The preferred alternative's parcels coloured by the agent working each, the selection outlined;
 * clicking a parcel of the alternative adds it to the selection or takes it out.
 */
export function AssignmentMap(props: {
  drawing: ParcelCaseDrawing;
  layers: MapLayerInfo[];
  basemapStyleUrl: string;
  metric: boolean;
  colourOf: Record<string, string>;
  selected: string[];
  onToggle: (parcelId: string) => void;
}) {
  const { drawing, layers, basemapStyleUrl, metric, colourOf, selected, onToggle } = props;
  const crs = useMemo(() => createWorkingCrs(drawing.crsDefinition), [drawing.crsDefinition]);
  const data = useMemo(() => toOverlayData(drawing, crs, {}), [drawing, crs]);
  const bounds = useMemo(() => boundsOf(drawing.centerline.coordinates.map((p) => crs.toLngLat([p[0]!, p[1]!]) as LngLat)), [drawing, crs]);
  const ids = Object.keys(colourOf);
  const source = drawing.parcelLayerId === null ? null : `layer-${drawing.parcelLayerId}`;
  const fill = (ids.length ? ["match", ["to-string", ["get", "parcelId"]], ...ids.flatMap((id) => [id, colourOf[id]!]), "#999999"] : "#999999") as ExpressionSpecification;
  const onClick = (e: MapLayerMouseEvent) => {
    const id = e.features?.[0]?.properties?.parcelId;
    if (id !== undefined && id !== null) onToggle(String(id));
  };
  const mapProps = useSharedMapProps(basemapStyleUrl, layers, { dim: true });
  return (
    <div className="relative h-[460px] overflow-hidden rounded-lg border border-rule" data-testid="assignment-map">
      {mapProps && (
        <Map
          {...mapProps}
          initialViewState={bounds ? { bounds, fitBoundsOptions: { padding: 50 } } : { longitude: 0, latitude: 20, zoom: 1 }}
          interactiveLayerIds={source && ids.length ? ["assign-fill"] : []}
          onClick={onClick}
          onLoad={markMapReady}
        >
          <NavigationControl position="top-left" showCompass={false} />
          <ScaleControl position="bottom-right" unit={metric ? "metric" : "imperial"} />
          <FabricLayers layers={layers} dim />
          <AlternativeOverlays id="assign" data={data} colour="#1e2422" showTakes={false} emphasis={false} />
          {source && ids.length > 0 && (
            <>
              <Layer id="assign-fill" type="fill" source={source} source-layer="parcels" filter={["in", ["to-string", ["get", "parcelId"]], ["literal", ids]]} paint={{ "fill-color": fill, "fill-opacity": 0.75 }} />
              <Layer id="assign-selected" type="line" source={source} source-layer="parcels" filter={["in", ["to-string", ["get", "parcelId"]], ["literal", selected]]} paint={{ "line-color": "#1e2422", "line-width": 3 }} />
            </>
          )}
        </Map>
      )}
    </div>
  );
}
