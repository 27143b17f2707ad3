import { preload } from "react-dom";

/** The basemap style the app ships (BASEMAP_STYLE_URL's default) and the glyph ranges its labels need first. */
const SHIPPED_STYLE_URL = "/tiles/basemap-style.json";
const SHIPPED_FIRST_GLYPHS = ["Public Sans Regular", "Public Sans Semibold"].map((font) => `/tiles/glyphs/${encodeURIComponent(font)}/0-255.pbf`);

/**
 * Asks the browser, from the server-rendered page, for what MapLibre will fetch only after its
 * own start-up: the style and, for the shipped style, the first glyph range of each label font
 * (labels wait for glyphs, and the map's load event waits for labels). `crossOrigin:
 * "anonymous"` matches MapLibre's same-origin fetches, so the preloaded answers are used.
 */
export function preloadMapResources(styleUrl: string): void {
  preload(styleUrl, { as: "fetch", crossOrigin: "anonymous" });
  if (styleUrl !== SHIPPED_STYLE_URL) return;
  for (const href of SHIPPED_FIRST_GLYPHS) preload(href, { as: "fetch", crossOrigin: "anonymous" });
}
