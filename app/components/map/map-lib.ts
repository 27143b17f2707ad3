import { useEffect, useMemo, useRef, useState } from "react";
import type { StyleSpecification } from "maplibre-gl";
import { fabricSources, styleWithFabric, type FabricLook } from "./fabric-style";
import { preloadMapResources } from "./map-preloads";
import { maplibregl } from "./maplibre-with-worker.client";
import type { MapLayerInfo } from "./project-map";

let mapLib: Promise<typeof import("maplibre-gl")> | undefined;

/**
 * MapLibre in the browser, or undefined on the server (which renders the map's frame without
 * it). It is a static import of the map pages, so the server-rendered page already asks for it
 * (modulepreload) beside the page's own code, rather than after hydration. Its web worker is
 * started at the first call (`prewarm`), so the worker's start-up overlaps the style request.
 */
export function browserMapLib() {
  if (typeof window === "undefined" || !maplibregl) return undefined;
  mapLib ??= Promise.resolve(maplibregl).then((m) => {
    m.prewarm();
    return m;
  });
  return mapLib;
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
