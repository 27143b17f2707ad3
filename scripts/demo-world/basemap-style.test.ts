/**
 * The shipped basemap style: valid per MapLibre's own style-spec validator
 * (@maplibre/maplibre-gl-style-spec), every URL relative (no host), and
 * every font it names present as glyph PBFs that decode (pbf, glyphs.proto
 * of the MapLibre glyph format: stacks = 1, glyphs = 3, id = 1).
 */
import { existsSync, readFileSync } from "node:fs";
import { join } from "node:path";
import { PbfReader as Pbf } from "pbf";
import { validateStyleMin } from "@maplibre/maplibre-gl-style-spec";
import { describe, expect, it } from "vitest";
import { TILES_DIR } from "./test-paths";

const text = readFileSync(join(TILES_DIR, "basemap-style.json"), "utf8");
const style = JSON.parse(text) as { glyphs: string; sprite?: unknown; sources: Record<string, { tiles: string[] }>; layers: { layout?: Record<string, unknown> }[] };

function strings(value: unknown): string[] {
  if (typeof value === "string") return [value];
  if (Array.isArray(value)) return value.flatMap(strings);
  if (value && typeof value === "object") return Object.values(value).flatMap(strings);
  return [];
}

/** Glyph ids in one glyph PBF. */
function glyphIds(bytes: Uint8Array): number[] {
  const ids: number[] = [];
  const pbf = new Pbf(bytes);
  pbf.readFields((tag, _, p) => {
    if (tag !== 1) return;
    p!.readMessage((t, __, q) => {
      if (t === 3) q!.readMessage((g, ___, r) => { if (g === 1) ids.push(r!.readVarint()); }, undefined);
    }, undefined);
  }, undefined);
  return ids;
}

describe("basemap-style.json", () => {
  it("is a valid MapLibre style (validateStyleMin finds no error)", () => {
    expect(validateStyleMin(JSON.parse(text))).toEqual([]);
  });

  it("references no outside host: every URL is a path on the app", () => {
    const urls = [style.glyphs, ...Object.values(style.sources).flatMap((s) => s.tiles)];
    for (const u of urls) expect(u).toMatch(/^\/tiles\//);
    expect(strings(style).filter((s) => /^[a-z][a-z0-9+.-]*:\/\/|^\/\/|\bwww\./i.test(s))).toEqual([]);
    expect(style.sprite).toBeUndefined();
    // The tile template names the committed folder: /tiles/basemap/{z}/{x}/{y}.pbf -> public/tiles/basemap/14
    expect(existsSync(join(TILES_DIR, "..", style.sources.basemap!.tiles[0]!.replace("{z}/{x}/{y}.pbf", "14")))).toBe(true);
  });

  it("has glyph PBFs for every font it uses, ranges 0-255 and 256-511, that decode with the letters of its labels", () => {
    const fonts = new Set(style.layers.flatMap((l) => (l.layout?.["text-font"] as string[] | undefined) ?? []));
    expect([...fonts].sort()).toEqual(["Public Sans Regular", "Public Sans Semibold"]);
    for (const font of fonts) {
      const url = (range: string) => join(TILES_DIR, "..", style.glyphs.replace("{fontstack}", font).replace("{range}", range));
      const low = glyphIds(readFileSync(url("0-255")));
      for (const ch of "Quillmere Orrin's Cross 0123") expect(low).toContain(ch.charCodeAt(0));
      expect(glyphIds(readFileSync(url("256-511")))).toContain(0x0141); // Ł, from the latin-ext subset
    }
  });
});
