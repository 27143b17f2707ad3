import type { AlignmentElement } from "~/geometry/alignment-types";
import { findStationOffset } from "~/geometry/alignment-locate";
import { buildCorridor } from "~/geometry/corridor-build";
import { TAKE_MIN_AREA } from "~/geometry/corridor-tolerances";
import { formatStation, stationStyleForUnits } from "~/geometry/stations";
import type { CorridorInput, TakeParcelInput } from "~/geometry/take-types";
import type { LengthUnit } from "~/geometry/units";
import { findCommencement, startAtBeginning } from "./beginning-point";
import { buildCourses } from "./courses";
import { DRAFT_CAUTION, writeDescriptionText, type DescriptionHeader, type PartDescription, type RingDescription } from "./description-text";
import { describeArea } from "./legal-format";
import type { BoundarySegment, Course } from "./legal-types";
import { measureClosure } from "./ring-closure";
import { computeRingArea } from "./ring-area";
import { computeTakeBoundary, TOPOLOGY_CHORDS } from "./take-boundary";

/** What a take's description is made from: the alternative's elements and widths, the parcel, and the caption. */
export interface DescribeTakeInput extends Omit<DescriptionHeader, "parcelId" | "owner"> {
  elements: AlignmentElement[];
  corridor: CorridorInput;
  parcel: TakeParcelInput;
  /** Displayed station text for an internal station (station equations applied); default plain stationing. */
  stationText?: (internalStation: number) => string;
  /** How curves are chorded to find the topology (see TOPOLOGY_CHORDS). */
  chords?: typeof TOPOLOGY_CHORDS;
}

/** A take's legal description: the API's `{text, courses, area, closure}` and the parts it is built from. */
export interface TakeDescription {
  parcelId: string;
  owner: string | null;
  units: LengthUnit;
  text: string;
  caution: string;
  /** Every course of every part and ring, in the order written. */
  courses: Course[];
  parts: PartDescription[];
  /** Area enclosed by the courses, arcs included, holes excepted (project units²), and in m²/ha or ft²/acres. */
  area: number;
  areas: { small: number; smallUnit: string; large: number; largeUnit: string };
  /** Largest misclosure of any ring at full precision, and as written; the summed perimeter. */
  closure: number;
  roundedClosure: number;
  perimeter: number;
}

/**
 * Writes the metes-and-bounds description of the right-of-way take from one parcel: the exact
 * take boundary (right-of-way curves as the corridor's own arcs), each part commenced from a
 * parcel corner and begun where the new right-of-way line meets the parcel line, courses walked
 * clockwise, areas enclosed by the courses. Returns null when the right-of-way takes nothing
 * from the parcel. Throws GeometryInputError for widths the corridor refuses.
 */
export function describeTake(input: DescribeTakeInput): TakeDescription | null {
  const corridor = buildCorridor(input.elements, { left: input.corridor.left, right: input.corridor.right, ...(input.corridor.ranges ? { ranges: input.corridor.ranges } : {}) });
  const boundary = computeTakeBoundary(corridor, input.parcel.polygons, input.chords ?? TOPOLOGY_CHORDS);
  const station = input.stationText ?? ((s: number) => formatStation(s, stationStyleForUnits(input.units)));
  const solid = boundary.filter((part) => computeRingArea(part.rings[0]!.segments) < -TAKE_MIN_AREA);
  if (solid.length === 0) return null;
  const parts = solid.map((part, k): PartDescription => {
    const rings = part.rings.map((ring, r) => describeRing(startAtBeginning(ring.segments), k + 1, r, ring.hole, input, station));
    const outline = rings[0]!;
    return {
      label: solid.length > 1 ? `Part ${k + 1}` : "",
      commencement: findCommencement(outline.start.point, input.parcel.polygons),
      rings,
      area: rings.reduce((s, ring) => s + (ring.hole ? -ring.area : ring.area), 0),
    };
  });
  const rings = parts.flatMap((p) => p.rings);
  const area = parts.reduce((s, p) => s + p.area, 0);
  const closure = { closure: Math.max(...rings.map((r) => r.closure.closure)), roundedClosure: Math.max(...rings.map((r) => r.closure.roundedClosure)), perimeter: rings.reduce((s, r) => s + r.closure.perimeter, 0) };
  const header: DescriptionHeader = { ...input, parcelId: input.parcel.parcelId, owner: input.parcel.owner ?? null };
  const areas = describeArea(area, input.units);
  return {
    parcelId: header.parcelId,
    owner: header.owner,
    units: input.units,
    text: writeDescriptionText(header, parts, area, closure),
    caution: DRAFT_CAUTION,
    courses: rings.flatMap((r) => r.courses),
    parts,
    area,
    areas: { small: areas.small, smallUnit: areas.smallUnit, large: areas.large, largeUnit: areas.largeUnit },
    ...closure,
  };
}

function describeRing(segments: BoundarySegment[], part: number, ring: number, hole: boolean, input: DescribeTakeInput, station: (s: number) => string): RingDescription {
  const courses = buildCourses(segments, part, ring, input.units);
  const point = segments[0]!.from;
  const located = hole ? null : findStationOffset(input.elements, point);
  return {
    hole,
    courses,
    area: Math.abs(computeRingArea(segments)),
    closure: measureClosure(courses),
    start: located ? { point, stationText: station(located.station), offset: located.offset } : { point },
  };
}
