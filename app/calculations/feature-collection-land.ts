import type { PolygonCoords, TakeBuildingInput, TakeParcelInput } from "~/geometry/take-types";

type LooseFeature = { id?: unknown; geometry?: { type?: unknown; coordinates?: unknown } | null; properties?: Record<string, unknown> | null };

export interface LandProblem {
  path: string;
  message: string;
}

/**
 * Parcels from a GeoJSON FeatureCollection in the alignment's projected coordinates. The parcel ID
 * is `feature.id`, else `properties.parcelId`, else `properties.id` (the stateless API's contract).
 */
export function readParcelFeatures(features: unknown[], problems: LandProblem[]): TakeParcelInput[] {
  const seen = new Set<string>();
  return features.flatMap((raw, i): TakeParcelInput[] => {
    const f = raw as LooseFeature;
    const id = firstId(f.id, f.properties?.parcelId, f.properties?.id);
    const polygons = polygonsOf(f, `parcels.features.${i}`, problems);
    if (id === null) problems.push({ path: `parcels.features.${i}`, message: "No parcel ID: give feature.id, properties.parcelId or properties.id." });
    else if (seen.has(id)) problems.push({ path: `parcels.features.${i}`, message: `Parcel ID ${id} appears twice.` });
    if (id === null || seen.has(id) || !polygons) return [];
    seen.add(id);
    const p = f.properties ?? {};
    const value = typeof p.landValuePerArea === "number" ? p.landValuePerArea : null;
    return [{ parcelId: id, owner: textOrNull(p.owner), address: textOrNull(p.address), polygons, landValuePerArea: value }];
  });
}

/** Building footprints (optional in the stateless API); `properties.parcelId` and `properties.value` are read. */
export function readBuildingFeatures(features: unknown[], problems: LandProblem[]): TakeBuildingInput[] {
  return features.flatMap((raw, i): TakeBuildingInput[] => {
    const f = raw as LooseFeature;
    const polygons = polygonsOf(f, `buildings.features.${i}`, problems);
    if (!polygons) return [];
    const p = f.properties ?? {};
    return [{ buildingId: firstId(f.id, p.buildingId, p.id) ?? `building-${i + 1}`, parcelId: textOrNull(p.parcelId), polygons, value: typeof p.value === "number" ? p.value : null }];
  });
}

function polygonsOf(f: LooseFeature, path: string, problems: LandProblem[]): PolygonCoords[] | null {
  const g = f.geometry;
  const ok = (rings: unknown): rings is PolygonCoords =>
    Array.isArray(rings) && rings.length > 0 && rings.every((r) => Array.isArray(r) && r.length >= 4 && r.every((pt) => Array.isArray(pt) && pt.length >= 2 && pt.every((c) => typeof c === "number" && Number.isFinite(c))));
  if (g?.type === "Polygon" && ok(g.coordinates)) return [g.coordinates];
  if (g?.type === "MultiPolygon" && Array.isArray(g.coordinates) && g.coordinates.length > 0 && g.coordinates.every(ok)) return g.coordinates as PolygonCoords[];
  problems.push({ path: `${path}.geometry`, message: "Expected a Polygon or MultiPolygon with closed rings of at least four [x, y] positions." });
  return null;
}

function firstId(...candidates: unknown[]): string | null {
  for (const c of candidates) if ((typeof c === "string" && c.trim() !== "") || (typeof c === "number" && Number.isFinite(c))) return String(c).trim();
  return null;
}

function textOrNull(v: unknown): string | null {
  return typeof v === "string" ? v : null;
}
