import type { ParcelSummary } from "./parcel-card";

/** A search hit: the parcel's card data and its WGS84 bounds [west, south, east, north] to fly to. */
export type ParcelHit = { layerId: number; parcel: ParcelSummary; bbox: [number, number, number, number] };

type HitFeature = { id: number; bbox: [number, number, number, number]; properties: Record<string, unknown> };

const num = (v: unknown) => (v === null || v === undefined ? undefined : Number(v));
const text = (v: unknown) => (v === null || v === undefined ? undefined : String(v));

/**
 * Searches the whole of each parcel layer on the server (parcel ID, owner, address), not just
 * the tiles the map has loaded: `GET /api/v1/layers/:id/features?crs=wgs84&q=`. At most 20 hits.
 */
export async function searchParcelLayers(layerIds: number[], query: string): Promise<ParcelHit[]> {
  const q = query.trim();
  if (q.length < 2) return [];
  const answers = await Promise.all(layerIds.map(async (layerId) => {
    const res = await fetch(`/api/v1/layers/${layerId}/features?crs=wgs84&limit=20&q=${encodeURIComponent(q)}`, { headers: { Accept: "application/geo+json" } });
    if (!res.ok) throw new Error(`The search failed (${res.status}); try again.`);
    const { features } = (await res.json()) as { features: HitFeature[] };
    return features.map((f): ParcelHit => {
      const p = f.properties;
      return { layerId, bbox: f.bbox, parcel: { parcelId: String(p.parcelId), owner: text(p.owner), address: text(p.address), landUse: text(p.landUse), area: num(p.area), landValue: num(p.landValue) } };
    });
  }));
  return answers.flat().slice(0, 20);
}
