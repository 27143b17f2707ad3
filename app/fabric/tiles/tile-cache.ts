/** An encoded tile with its ETag, or null for a tile no feature touches. */
export type CachedTile = { bytes: Uint8Array; etag: string } | null;

/**
 * Least-recently-used cache of encoded tiles, bounded by the bytes it holds (an empty tile
 * counts as 64 bytes of bookkeeping). Keys start with the layer id and a slash, so
 * `forgetLayer` drops one layer's tiles.
 */
export class TileCache {
  private readonly entries = new Map<string, CachedTile>();
  private bytes = 0;

  constructor(private readonly maxBytes: number) {
    if (!(maxBytes > 0)) throw new RangeError(`maxBytes must be a positive number of bytes, got ${maxBytes}`);
  }

  private static sizeOf(tile: CachedTile): number {
    return (tile?.bytes.byteLength ?? 0) + 64;
  }

  /** The cached tile (null = known empty), or undefined when it is not cached; marks it recently used. */
  get(key: string): CachedTile | undefined {
    if (!this.entries.has(key)) return undefined;
    const tile = this.entries.get(key)!;
    this.entries.delete(key);
    this.entries.set(key, tile);
    return tile;
  }

  set(key: string, tile: CachedTile): void {
    this.delete(key);
    const size = TileCache.sizeOf(tile);
    if (size > this.maxBytes) return;
    this.entries.set(key, tile);
    this.bytes += size;
    for (const [oldest, old] of this.entries) {
      if (this.bytes <= this.maxBytes) break;
      this.entries.delete(oldest);
      this.bytes -= TileCache.sizeOf(old);
    }
  }

  private delete(key: string): void {
    if (!this.entries.has(key)) return;
    this.bytes -= TileCache.sizeOf(this.entries.get(key)!);
    this.entries.delete(key);
  }

  /** Drops every tile of one layer (keys `${layerId}/...`). */
  forgetLayer(layerId: number): void {
    const prefix = `${layerId}/`;
    for (const key of [...this.entries.keys()]) if (key.startsWith(prefix)) this.delete(key);
  }

  /** Bytes held, for tests and benchmarks. */
  get size(): { tiles: number; bytes: number } {
    return { tiles: this.entries.size, bytes: this.bytes };
  }
}
