import * as maplibregl from "maplibre-gl";
import workerUrl from "maplibre-gl/dist/maplibre-gl-worker.mjs?url";
import "maplibre-gl/dist/maplibre-gl.css";

// Vite bundles MapLibre's worker as a file of its own; MapLibre must be told where it is, or the
// worker fails to load. Only ever imported in the browser (react-map-gl loads it lazily).
maplibregl.setWorkerUrl(workerUrl);

export { maplibregl };
