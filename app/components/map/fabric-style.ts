import type { LayerSpecification, StyleSpecification, VectorSourceSpecification } from "maplibre-gl";
import { parcelFillColour, type ParcelColouring } from "./parcel-styles";
import type { MapLayerInfo } from "./project-map";

/**
 * Footprints are a pixel or two wide below zoom 14 (common practice is to leave them out there);
 * not asking for their tiles keeps the first view of a town light.
 */
const BUILDINGS_MIN_ZOOM = 14;

export interface FabricLook {
  hidden?: Set<number>;
  colouring?: ParcelColouring;
  /** Lighter parcels, under an alternative's overlays. */
  dim?: boolean;
}

export interface FabricSource {
  id: string;
  source: VectorSourceSpecification;
  layers: LayerSpecification[];
}

/**
 * The project's parcel and building layers as MapLibre sources and layers — vector tiles from
 * the app — parcels first so footprints draw on top. One definition serves the first style and
 * the `<Source>`/`<Layer>` components that keep it up to date. Fills draw no antialiased outline
 * (`fill-antialias: false`): the parcel lines are drawn anyway, and without a GPU every extra
 * program and pass is paid for on each frame.
 */
export function fabricSources(layers: MapLayerInfo[], look: FabricLook = {}): FabricSource[] {
  const { hidden = new Set<number>(), colouring = "landUse", dim = false } = look;
  const origin = typeof window === "undefined" ? "" : window.location.origin;
  const ordered = [...layers].sort((a, b) => (a.kind === b.kind ? 0 : a.kind === "parcels" ? -1 : 1));
  return ordered.map((l) => {
    const id = `layer-${l.id}`;
    const layout = { visibility: hidden.has(l.id) ? "none" : "visible" } as const;
    const source: VectorSourceSpecification = { type: "vector", tiles: [`${origin}/tiles/layers/${l.id}/{z}/{x}/{y}.pbf`], minzoom: l.kind === "buildings" ? BUILDINGS_MIN_ZOOM : 0, maxzoom: 18 };
    const specs: LayerSpecification[] = l.kind === "parcels"
      ? [
          { id: `parcels-fill-${l.id}`, source: id, type: "fill", "source-layer": "parcels", layout,
            paint: { "fill-antialias": false, "fill-color": parcelFillColour(colouring), "fill-opacity": ["case", ["boolean", ["feature-state", "hover"], false], 0.9, dim ? 0.35 : 0.6] } },
          { id: `parcels-line-${l.id}`, source: id, type: "line", "source-layer": "parcels", layout,
            paint: { "line-color": "#5b5446", "line-width": ["interpolate", ["linear"], ["zoom"], 12, 0.3, 17, 1.2] } },
        ]
      : [{ id: `buildings-${l.id}`, source: id, type: "fill", "source-layer": "buildings", layout, paint: { "fill-antialias": false, "fill-color": "#6f675a", "fill-opacity": 0.85 } }];
    return { id, source, layers: specs };
  });
}

/**
 * The basemap style with the fabric's sources and layers already in it, so that MapLibre asks
 * for parcel tiles together with the basemap's instead of after React has added them (the
 * components then find them in place and only keep them up to date).
 */
export function styleWithFabric(base: StyleSpecification, fabric: FabricSource[]): StyleSpecification {
  return {
    ...base,
    sources: { ...base.sources, ...Object.fromEntries(fabric.map((f) => [f.id, f.source])) },
    layers: [...base.layers, ...fabric.flatMap((f) => f.layers)],
  };
}
