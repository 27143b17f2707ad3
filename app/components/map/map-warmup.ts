/**
 * Fetches, compiles and starts MapLibre (and its worker) while the browser is idle, on pages
 * from which a map is one click away (the project list, the work list): the map page then
 * finds it ready. A dynamic import, so these pages do not wait for MapLibre themselves.
 * Returns the cancel for an effect's clean-up.
 */
export function warmMapLibWhenIdle(): () => void {
  if (typeof window === "undefined") return () => undefined;
  const warm = () => void import("./maplibre-with-worker.client").then((m) => m.maplibregl?.prewarm());
  if (typeof window.requestIdleCallback !== "function") {
    const timer = window.setTimeout(warm, 300);
    return () => window.clearTimeout(timer);
  }
  const id = window.requestIdleCallback(warm, { timeout: 2000 });
  return () => window.cancelIdleCallback(id);
}
