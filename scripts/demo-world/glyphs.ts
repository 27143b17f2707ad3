/**
 * Label glyphs that ship with the app: signed-distance-field PBFs made by
 * fontnik 0.7.7 from the Public Sans WOFF files of @fontsource/public-sans
 * (the latin and latin-ext subsets are separate files, so each range is
 * rendered from both and merged with fontnik's composite).
 */
import { mkdirSync, readFileSync, rmSync, writeFileSync } from "node:fs";
import { createRequire } from "node:module";
import { join } from "node:path";
import { FONT_REGULAR, FONT_SEMIBOLD } from "./basemap-style";

interface Fontnik {
  range(opts: { font: Buffer; start: number; end: number }, cb: (err: Error | null, data: Buffer) => void): void;
  composite(buffers: Buffer[], cb: (err: Error | null, data: Buffer) => void): void;
}
const fontnik = createRequire(import.meta.url)("fontnik") as Fontnik;

export const GLYPH_RANGES: [number, number][] = [[0, 255], [256, 511], [8192, 8447]];
const WEIGHTS: Record<string, number> = { [FONT_REGULAR]: 400, [FONT_SEMIBOLD]: 600 };

const call = <T>(f: (cb: (err: Error | null, data: T) => void) => void) =>
  new Promise<T>((resolve, reject) => f((err, data) => (err ? reject(err) : resolve(data))));

/** Writes dir/{fontstack}/{start}-{end}.pbf for both fonts; returns the number of files. */
export async function writeGlyphs(fontDir: string, dir: string): Promise<number> {
  rmSync(dir, { recursive: true, force: true });
  let files = 0;
  for (const [stack, weight] of Object.entries(WEIGHTS)) {
    const fonts = ["latin", "latin-ext"].map((subset) => readFileSync(join(fontDir, `public-sans-${subset}-${weight}-normal.woff`)));
    mkdirSync(join(dir, stack), { recursive: true });
    for (const [start, end] of GLYPH_RANGES) {
      const parts = await Promise.all(fonts.map((font) => call<Buffer>((cb) => fontnik.range({ font, start, end }, cb))));
      const merged = await call<Buffer>((cb) => fontnik.composite(parts, cb));
      writeFileSync(join(dir, stack, `${start}-${end}.pbf`), merged);
      files++;
    }
  }
  return files;
}
