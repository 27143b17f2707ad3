import { expect, test } from "vitest";
import { TileCache } from "./tile-cache";

const tile = (bytes: number) => ({ bytes: new Uint8Array(bytes), etag: `"${bytes}"` });

test("the least recently used tile goes first once the byte budget is passed", () => {
  // Each entry costs its bytes plus 64 of bookkeeping: three 100-byte tiles need 492 bytes.
  const cache = new TileCache(400);
  cache.set("1/0/0/0", tile(100));
  cache.set("1/1/0/0", tile(100));
  expect(cache.get("1/0/0/0")).not.toBeUndefined(); // now 1/1/0/0 is the least recently used
  cache.set("1/1/1/0", tile(100));
  expect(cache.get("1/1/0/0")).toBeUndefined();
  expect(cache.get("1/0/0/0")?.etag).toBe('"100"');
  expect(cache.size).toEqual({ tiles: 2, bytes: 328 });
});

test("empty tiles are remembered as null, distinct from not cached", () => {
  const cache = new TileCache(1000);
  cache.set("2/5/1/1", null);
  expect(cache.get("2/5/1/1")).toBeNull();
  expect(cache.get("2/5/1/2")).toBeUndefined();
});

test("forgetLayer drops one layer's tiles only; a tile larger than the budget is not kept", () => {
  const cache = new TileCache(1000);
  cache.set("3/0/0/0", tile(10));
  cache.set("31/0/0/0", tile(10));
  cache.set("3/1/0/0", tile(5000));
  cache.forgetLayer(3);
  expect(cache.get("3/0/0/0")).toBeUndefined();
  expect(cache.get("31/0/0/0")).not.toBeUndefined();
  expect(cache.size).toEqual({ tiles: 1, bytes: 74 });
  expect(() => new TileCache(0)).toThrow(/maxBytes/);
});
