import type { AlignmentElement } from "./alignment-types";
import { buildCorridor, buildWidened, resolvePieceOptions } from "./corridor-build";
import type { Corridor, CorridorPiece } from "./corridor-types";
import { findOverlappingPieces, type OverlappingPieces } from "./corridor-self-overlap";
import { assembleTakeResult, type BuildingFinding, type MeasuredParcel } from "./take-assemble";
import { spanStations } from "./take-span";
import { measureBuilding, findOwnerParcel, type BuildingMeasure } from "./take-buildings";
import { createKeyInterner, indexBounds, type BoundsIndex } from "./take-index";
import { pieceOverlaps, NO_OVERLAPS } from "./take-overlap";
import { measureParcel, type ParcelMeasure } from "./take-parcel";
import { requireTakeRules } from "./take-rules-check";
import { prepareShape } from "./take-shapes";
import type { CorridorInput, TakeBuildingInput, TakeParcelInput, TakeResult, TakeRules } from "./take-types";
import { BUILDING_HIT_AREA, TAKE_MIN_AREA } from "./corridor-tolerances";

/** Counts from the last `compute`, for benchmarks and tests. */
export interface TakeSessionStats {
  candidates: number;
  measured: number;
  reused: number;
}

/** Parcels and buildings held in memory with their indexes, for repeated take computations. */
export interface TakeSession {
  /** Takes for one alignment and corridor; parcels whose nearby corridor pieces did not change are reused. */
  compute(elements: AlignmentElement[], corridor: CorridorInput, rules: TakeRules): TakeResult;
  /** Forgets every cached parcel and building result (the next `compute` measures everything). */
  clear(): void;
  readonly stats: TakeSessionStats;
}

interface Cached<T> {
  key: string;
  value: T;
}

/**
 * A take session: prepares every parcel and building once (oriented rings, areas, a flatbush
 * index) and caches each parcel's measured geometry under a key made of the exact geometry of the
 * corridor pieces whose bounds meet it (and their stations relative to the first). After a PI
 * moves, only parcels near pieces that changed are measured again; results are identical to a
 * fresh computation because a reused value was computed from the same pieces.
 */
export function createTakeSession(parcels: TakeParcelInput[], buildings: TakeBuildingInput[] = []): TakeSession {
  const parcelShapes = parcels.map((p, i) => prepareShape(p.polygons, `parcels.${i}.polygons`));
  const buildingShapes = buildings.map((b, i) => prepareShape(b.polygons, `buildings.${i}.polygons`));
  const parcelIndex = indexBounds(parcelShapes.map((s) => s.bounds));
  const buildingIndex = indexBounds(buildingShapes.map((s) => s.bounds));
  const parcelById = new Map(parcels.map((p, i) => [p.parcelId, i]));
  const parcelCache: (Cached<ParcelMeasure> | undefined)[] = [];
  const buildingCache: (Cached<BuildingMeasure> | undefined)[] = [];
  const owners = new Map<number, number>();
  const interner = createKeyInterner();
  const stats: TakeSessionStats = { candidates: 0, measured: 0, reused: 0 };

  // Geometry only: spans are kept relative to the pieces, so stations can shift under a cached value.
  const keyOf = (groups: CorridorPiece[][]): string => {
    let key = String(interner.generation());
    for (const g of groups) {
      key += "|";
      for (const p of g) key += interner.id(p.key) + ",";
    }
    return key;
  };

  const ownerOf = (j: number): { index: number; parcelId: string | null } => {
    const given = buildings[j]!.parcelId;
    if (given) return { index: parcelById.get(given) ?? -1, parcelId: given };
    let index = owners.get(j);
    if (index === undefined) {
      const near = parcelIndex.search(buildingShapes[j]!.bounds);
      const k = findOwnerParcel(buildingShapes[j]!, near.map((i) => parcelShapes[i]!));
      index = k < 0 ? -1 : near[k]!;
      owners.set(j, index);
    }
    return { index, parcelId: index >= 0 ? parcels[index]!.parcelId : null };
  };

  function compute(elements: AlignmentElement[], corridor: CorridorInput, rules: TakeRules): TakeResult {
    requireTakeRules(rules);
    const row = buildCorridor(elements, corridor);
    const wide = row.easement;
    const rowHitsOf = hitsByItem(row, parcelIndex);
    const wideHitsOf = wide ? hitsByItem(wide, parcelIndex) : new Map<number, CorridorPiece[]>();
    Object.assign(stats, { candidates: 0, measured: 0, reused: 0 });
    // Ground the right-of-way (or the easement's outer line) covers twice is taken once.
    const rowPairs: OverlappingPieces[] = findOverlappingPieces(row);
    const widePairs: OverlappingPieces[] = wide ? findOverlappingPieces(wide) : [];
    const overlaps = { row: pieceOverlaps(rowPairs), wide: wide ? pieceOverlaps(widePairs) : NO_OVERLAPS };
    const measures = new Map<number, MeasuredParcel>();
    for (const i of sortedKeys(wide ? wideHitsOf : rowHitsOf)) {
      const shape = parcelShapes[i]!;
      const rowHits = rowHitsOf.get(i) ?? [];
      const wideHits = wideHitsOf.get(i) ?? [];
      stats.candidates++;
      const key = keyOf([rowHits, wideHits]);
      let cached = parcelCache[i];
      if (cached?.key === key) stats.reused++;
      else {
        cached = { key, value: measureParcel(shape, rowHits, wide ? wideHits : null, row.pieces, overlaps) };
        parcelCache[i] = cached;
        stats.measured++;
      }
      measures.set(i, { measure: cached.value, row: rowHits, wide: wideHits });
    }
    const findings = buildings.length > 0 ? findBuildings(elements, corridor, rules, row) : [];
    return assembleTakeResult({ row, rowPairs, widePairs, parcels, parcelShapes, measures, findings, rules, buildingValue: (j) => buildings[j]!.value ?? rules.buildingValue });
  }

  function findBuildings(elements: AlignmentElement[], corridor: CorridorInput, rules: TakeRules, row: Corridor): BuildingFinding[] {
    const d = rules.proximityDistance;
    const prox = d > 0 ? buildWidened(elements, corridor, d, resolvePieceOptions(corridor), "rules.proximityDistance") : row;
    const rowHitsOf = hitsByItem(row, buildingIndex);
    const proxHitsOf = d > 0 ? hitsByItem(prox, buildingIndex) : rowHitsOf;
    const found: BuildingFinding[] = [];
    for (const j of sortedKeys(proxHitsOf)) {
      const shape = buildingShapes[j]!;
      const rowHits = rowHitsOf.get(j) ?? [];
      const proxHits = proxHitsOf.get(j)!;
      const key = keyOf([rowHits, proxHits]);
      let cached = buildingCache[j];
      if (cached?.key !== key) buildingCache[j] = cached = { key, value: measureBuilding(shape, rowHits, proxHits) };
      const m = cached.value;
      const hit = m.hitArea > BUILDING_HIT_AREA;
      if (!hit && !(m.nearArea > TAKE_MIN_AREA)) continue;
      found.push({ building: j, buildingId: buildings[j]!.buildingId, hit, owner: ownerOf(j), span: m.span ? spanStations(m.span, rowHits) : null });
    }
    return found;
  }

  const clear = () => {
    parcelCache.length = 0;
    buildingCache.length = 0;
  };
  return { compute, clear, stats };
}

/**
 * For every indexed item whose bounds meet a piece's, the pieces it meets, in station order: one
 * index query per piece (the relation is symmetric, so no query per item is needed).
 */
function hitsByItem(c: Corridor, index: BoundsIndex): Map<number, CorridorPiece[]> {
  const hits = new Map<number, CorridorPiece[]>();
  for (const p of c.pieces) {
    for (const i of index.search(p.bounds)) {
      const list = hits.get(i);
      if (list) list.push(p);
      else hits.set(i, [p]);
    }
  }
  return hits;
}

function sortedKeys(m: Map<number, unknown>): number[] {
  return [...m.keys()].sort((a, b) => a - b);
}
