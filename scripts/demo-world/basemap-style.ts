/**
 * Takeline's own basemap style (MapLibre style spec v8): paper-like and
 * muted, so the parcels and corridors drawn on top carry the colour. Every
 * URL is relative to the app (tiles and glyphs ship in public/tiles); no
 * sprite, because no layer uses an icon.
 */
import type { StyleSpecification } from "@maplibre/maplibre-gl-style-spec";
import { MAX_ZOOM, MIN_ZOOM } from "./basemap-tiles";

export const FONT_REGULAR = "Public Sans Regular";
export const FONT_SEMIBOLD = "Public Sans Semibold";

const INK = "#4b4a46";
const PAPER = "#f7f5ef";
const halo = { "text-halo-color": PAPER, "text-halo-width": 1.4 };
const byZoom = (pairs: [number, number][]) => ["interpolate", ["exponential", 1.6], ["zoom"], ...pairs.flat()] as unknown as number;
const classIs = (...classes: string[]) => ["in", ["get", "class"], ["literal", classes]] as unknown as boolean;

export function basemapStyle(bounds: [number, number, number, number]): StyleSpecification {
  return {
    version: 8,
    name: "Takeline paper",
    glyphs: "/tiles/glyphs/{fontstack}/{range}.pbf",
    center: [(bounds[0] + bounds[2]) / 2, (bounds[1] + bounds[3]) / 2],
    zoom: 13,
    sources: {
      basemap: { type: "vector", tiles: ["/tiles/basemap/{z}/{x}/{y}.pbf"], minzoom: MIN_ZOOM, maxzoom: MAX_ZOOM, bounds, attribution: "Invented demo basemap (Quillmere, Ostrand County)" },
    },
    // Fills without the antialiased outline pass: one program and one draw less per fill layer on
    // each frame, which a machine without a GPU pays for in software.
    layers: [
      { id: "background", type: "background", paint: { "background-color": PAPER } },
      { id: "landcover-field", type: "fill", source: "basemap", "source-layer": "landcover", filter: classIs("field"), paint: { "fill-antialias": false, "fill-color": "#efeddc" } },
      { id: "landcover-wood", type: "fill", source: "basemap", "source-layer": "landcover", filter: classIs("wood"), paint: { "fill-antialias": false, "fill-color": "#dce4d2" } },
      { id: "landcover-town", type: "fill", source: "basemap", "source-layer": "landcover", filter: classIs("town"), paint: { "fill-antialias": false, "fill-color": "#efebe4" } },
      { id: "landcover-park", type: "fill", source: "basemap", "source-layer": "landcover", filter: classIs("park"), paint: { "fill-antialias": false, "fill-color": "#dae5cf" } },
      { id: "water", type: "fill", source: "basemap", "source-layer": "water", paint: { "fill-antialias": false, "fill-color": "#bccfd8" } },
      { id: "waterway", type: "line", source: "basemap", "source-layer": "waterway", paint: { "line-color": "#a9c1cc", "line-width": byZoom([[10, 0.6], [16, 2]]) } },
      { id: "street-track", type: "line", source: "basemap", "source-layer": "streets", filter: classIs("track"), paint: { "line-color": "#b9b2a5", "line-width": byZoom([[10, 0.5], [16, 2]]), "line-dasharray": [3, 2] } },
      { id: "street-casing", type: "line", source: "basemap", "source-layer": "streets", filter: classIs("main", "minor"), layout: { "line-cap": "round", "line-join": "round" }, paint: { "line-color": "#c7c2b7", "line-width": byZoom([[10, 1], [13, 3], [16, 14]]) } },
      { id: "street", type: "line", source: "basemap", "source-layer": "streets", filter: classIs("main", "minor"), layout: { "line-cap": "round", "line-join": "round" }, paint: { "line-color": "#ffffff", "line-width": ["interpolate", ["exponential", 1.6], ["zoom"], 10, ["match", ["get", "class"], "main", 0.6, 0.3], 13, ["match", ["get", "class"], "main", 2, 1.4], 16, ["match", ["get", "class"], "main", 12, 10]] } },
      { id: "waterway-label", type: "symbol", source: "basemap", "source-layer": "waterway", minzoom: 13, layout: { "symbol-placement": "line", "text-field": ["get", "name"], "text-font": [FONT_REGULAR], "text-size": 11, "text-letter-spacing": 0.08 }, paint: { "text-color": "#5a7683", ...halo } },
      { id: "pond-label", type: "symbol", source: "basemap", "source-layer": "water", minzoom: 13, filter: ["==", ["get", "kind"], "pond"], layout: { "text-field": ["get", "name"], "text-font": [FONT_REGULAR], "text-size": 11 }, paint: { "text-color": "#5a7683", ...halo } },
      { id: "street-label", type: "symbol", source: "basemap", "source-layer": "streets", minzoom: 14, layout: { "symbol-placement": "line", "text-field": ["get", "name"], "text-font": [FONT_REGULAR], "text-size": byZoom([[14, 10], [16, 12]]) }, paint: { "text-color": INK, ...halo } },
      { id: "place-hill", type: "symbol", source: "basemap", "source-layer": "places", minzoom: 12, filter: classIs("hill"), layout: { "text-field": ["get", "name"], "text-font": [FONT_REGULAR], "text-size": 11 }, paint: { "text-color": "#6b6a63", ...halo } },
      { id: "place-hamlet", type: "symbol", source: "basemap", "source-layer": "places", filter: classIs("hamlet"), layout: { "text-field": ["get", "name"], "text-font": [FONT_REGULAR], "text-size": 12 }, paint: { "text-color": INK, ...halo } },
      { id: "place-town", type: "symbol", source: "basemap", "source-layer": "places", maxzoom: 15, filter: classIs("town"), layout: { "text-field": ["get", "name"], "text-font": [FONT_SEMIBOLD], "text-size": byZoom([[10, 13], [14, 18]]), "text-letter-spacing": 0.04 }, paint: { "text-color": INK, ...halo } },
    ],
  };
}
