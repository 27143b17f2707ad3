import { computeAlignmentGeometry, stationingOf, type AlignmentGeometry } from "~/geometry/compute-alignment-geometry";
import { buildCorridor } from "~/geometry/corridor-build";
import { stationAtDistance } from "~/geometry/station-equations";
import { formatStation, stationStyleForUnits } from "~/geometry/stations";
import type { ParcelTake, PolygonCoords, TakeParcelInput } from "~/geometry/take-types";
import type { LengthUnit } from "~/geometry/units";
import { boundaryToPolygons, computeTakeBoundary, describeTake, type TakeDescription } from "~/legal";
import { landSessionFor, readImpacts, type StoredImpacts } from "~/models/alternative-impacts.server";
import type { Alternative } from "~/models/alternatives.server";
import type { Project } from "~/models/projects.server";

/** Everything the documents of one alternative are drawn from: its computed alignment, stored impacts and the project's parcels. */
export interface AlternativeSources {
  alternative: Alternative;
  project: Project;
  units: LengthUnit;
  geometry: AlignmentGeometry;
  impacts: StoredImpacts;
  parcels: Map<string, TakeParcelInput>;
  /** Displayed station text (equations applied) of an internal station. */
  stationText: (internalStation: number) => string;
}

/** Reads an alternative's sources; the impacts come from storage when current (see readImpacts). */
export function readAlternativeSources(alternative: Alternative, project: Project): AlternativeSources {
  const impacts = readImpacts(alternative, project);
  const { land } = landSessionFor(project);
  const geometry = computeAlignmentGeometry(alternative.alignment);
  return { alternative, project, units: project.units as LengthUnit, geometry, impacts, parcels: new Map(land.parcels.map((p) => [p.parcelId, p])), stationText: stationTextOf(geometry) };
}

/** Station text as the alignment shows it: internal station → displayed station (equations) → "1+234.567" or "12+34.56". */
export function stationTextOf(geometry: AlignmentGeometry): (internalStation: number) => string {
  const stationing = stationingOf(geometry);
  const style = stationStyleForUnits(geometry.units);
  return (s) => formatStation(stationAtDistance(stationing, s - geometry.startStation).station, style);
}

/** The parcel's take and geometry, or undefined when the alternative takes no right-of-way from it. */
function findParcelTake(sources: AlternativeSources, parcelId: string): { take: ParcelTake; parcel: TakeParcelInput } | undefined {
  const take = sources.impacts.parcels.find((p) => p.parcelId === parcelId);
  const parcel = sources.parcels.get(parcelId);
  return take && parcel && take.takeArea > 0 ? { take, parcel } : undefined;
}

/** The parcel's take, geometry and legal description, or undefined when the alternative takes no right-of-way from it. */
export function describedParcelTake(sources: AlternativeSources, parcelId: string): { take: ParcelTake; parcel: TakeParcelInput; description: TakeDescription } | undefined {
  const found = findParcelTake(sources, parcelId);
  const description = found ? describeParcelTake(sources, found.take, found.parcel) : null;
  return found && description ? { ...found, description } : undefined;
}

/** The legal description of one parcel's take (null when the right-of-way takes none of it). */
function describeParcelTake(sources: AlternativeSources, take: ParcelTake, parcel: TakeParcelInput): TakeDescription | null {
  return describeTake({
    elements: sources.geometry.elements,
    corridor: sources.alternative.corridor,
    parcel,
    units: sources.units,
    crsName: sources.project.crs,
    projectName: sources.project.name,
    alternativeName: sources.alternative.name,
    classification: take.classification,
    stationText: sources.stationText,
  });
}

/** Each taken parcel's take polygon (MultiPolygon coordinates, working CRS) with the exact take area, for the geo exports. */
export function readTakeGeometries(sources: AlternativeSources): Map<string, PolygonCoords[]> {
  const { left, right, ranges } = sources.alternative.corridor;
  const corridor = buildCorridor(sources.geometry.elements, { left, right, ...(ranges ? { ranges } : {}) });
  const out = new Map<string, PolygonCoords[]>();
  for (const take of sources.impacts.parcels) {
    const parcel = sources.parcels.get(take.parcelId);
    if (!parcel || !(take.takeArea > 0)) continue;
    out.set(take.parcelId, boundaryToPolygons(computeTakeBoundary(corridor, parcel.polygons)));
  }
  return out;
}
