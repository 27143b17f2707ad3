import * as maplibregl from "maplibre-gl";
import workerUrl from "maplibre-gl/dist/maplibre-gl-worker.mjs?url";
import "maplibre-gl/dist/maplibre-gl.css";

// Vite bundles MapLibre's worker as a file of its own; MapLibre must be told where it is, or the
// worker fails to load. A `.client` module: React Router leaves it out of the server build, so
// map pages import it statically and the browser fetches it with the page's own modules.
maplibregl.setWorkerUrl(workerUrl);

export { maplibregl };
