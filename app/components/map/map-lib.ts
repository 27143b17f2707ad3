let mapLib: Promise<typeof import("maplibre-gl")> | undefined;

/** MapLibre is loaded in the browser only, once; the server renders the map's frame without it. */
export function browserMapLib() {
  if (typeof window === "undefined") return undefined;
  mapLib ??= import("./maplibre-with-worker").then((m) => m.maplibregl);
  return mapLib;
}

/** Journeys wait for this flag before they look at the map (set when the style has loaded). */
export function markMapReady(): void {
  (window as unknown as { __takelineMapReady?: boolean }).__takelineMapReady = true;
}
