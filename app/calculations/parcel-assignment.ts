/** What assignment needs to know of a parcel take: its ID and the stations it spans (internal stations). */
export interface StationedParcel {
  parcelId: string;
  stationFrom: number;
  stationTo: number;
}

export interface Assignment {
  parcelId: string;
  agent: string;
}

/** Station order: by first station, then last station, then parcel ID (numbers inside IDs compared as numbers). */
export function compareStationOrder(a: StationedParcel, b: StationedParcel): number {
  return a.stationFrom - b.stationFrom || a.stationTo - b.stationTo || a.parcelId.localeCompare(b.parcelId, "en", { numeric: true });
}

/**
 * Splits parcels evenly by count among agents, in station order, in contiguous runs: the first
 * agent gets the first run along the line, and so on, so each agent works one stretch of road.
 * Run lengths differ by at most one; the longer runs go to the first agents.
 * Throws when there is no agent to split among.
 */
export function splitEvenly(parcels: readonly StationedParcel[], agents: readonly string[]): Assignment[] {
  if (agents.length === 0) throw new RangeError("splitEvenly: agents must hold at least one agent");
  const ordered = [...parcels].sort(compareStationOrder);
  const base = Math.floor(ordered.length / agents.length);
  const extra = ordered.length % agents.length;
  const out: Assignment[] = [];
  let next = 0;
  agents.forEach((agent, i) => {
    const count = base + (i < extra ? 1 : 0);
    for (const p of ordered.slice(next, next + count)) out.push({ parcelId: p.parcelId, agent });
    next += count;
  });
  return out;
}

/**
 * The parcels whose take overlaps the station range [from, to] (either order; a take touching an
 * end counts), in station order.
 */
export function selectByStationRange<T extends StationedParcel>(parcels: readonly T[], from: number, to: number): T[] {
  if (!Number.isFinite(from) || !Number.isFinite(to)) throw new RangeError("selectByStationRange: from and to must be finite stations");
  const lo = Math.min(from, to);
  const hi = Math.max(from, to);
  return parcels.filter((p) => p.stationFrom <= hi && p.stationTo >= lo).sort(compareStationOrder);
}
