/**
 * Regenerates the whole invented demo world: `npx tsx scripts/demo-world/build.ts`.
 * Writes data/demo/ (parcels and buildings, Shapefile zips and GeoJSON) and
 * public/tiles/ (basemap vector tiles, style, glyphs). Seeded throughout:
 * two runs give byte-identical files. Needs GDAL's ogr2ogr (Debian gdal-bin).
 */
import { writeFileSync } from "node:fs";
import { fileURLToPath } from "node:url";
import { join } from "node:path";
import { buildWorld } from "./world";
import { writeDemoData } from "./demo-data";
import { basemapLayers } from "./basemap-features";
import { layersBounds, writeBasemapTiles } from "./basemap-tiles";
import { basemapStyle } from "./basemap-style";
import { writeGlyphs } from "./glyphs";

const root = fileURLToPath(new URL("../..", import.meta.url));
const world = buildWorld();
console.log(`Parcels: ${world.parcels.length}; building footprints: ${world.buildings.length}.`);

const sizes = writeDemoData(world, join(root, "data", "demo"));
for (const [name, bytes] of Object.entries(sizes)) console.log(`data/demo/${name}: ${(bytes / 1024).toFixed(0)} KiB`);

const layers = basemapLayers(world);
const tiles = writeBasemapTiles(layers, join(root, "public", "tiles", "basemap"));
console.log(`Basemap: ${tiles.tiles} tiles (+ ${tiles.empty} empty 0-byte tiles inside the extent), ${(tiles.bytes / 1024).toFixed(0)} KiB.`);

const bounds = layersBounds(layers).map((x) => Math.round(x * 1e5) / 1e5) as [number, number, number, number];
writeFileSync(join(root, "public", "tiles", "basemap-style.json"), `${JSON.stringify(basemapStyle(bounds), null, 2)}\n`);

const glyphs = await writeGlyphs(join(root, "node_modules", "@fontsource", "public-sans", "files"), join(root, "public", "tiles", "glyphs"));
console.log(`Glyphs: ${glyphs} range files.`);
