import { useEffect, useMemo, useRef, useState } from "react";
import Map, { Layer, NavigationControl, ScaleControl, Source, type MapLayerMouseEvent, type MapRef } from "react-map-gl/maplibre";
import { AlternativeOverlays } from "./alternative-overlays";
import { FabricLayers } from "./fabric-layers";
import { markMapReady, useSharedMapProps } from "./map-lib";
import { OverlayLegend } from "./overlay-legend";
import type { OverlayData } from "./overlay-data";
import { PiMarkers, type PiMarkerHandlers } from "./pi-markers";
import type { MapLayerInfo } from "./project-map";
import { boundsOf, collectionOf, type WorkingCrs, type Xy } from "./working-crs";

export interface EditorMapProps {
  layers: MapLayerInfo[];
  basemapStyleUrl: string;
  metric: boolean;
  crs: WorkingCrs;
  /** The alignment's points in the working CRS. */
  points: Xy[];
  /** The points the dashed legs join (default `points`): the editor holds them back until the corridor for a typed edit arrives. */
  legPoints?: Xy[];
  overlay: OverlayData;
  colour: string;
  editable: boolean;
  selected: number | null;
  onSelect: (index: number | null) => void;
  /** Drag steps and clicks report working-CRS coordinates. */
  onDrag: (index: number, xy: Xy) => void;
  onDragEnd: (index: number) => void;
  onNudge: (index: number, dx: number, dy: number) => void;
  onDelete: (index: number) => void;
  onAddPoint: (xy: Xy) => void;
}

/** The editor's map: the fabric, the alternative's corridor and takes, and its PIs to click, drag and delete. */
export function AlternativeEditorMap(props: EditorMapProps) {
  const { crs, points, editable } = props;
  const mapRef = useRef<MapRef>(null);
  const [adding, setAdding] = useState(false);
  const [fabricShown, setFabricShown] = useState(true);
  const lastDragEnd = useRef(0);
  // `data-drawing` on the frame says whether the map has drawn the latest corridor and takes
  // ("drawn" at MapLibre's next idle after a change), for journeys and the editor benchmark.
  const frame = useRef<HTMLDivElement>(null);
  useEffect(() => {
    if (frame.current) frame.current.dataset.drawing = "drawing";
  }, [props.overlay]);
  const lngLats = useMemo(() => points.map((p) => crs.toLngLat(p)), [points, crs]);
  const initialBounds = useMemo(() => boundsOf(lngLats), []); // eslint-disable-line react-hooks/exhaustive-deps
  const legLngLats = useMemo(() => (props.legPoints ?? points).map((p) => crs.toLngLat(p)), [props.legPoints, points, crs]);
  const legs = useMemo(() => collectionOf([{ geometry: { type: "LineString", coordinates: legLngLats } }]), [legLngLats]);
  const handlers: PiMarkerHandlers = {
    onSelect: props.onSelect,
    onDrag: (i, ll) => props.onDrag(i, crs.toWorking(ll)),
    onDragEnd: (i) => {
      lastDragEnd.current = Date.now();
      props.onDragEnd(i);
    },
    onNudge: props.onNudge,
    onDelete: props.onDelete,
  };
  const onClick = (e: MapLayerMouseEvent) => {
    // A drag's mouse-up can arrive as a click: ignore clicks right after one.
    if (!adding || !editable || Date.now() - lastDragEnd.current < 300) return;
    props.onAddPoint(crs.toWorking([e.lngLat.lng, e.lngLat.lat]));
  };
  const zoomToAlignment = () => {
    const b = boundsOf(lngLats);
    if (b) mapRef.current?.fitBounds([[b[0], b[1]], [b[2], b[3]]], { padding: 60, duration: 400 });
  };

  const fabricHidden = useMemo(() => new Set(fabricShown ? [] : props.layers.map((l) => l.id)), [fabricShown, props.layers]);
  const mapProps = useSharedMapProps(props.basemapStyleUrl, props.layers, { hidden: fabricHidden, dim: true });
  return (
    <div className="space-y-2">
      <div className="flex flex-wrap items-center gap-3 text-sm">
        {editable && (
          <button type="button" aria-pressed={adding} onClick={() => setAdding((a) => !a)}
            className={`rounded-control border px-3 py-1.5 font-semibold ${adding ? "border-action bg-action text-white" : "border-rule-strong bg-sheet text-ink"}`}>
            {adding ? "Adding PIs: click the map" : "Add PIs by clicking the map"}
          </button>
        )}
        <label className="flex items-center gap-1.5">
          <input type="checkbox" checked={fabricShown} onChange={() => setFabricShown((s) => !s)} /> Parcel fabric
        </label>
        <button type="button" className="text-action underline" onClick={zoomToAlignment}>Zoom to the alignment</button>
        {editable && <span className="text-xs text-ink-soft">Drag a point to move it; select one and press Delete to remove it.</span>}
      </div>
      <div className="relative h-[520px] overflow-hidden rounded-lg border border-rule" data-testid="alternative-map" ref={frame} data-drawing="drawing">
        {mapProps && (
          <Map
            {...mapProps}
            ref={mapRef}
            initialViewState={initialBounds ? { bounds: initialBounds, fitBoundsOptions: { padding: 60 } } : { longitude: 0, latitude: 20, zoom: 1 }}
            onClick={onClick}
            cursor={adding && editable ? "crosshair" : "grab"}
            onLoad={markMapReady}
            onIdle={() => frame.current && (frame.current.dataset.drawing = "drawn")}
          >
            <NavigationControl position="top-left" showCompass={false} />
            <ScaleControl position="bottom-right" unit={props.metric ? "metric" : "imperial"} />
            <FabricLayers layers={props.layers} hidden={fabricHidden} dim />
            <AlternativeOverlays id="alt" data={props.overlay} colour={props.colour} />
            <Source id="alt-legs" type="geojson" data={legs}>
              <Layer id="alt-legs-line" type="line" paint={{ "line-color": "#4d5753", "line-width": 1, "line-dasharray": [4, 3] }} />
            </Source>
            <PiMarkers points={lngLats} selected={props.selected} editable={editable} handlers={handlers} />
          </Map>
        )}
        <OverlayLegend colour={props.colour} />
      </div>
    </div>
  );
}
