import { convertArea, type LengthUnit } from "../crs/units";
import { indexForOverlaps, overlapsOf, type OverlapPair } from "../geometry/overlaps";
import { yieldToEventLoop } from "./chunked.server";
import type { ProgressSink } from "./progress";
import type { ParcelOverlap, UploadedFeature } from "./upload-types";

/**
 * Overlaps at or below this are not reported: slivers of a few square decimetres are what
 * digitising the same line twice leaves (common practice; the issue asks for about 0.5 m²).
 */
export const OVERLAP_MIN_M2 = 0.5;
/** At most this many overlaps are listed (largest first); the count covers them all. */
export const MAX_LISTED_OVERLAPS = 1000;
const CHUNK = 5000;

/**
 * Pairs of parcels whose interiors overlap by more than OVERLAP_MIN_M2, found in the working
 * CRS (`crsUnit`) and reported in `areaUnit`², largest first, with a summary warning. Candidates
 * come from a flatbush index of the parcels' bounds; areas from exact clipping (overlaps.ts).
 */
export async function findParcelOverlaps(features: UploadedFeature[], crsUnit: LengthUnit, areaUnit: LengthUnit, report?: ProgressSink): Promise<{ overlaps: ParcelOverlap[]; overlapCount: number; warning: string | null }> {
  const index = indexForOverlaps(features.map((f) => f.geometry));
  const minArea = convertArea(OVERLAP_MIN_M2, "m", crsUnit);
  const pairs: OverlapPair[] = [];
  for (let start = 0; start < features.length; start += CHUNK) {
    const end = Math.min(features.length, start + CHUNK);
    for (let i = start; i < end; i++) for (const p of overlapsOf(index, i, minArea)) pairs.push(p);
    report?.({ stage: "overlaps", done: end, total: features.length });
    if (end < features.length) await yieldToEventLoop();
  }
  pairs.sort((p, q) => q.area - p.area);
  const overlaps = pairs.slice(0, MAX_LISTED_OVERLAPS).map((p): ParcelOverlap => {
    const a = features[p.a]!, b = features[p.b]!;
    return { rows: [a.sourceRow, b.sourceRow], parcelIds: [a.parcelId, b.parcelId], area: convertArea(p.area, crsUnit, areaUnit) };
  });
  if (pairs.length === 0) return { overlaps, overlapCount: 0, warning: null };
  const top = overlaps[0]!;
  const unit = areaUnit === "m" ? "m²" : `${areaUnit}²`;
  const warning = `${pairs.length.toLocaleString("en-US")} pair${pairs.length === 1 ? "" : "s"} of parcels overlap by more than ${OVERLAP_MIN_M2} m² (largest: rows ${top.rows[0]} and ${top.rows[1]}, ${top.area.toFixed(2)} ${unit}); check the fabric for doubled or misplaced parcels.`;
  return { overlaps, overlapCount: pairs.length, warning };
}
