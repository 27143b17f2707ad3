import { locateAtInternalStation, findStationOffset } from "./alignment-locate";
import { stationingOf, type AlignmentGeometry } from "./compute-alignment-geometry";
import { distanceAtStation, stationAtDistance } from "./station-equations";
import { formatStation, stationStyleForUnits } from "./stations";
import type { Vec2 } from "./vec2";

/**
 * Point and forward azimuth at a displayed station (station equations applied). In an overlap
 * pass the region (0 = before the first equation); see station-equations.ts.
 */
export function locateStation(geometry: AlignmentGeometry, station: number, region?: number): { point: Vec2; azimuthDeg: number } {
  const distance = distanceAtStation(stationingOf(geometry), station, region);
  const { point, azimuthDeg } = locateAtInternalStation(geometry.elements, geometry.startStation + distance);
  return { point, azimuthDeg };
}

/** Station (displayed and internal) and offset (right positive) of any point. */
export function findPointStation(
  geometry: AlignmentGeometry,
  point: Vec2,
): { station: number; displayStation: number; region: number; stationText: string; offset: number } {
  const found = findStationOffset(geometry.elements, point);
  const shown = stationAtDistance(stationingOf(geometry), found.station - geometry.startStation);
  return {
    station: found.station,
    displayStation: shown.station,
    region: shown.region,
    stationText: formatStation(shown.station, stationStyleForUnits(geometry.units)),
    offset: found.offset,
  };
}
