import { useCallback, useMemo, useRef, useState } from "react";
import Map, { NavigationControl, ScaleControl, type MapLayerMouseEvent, type MapRef } from "react-map-gl/maplibre";
import { FabricLayers } from "./fabric-layers";
import { markMapReady, useSharedMapProps } from "./map-lib";
import { MapLegend } from "./map-legend";
import { ParcelCard, type ParcelSummary } from "./parcel-card";
import { searchParcelLayers } from "./parcel-search";
import type { ParcelColouring } from "./parcel-styles";
import { MapToolbar } from "./map-toolbar";

export type MapLayerInfo = { id: number; kind: "parcels" | "buildings"; name: string; bbox: [number, number, number, number] | null };

function unionBbox(layers: MapLayerInfo[]): [number, number, number, number] | undefined {
  const boxes = layers.map((l) => l.bbox).filter((b): b is [number, number, number, number] => b !== null);
  if (boxes.length === 0) return undefined;
  return [Math.min(...boxes.map((b) => b[0])), Math.min(...boxes.map((b) => b[1])), Math.max(...boxes.map((b) => b[2])), Math.max(...boxes.map((b) => b[3]))];
}

/** The project map: our own basemap tiles, the project's parcel and building layers as vector tiles from the app. */
export function ProjectMap({ layers, basemapStyleUrl, areaUnit }: { layers: MapLayerInfo[]; basemapStyleUrl: string; areaUnit: string }) {
  const mapRef = useRef<MapRef>(null);
  const [hidden, setHidden] = useState<Set<number>>(new Set());
  const [colouring, setColouring] = useState<ParcelColouring>("landUse");
  const [selected, setSelected] = useState<ParcelSummary | null>(null);
  const hovered = useRef<{ source: string; id: number } | null>(null);
  const bounds = useMemo(() => unionBbox(layers), [layers]);
  const parcelLayers = layers.filter((l) => l.kind === "parcels");
  const interactive = parcelLayers.filter((l) => !hidden.has(l.id)).map((l) => `parcels-fill-${l.id}`);

  const setHover = useCallback((next: { source: string; id: number } | null) => {
    const map = mapRef.current?.getMap();
    if (!map) return;
    if (hovered.current) map.setFeatureState({ source: hovered.current.source, sourceLayer: "parcels", id: hovered.current.id }, { hover: false });
    hovered.current = next;
    if (next) map.setFeatureState({ source: next.source, sourceLayer: "parcels", id: next.id }, { hover: true });
  }, []);
  const onMove = (e: MapLayerMouseEvent) => {
    const f = e.features?.[0];
    setHover(f && typeof f.id === "number" ? { source: f.source, id: f.id } : null);
  };
  const onClick = (e: MapLayerMouseEvent) => {
    // Overview cells (zoom ≤ 12) stand for many parcels and carry no parcel ID: no card for them.
    const p = e.features?.[0]?.properties;
    setSelected(p?.parcelId !== undefined ? { parcelId: String(p.parcelId), owner: p.owner, address: p.address, landUse: p.landUse, area: Number(p.area), landValue: p.landValue === undefined ? undefined : Number(p.landValue) } : null);
  };
  const zoomTo = (layer?: MapLayerInfo) => {
    const b = layer?.bbox ?? bounds;
    if (b) mapRef.current?.fitBounds([[b[0], b[1]], [b[2], b[3]]], { padding: 40, duration: 500 });
  };

  const mapProps = useSharedMapProps(basemapStyleUrl, layers, { hidden, colouring });
  return (
    <div className="space-y-3">
      <MapToolbar
        layers={layers}
        hidden={hidden}
        onToggle={(id) => setHidden((h) => { const n = new Set(h); if (n.has(id)) n.delete(id); else n.add(id); return n; })}
        colouring={colouring}
        onColouring={setColouring}
        onZoomTo={zoomTo}
        onFound={(hit) => { setSelected(hit.parcel); mapRef.current?.fitBounds([[hit.bbox[0], hit.bbox[1]], [hit.bbox[2], hit.bbox[3]]], { padding: 80, maxZoom: 18, duration: 800 }); }}
        search={(q) => searchParcelLayers(parcelLayers.map((l) => l.id), q)}
      />
      <div className="relative h-[560px] overflow-hidden rounded-lg border border-rule" data-testid="project-map">
        {mapProps && (
          <Map
            {...mapProps}
            ref={mapRef}
            initialViewState={bounds ? { bounds, fitBoundsOptions: { padding: 40 } } : { longitude: 0, latitude: 20, zoom: 1 }}
            interactiveLayerIds={interactive}
            onMouseMove={onMove}
            onMouseLeave={() => setHover(null)}
            onClick={onClick}
            cursor={hovered.current ? "pointer" : "grab"}
            onLoad={markMapReady}
          >
            <NavigationControl position="top-left" showCompass={false} />
            <ScaleControl position="bottom-right" unit={areaUnit.includes("ft") ? "imperial" : "metric"} />
            <FabricLayers layers={layers} hidden={hidden} colouring={colouring} />
          </Map>
        )}
        {parcelLayers.length > 0 && <MapLegend colouring={colouring} valueUnit={areaUnit} />}
        {selected && <ParcelCard parcel={selected} areaUnit={areaUnit} onClose={() => setSelected(null)} />}
      </div>
    </div>
  );
}
