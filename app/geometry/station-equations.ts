import { GeometryInputError } from "./errors";
import { requireFinite } from "./validate";

/**
 * Station equations ("back = ahead"): at the point whose back station is `back`, stationing
 * continues from `ahead`. ahead > back leaves a gap (those stations do not exist), ahead < back an
 * overlap (those stations exist twice and need a region to resolve). Mahun OASL, Curves A.2.
 */
export interface StationEquation {
  back: number;
  ahead: number;
}

/** A stretch of continuous stationing: from `startDistance` along the line, station = startStation + (d − startDistance). */
export interface StationRegion {
  index: number;
  startDistance: number;
  endDistance: number;
  startStation: number;
}

/** Continuous stationing of a line of given length, split into regions by equations. */
export interface Stationing {
  regions: StationRegion[];
  length: number;
}

/**
 * Builds the regions for a line starting at `startStation` with `length` (same units). Each
 * equation must fall inside the line, after the previous one. Throws `out_of_range` otherwise.
 */
export function createStationing(startStation: number, length: number, equations: StationEquation[] = []): Stationing {
  requireFinite(startStation, "startStation");
  const regions: StationRegion[] = [];
  let startDistance = 0;
  let regionStart = startStation;
  equations.forEach((eq, i) => {
    const back = requireFinite(eq.back, `stationEquations.${i}.back`);
    const ahead = requireFinite(eq.ahead, `stationEquations.${i}.ahead`);
    const at = startDistance + (back - regionStart);
    if (!(at > startDistance) || at > length) {
      throw new GeometryInputError(
        "out_of_range",
        `station equation ${i + 1} (back ${back}) does not fall on the alignment after the previous one`,
        { field: `stationEquations.${i}.back` },
      );
    }
    regions.push({ index: i, startDistance, endDistance: at, startStation: regionStart });
    startDistance = at;
    regionStart = ahead;
  });
  regions.push({ index: equations.length, startDistance, endDistance: length, startStation: regionStart });
  return { regions, length };
}

/** Displayed station and region at a distance along the line (the ahead region wins at an equation). */
export function stationAtDistance(stationing: Stationing, distance: number): { station: number; region: number } {
  const d = requireFinite(distance, "distance");
  const regions = stationing.regions;
  let found = regions[0]!;
  for (const r of regions) if (d >= r.startDistance) found = r;
  return { station: found.startStation + (d - found.startDistance), region: found.index };
}

/**
 * Distance along the line of a displayed station. In an overlap the station exists in two
 * regions: pass `region` (its index, 0 = before the first equation) or get `ambiguous_station`.
 * A station in a gap or off the line throws `out_of_range`.
 */
export function distanceAtStation(stationing: Stationing, station: number, region?: number): number {
  const s = requireFinite(station, "station");
  const hits = stationing.regions.filter(
    (r) => (region === undefined || r.index === region) && s >= r.startStation && s <= r.startStation + (r.endDistance - r.startDistance),
  );
  if (hits.length === 0) {
    const where = region === undefined ? "" : ` in region ${region}`;
    throw new GeometryInputError("out_of_range", `station ${s} is not on the alignment${where}`, { field: "station" });
  }
  const distinct = hits.filter((h, i) => i === 0 || h.startDistance + (s - h.startStation) !== hits[0]!.startDistance + (s - hits[0]!.startStation));
  if (distinct.length > 1 && region === undefined) {
    throw new GeometryInputError("ambiguous_station", `station ${s} occurs ${distinct.length} times (station equation overlap); give a region`, {
      field: "region",
      regions: distinct.map((h) => h.index),
    });
  }
  const h = hits[0]!;
  return h.startDistance + (s - h.startStation);
}
