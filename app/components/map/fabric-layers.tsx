import { Layer, Source } from "react-map-gl/maplibre";
import { parcelFillColour, type ParcelColouring } from "./parcel-styles";
import type { MapLayerInfo } from "./project-map";

/**
 * Footprints are a pixel or two wide below zoom 14 (common practice is to leave them out there);
 * not asking for their tiles keeps the first view of a town light.
 */
const BUILDINGS_MIN_ZOOM = 14;

/**
 * The project's parcel and building layers as vector tiles from the app, parcels first so the
 * building footprints draw on top. `dim` lightens the fabric under an alternative's overlays.
 */
export function FabricLayers({ layers, hidden = new Set(), colouring = "landUse", dim = false }: { layers: MapLayerInfo[]; hidden?: Set<number>; colouring?: ParcelColouring; dim?: boolean }) {
  const origin = typeof window === "undefined" ? "" : window.location.origin;
  const ordered = [...layers].sort((a, b) => (a.kind === b.kind ? 0 : a.kind === "parcels" ? -1 : 1));
  return (
    <>
      {ordered.map((l) => {
        const visibility = hidden.has(l.id) ? "none" : "visible";
        return (
          <Source key={l.id} id={`layer-${l.id}`} type="vector" tiles={[`${origin}/tiles/layers/${l.id}/{z}/{x}/{y}.pbf`]} minzoom={l.kind === "buildings" ? BUILDINGS_MIN_ZOOM : 0} maxzoom={18}>
            {l.kind === "parcels" ? (
              <>
                <Layer id={`parcels-fill-${l.id}`} source={`layer-${l.id}`} type="fill" source-layer="parcels" layout={{ visibility }}
                  paint={{ "fill-color": parcelFillColour(colouring), "fill-opacity": ["case", ["boolean", ["feature-state", "hover"], false], 0.9, dim ? 0.35 : 0.6] }} />
                <Layer id={`parcels-line-${l.id}`} source={`layer-${l.id}`} type="line" source-layer="parcels" layout={{ visibility }}
                  paint={{ "line-color": "#5b5446", "line-width": ["interpolate", ["linear"], ["zoom"], 12, 0.3, 17, 1.2] }} />
              </>
            ) : (
              <Layer id={`buildings-${l.id}`} source={`layer-${l.id}`} type="fill" source-layer="buildings" layout={{ visibility }}
                paint={{ "fill-color": "#6f675a", "fill-opacity": 0.85 }} />
            )}
          </Source>
        );
      })}
    </>
  );
}
