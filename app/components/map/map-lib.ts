import { preloadMapResources } from "./map-preloads";

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

// Start fetching MapLibre as soon as a page with a map has loaded its code, not when it renders.
browserMapLib();

/** Journeys wait for this flag before they look at the map (set when the style has loaded). */
export function markMapReady(): void {
  (window as unknown as { __takelineMapReady?: boolean }).__takelineMapReady = true;
}

/**
 * The props every Takeline map shares. Labels appear without MapLibre's 300 ms fade: with
 * software WebGL (no GPU) each faded frame costs tens of milliseconds of main-thread time, and
 * an edit in the editor would pay for a dozen of them. Also asks the browser early for the
 * style and the first glyphs (`preloadMapResources`).
 */
export function sharedMapProps(styleUrl: string) {
  preloadMapResources(styleUrl);
  return { mapLib: browserMapLib(), mapStyle: styleUrl, fadeDuration: 0, attributionControl: false as const };
}
