/**
 * The generator is deterministic and the committed outputs are current:
 * regenerating gives the same bytes as the files in the repository (compared
 * byte for byte, and by SHA-256 for the tile set).
 */
import { createHash } from "node:crypto";
import { mkdtempSync, readFileSync, readdirSync, rmSync } from "node:fs";
import { tmpdir } from "node:os";
import { join, relative } from "node:path";
import { afterAll, describe, expect, it } from "vitest";
import { buildWorld } from "./world";
import { buildingsZip, parcelsZip } from "./demo-data";
import { basemapLayers } from "./basemap-features";
import { layersBounds, writeBasemapTiles } from "./basemap-tiles";
import { basemapStyle } from "./basemap-style";
import { writeGlyphs } from "./glyphs";
import { REPO_ROOT, TILES_DIR, demoFile } from "./test-paths";

const world = buildWorld();
const temp = mkdtempSync(join(tmpdir(), "demo-world-test-"));
afterAll(() => rmSync(temp, { recursive: true, force: true }));

/** SHA-256 over every file's relative path and bytes, in sorted order. */
function treeHash(dir: string): string {
  const hash = createHash("sha256");
  const files = (readdirSync(dir, { recursive: true, withFileTypes: true }) as import("node:fs").Dirent[])
    .filter((d) => d.isFile())
    .map((d) => join(d.parentPath, d.name))
    .sort();
  for (const f of files) hash.update(relative(dir, f)).update(readFileSync(f));
  return hash.digest("hex");
}

describe("demo world generator", () => {
  it("builds the same world twice (seeded PRNG, no clock)", () => {
    const again = buildWorld();
    expect(JSON.stringify(again.parcels)).toBe(JSON.stringify(world.parcels));
    expect(JSON.stringify(again.buildings)).toBe(JSON.stringify(world.buildings));
  });

  it("regenerates quillmere-parcels.zip and quillmere-buildings.zip byte for byte as committed", () => {
    expect(parcelsZip(world).equals(readFileSync(demoFile("quillmere-parcels.zip")))).toBe(true);
    expect(buildingsZip(world).equals(readFileSync(demoFile("quillmere-buildings.zip")))).toBe(true);
  });

  it("regenerates the basemap tiles with the same SHA-256 as the committed set", () => {
    const out = join(temp, "basemap");
    const written = writeBasemapTiles(basemapLayers(world), out);
    expect(written.tiles).toBeGreaterThan(50);
    expect(treeHash(out)).toBe(treeHash(join(TILES_DIR, "basemap")));
  });

  it("regenerates basemap-style.json and the glyph PBFs as committed", async () => {
    const bounds = layersBounds(basemapLayers(world)).map((x) => Math.round(x * 1e5) / 1e5) as [number, number, number, number];
    expect(`${JSON.stringify(basemapStyle(bounds), null, 2)}\n`).toBe(readFileSync(join(TILES_DIR, "basemap-style.json"), "utf8"));
    const out = join(temp, "glyphs");
    expect(await writeGlyphs(join(REPO_ROOT, "node_modules", "@fontsource", "public-sans", "files"), out)).toBe(6);
    expect(treeHash(out)).toBe(treeHash(join(TILES_DIR, "glyphs")));
  });
});
