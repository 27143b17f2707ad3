import { useEffect, useMemo, useRef, useState } from "react";
import type { StyleSpecification } from "maplibre-gl";
import { fabricSources, styleWithFabric, type FabricLook } from "./fabric-style";
import { preloadMapResources } from "./map-preloads";
import type { MapLayerInfo } from "./project-map";

let mapLib: Promise<typeof import("maplibre-gl")> | undefined;

/**
 * MapLibre is loaded in the browser only, once; the server renders the map's frame without it.
 * Its web worker is started as soon as the library arrives (`prewarm`), so the worker's own
 * start-up overlaps the style request instead of following it.
 */
export function browserMapLib() {
  if (typeof window === "undefined") return undefined;
  mapLib ??= import("./maplibre-with-worker").then((m) => {
    m.maplibregl.prewarm();
    return m.maplibregl;
  });
  return mapLib;
}

/**
 * Fetches, compiles and starts MapLibre (and its worker) while the browser is idle, on pages
 * from which a map is one click away (the project list, the work list): the map page then
 * finds it ready. Returns the cancel for an effect's clean-up.
 */
export function warmMapLibWhenIdle(): () => void {
  if (typeof window === "undefined") return () => undefined;
  if (typeof window.requestIdleCallback !== "function") {
    const timer = window.setTimeout(() => void browserMapLib(), 300);
    return () => window.clearTimeout(timer);
  }
  const id = window.requestIdleCallback(() => void browserMapLib(), { timeout: 2000 });
  return () => window.cancelIdleCallback(id);
}

/** Journeys wait for this flag before they look at the map (set when the style has loaded). */
export function markMapReady(): void {
  (window as unknown as { __takelineMapReady?: boolean }).__takelineMapReady = true;
}

/**
 * The props every Takeline map shares, or null until its style is in hand. The basemap style is
 * fetched here (the page preloaded it) and the fabric's sources and layers are put into it, so
 * that MapLibre asks for parcel tiles with the basemap's; a style that cannot be fetched is left
 * to MapLibre by URL. Labels appear without MapLibre's 300 ms fade: with software WebGL (no GPU)
 * each faded frame costs tens of milliseconds of main-thread time.
 */
export function useSharedMapProps(styleUrl: string, fabric: MapLayerInfo[] = [], look: FabricLook = {}) {
  preloadMapResources(styleUrl);
  const mapLib = browserMapLib(); // asked for at the first render, while the style is fetched
  const [base, setBase] = useState<StyleSpecification | "unavailable" | null>(null);
  useEffect(() => {
    let live = true;
    fetch(styleUrl, { credentials: "same-origin" })
      .then((r) => (r.ok ? (r.json() as Promise<StyleSpecification>) : Promise.reject(new Error(String(r.status)))))
      .then((s) => live && setBase(s), () => live && setBase("unavailable"));
    return () => {
      live = false;
    };
  }, [styleUrl]);
  // The look at the moment the style is made: the fabric components mount in that same render with it.
  const latest = useRef({ fabric, look });
  latest.current = { fabric, look };
  const mapStyle = useMemo(() => (base === null ? null : base === "unavailable" ? styleUrl : styleWithFabric(base, fabricSources(latest.current.fabric, latest.current.look))), [base, styleUrl]);
  return mapStyle === null ? null : { mapLib, mapStyle, fadeDuration: 0, attributionControl: false as const };
}
