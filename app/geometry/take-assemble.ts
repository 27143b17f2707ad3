import { mergeOverlapRuns, type CorridorSelfOverlap, type OverlappingPieces } from "./corridor-self-overlap";
import type { Corridor, CorridorPiece } from "./corridor-types";
import { OVERLAP_WARNING_AREA, TAKE_MIN_AREA } from "./corridor-tolerances";
import { classifyTake, costTake } from "./take-costs";
import { groundCoveredAgain } from "./take-overlap";
import type { ParcelMeasure } from "./take-parcel";
import type { PreparedShape } from "./take-shapes";
import { spanStations } from "./take-span";
import type { ParcelTake, TakeParcelInput, TakeResult, TakeRules } from "./take-types";
import { roundForMessage } from "./validate";

/** A building the right-of-way hits, or that stands within the proximity distance of it. */
export interface BuildingFinding {
  building: number;
  buildingId: string;
  hit: boolean;
  /** Parcel index (−1 when none), and the parcel id it names or falls in. */
  owner: { index: number; parcelId: string | null };
  span: [number, number] | null;
}

/** A parcel's measured geometry with the right-of-way and widened pieces it was measured on. */
export interface MeasuredParcel {
  measure: ParcelMeasure;
  row: CorridorPiece[];
  wide: CorridorPiece[];
}

interface AssembleInput {
  row: Corridor;
  /** The right-of-way's and the easement's (widened) pieces that overlap each other. */
  rowPairs: OverlappingPieces[];
  widePairs: OverlappingPieces[];
  parcels: TakeParcelInput[];
  parcelShapes: PreparedShape[];
  measures: Map<number, MeasuredParcel>;
  findings: BuildingFinding[];
  rules: TakeRules;
  buildingValue: (building: number) => number;
}

const EMPTY: ParcelMeasure = { takeArea: 0, easementArea: 0, remainderArea: 0, pieceAreas: [], span: null, spanOn: "row" };

/**
 * One `ParcelTake` per parcel with a take, an easement or a displaced building, in station order;
 * classification and costs from the rules; totals and plain-language warnings.
 */
export function assembleTakeResult(a: AssembleInput): TakeResult {
  const warnings: string[] = [];
  const byParcel = new Map<number, BuildingFinding[]>();
  for (const f of a.findings) {
    if (f.owner.index >= 0) byParcel.set(f.owner.index, [...(byParcel.get(f.owner.index) ?? []), f]);
    else if (f.hit) warnings.push(`Building ${f.buildingId} is hit by the right-of-way but lies in no parcel${f.owner.parcelId ? ` (its parcel ${f.owner.parcelId} is not in the fabric)` : ""}; its value is not in the estimate.`);
  }
  const included = new Set<number>();
  for (const [i, { measure }] of a.measures) if (measure.takeArea > TAKE_MIN_AREA || measure.easementArea > TAKE_MIN_AREA) included.add(i);
  for (const [i, fs] of byParcel) if (fs.some((f) => f.hit)) included.add(i);
  const takes = [...included].map((i) => parcelTake(a, i, byParcel.get(i) ?? []));
  takes.sort((x, y) => x.stationFrom - y.stationFrom || (x.parcelId < y.parcelId ? -1 : x.parcelId > y.parcelId ? 1 : 0));
  const sumTake = takes.reduce((s, t) => s + t.takeArea, 0);
  const corridorArea = groundArea(a.row, a.rowPairs);
  if (sumTake > corridorArea + OVERLAP_WARNING_AREA) {
    warnings.push(`Parcels overlap inside the corridor: their takes add up to ${roundForMessage(sumTake - corridorArea)} square units more than the right-of-way's area.`);
  }
  const selfOverlaps = mergeOverlapRuns(a.rowPairs, a.row.pieces);
  for (const o of selfOverlaps) warnings.push(selfOverlapMessage(o));
  const withTake = takes.filter((t) => t.takeArea > TAKE_MIN_AREA);
  return {
    corridorArea,
    easementArea: a.row.easement ? Math.max(0, groundArea(a.row.easement, a.widePairs) - corridorArea) : 0,
    parcels: takes,
    totals: {
      parcelTakeArea: sumTake,
      parcelEasementArea: takes.reduce((s, t) => s + t.easementArea, 0),
      unparcelledArea: Math.max(0, corridorArea - sumTake),
      parcelsAffected: takes.length,
      fullTakes: withTake.filter((t) => t.classification === "full").length,
      partialTakes: withTake.filter((t) => t.classification === "partial").length,
      displacements: a.findings.filter((f) => f.hit).length,
      proximityImpacts: a.findings.filter((f) => !f.hit).length,
      estimatedCost: takes.reduce((s, t) => s + t.cost.total, 0),
    },
    warnings,
    corridorSelfOverlaps: selfOverlaps,
  };
}

/** The ground a corridor covers: the sum of its pieces less what overlapping pieces cover again. */
function groundArea(c: Corridor, pairs: OverlappingPieces[]): number {
  if (pairs.length === 0) return c.area;
  const overlapping = [...new Set(pairs.flatMap((p) => [p.i, p.j]))].sort((x, y) => x - y);
  return c.area - groundCoveredAgain(overlapping.map((k) => c.pieces[k]!));
}

/** Stations here are internal (start station + distance), the engine's own. */
export function selfOverlapMessage(o: CorridorSelfOverlap): string {
  const range = (r: [number, number]) => `${roundForMessage(r[0])}–${roundForMessage(r[1])}`;
  return `The right-of-way covers the same ground twice (about ${roundForMessage(o.area)} square units) between internal stations ${range(o.first)} and ${range(o.second)}: that ground is taken once, but check that the alignment is meant to come back on itself there.`;
}

function parcelTake(a: AssembleInput, i: number, found: BuildingFinding[]): ParcelTake {
  const input = a.parcels[i]!;
  const parcelArea = a.parcelShapes[i]!.area;
  const entry = a.measures.get(i);
  const m = entry?.measure ?? { ...EMPTY, remainderArea: parcelArea, pieceAreas: [parcelArea] };
  const hasTake = m.takeArea > TAKE_MIN_AREA;
  const classification = hasTake ? classifyTake(parcelArea, m.pieceAreas, a.rules) : "partial";
  const hit = found.filter((f) => f.hit);
  const span = m.span && entry ? spanStations(m.span, m.spanOn === "row" ? entry.row : entry.wide) : spanOfBuildings(hit);
  const cost = costTake(
    { parcelArea, takeArea: m.takeArea, easementArea: m.easementArea, classification, landValuePerArea: input.landValuePerArea ?? a.rules.landValuePerArea, buildingValues: hit.map((f) => a.buildingValue(f.building)) },
    a.rules,
  );
  return {
    parcelId: input.parcelId,
    owner: input.owner ?? null,
    address: input.address ?? null,
    parcelArea,
    takeArea: m.takeArea,
    easementArea: m.easementArea,
    remainderArea: hasTake ? m.remainderArea : parcelArea,
    takeFraction: parcelArea > 0 ? m.takeArea / parcelArea : 0,
    remainderPieces: m.pieceAreas.length,
    remainderPieceAreas: m.pieceAreas,
    classification,
    buildingsHit: hit.map((f) => f.buildingId).sort(),
    buildingsNear: found.filter((f) => !f.hit).map((f) => f.buildingId).sort(),
    cost,
    stationFrom: span[0]!,
    stationTo: span[1]!,
  };
}

function spanOfBuildings(hit: BuildingFinding[]): number[] {
  const spans = hit.map((f) => f.span).filter((s): s is [number, number] => s !== null);
  return spans.length > 0 ? [Math.min(...spans.map((s) => s[0])), Math.max(...spans.map((s) => s[1]))] : [0, 0];
}
