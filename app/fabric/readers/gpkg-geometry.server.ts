import wkx from "wkx";
import type { Geometry } from "geojson";

/** Envelope bytes by the header's envelope indicator (OGC 12-128r18 §2.1.3.1.1). */
const ENVELOPE_BYTES = [0, 32, 48, 48, 64];

/** A decoded GeoPackage geometry blob: the geometry, empty, or why it is unreadable. */
export type GpkgGeometry = { geometry: Geometry } | { empty: true } | { error: string };

/**
 * Decodes a GeoPackage binary geometry: the "GP" header (magic, version,
 * flags with byte order, empty bit and envelope size, srs_id, envelope)
 * followed by standard WKB, parsed with wkx.
 */
export function decodeGpkgGeometry(blob: Uint8Array | null): GpkgGeometry {
  if (!blob || blob.byteLength === 0) return { empty: true };
  if (blob.byteLength < 8 || blob[0] !== 0x47 || blob[1] !== 0x50) return { error: "geometry is not GeoPackage binary (no 'GP' header)" };
  if (blob[2] !== 0) return { error: `unsupported GeoPackage binary version ${blob[2]}` };
  const flags = blob[3]!;
  if (flags & 0x20) return { error: "extended GeoPackage geometry types are not supported" };
  if (flags & 0x10) return { empty: true };
  const envelope = ENVELOPE_BYTES[(flags >> 1) & 0x07];
  if (envelope === undefined) return { error: "invalid envelope indicator in GeoPackage geometry header" };
  const wkb = Buffer.from(blob.buffer, blob.byteOffset + 8 + envelope, blob.byteLength - 8 - envelope);
  try {
    const parsed = wkx.Geometry.parse(wkb);
    return { geometry: parsed.toGeoJSON() as Geometry };
  } catch (e) {
    return { error: `unreadable WKB geometry (${(e as Error).message})` };
  }
}
