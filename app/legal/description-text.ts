import type { LengthUnit } from "~/geometry/units";
import type { Vec2 } from "~/geometry/vec2";
import type { Commencement } from "./beginning-point";
import { UNIT_LABELS } from "~/utils/unit-labels";
import { describeArea, formatCoordinates, formatDistance, formatPrecisionRatio } from "./legal-format";
import type { Course, RingClosure } from "./legal-types";

/** The caution every description and exhibit carries. */
export const DRAFT_CAUTION =
  "DRAFT FOR REVIEW, NOT FOR RECORDING. Prepared by Takeline from design coordinates; it is not a survey. It must be checked against the record and the ground, " +
  "revised as needed, and signed and sealed by a licensed professional land surveyor before it is used for any conveyance, filing or recording.";

/** Where a ring starts: its point of beginning on the ground and along the centreline. */
export interface RingStart {
  point: Vec2;
  /** Centreline station text and signed offset (right positive) of the point, when an alignment is known. */
  stationText?: string;
  offset?: number;
}

export interface RingDescription {
  hole: boolean;
  courses: Course[];
  /** Area enclosed by the courses, arcs included (positive, project units²). */
  area: number;
  closure: RingClosure;
  start: RingStart;
}

export interface PartDescription {
  /** "Part 1", "Part 2", … when the take is in more than one piece, else "". */
  label: string;
  commencement: Commencement | null;
  rings: RingDescription[];
  /** The outline's area less its holes. */
  area: number;
}

export interface DescriptionHeader {
  parcelId: string;
  owner: string | null;
  projectName: string;
  alternativeName: string;
  crsName: string | null;
  units: LengthUnit;
  /** "full" adds a note that the remnant is not in this description. */
  classification?: "partial" | "full";
}

/** The whole description as text: caption, basis of bearings, each part's courses, areas, closure and the caution. */
export function writeDescriptionText(header: DescriptionHeader, parts: PartDescription[], total: number, closure: RingClosure): string {
  const u = header.units;
  const owner = header.owner ? ` (${header.owner})` : "";
  const lines = [
    DRAFT_CAUTION,
    "",
    `RIGHT-OF-WAY TAKE FROM PARCEL ${header.parcelId}${owner}`,
    `Project: ${header.projectName}. Alternative: ${header.alternativeName}.`,
    "",
    `A tract of land out of parcel ${header.parcelId}, lying within the new right-of-way of the ${header.alternativeName} alternative${parts.length > 1 ? `, in ${parts.length} parts` : ""}, described as follows. ` +
      `Bearings are grid bearings referred to grid north${header.crsName ? ` of ${header.crsName}` : ""}; distances are grid distances in ${UNIT_LABELS[u]}; coordinates are grid coordinates.`,
  ];
  for (const part of parts) lines.push("", ...partLines(part, u));
  if (parts.length > 1 || parts.some((p) => p.rings.length > 1)) lines.push("", `The take in all contains ${describeArea(total, u).text}, more or less.`);
  if (header.classification === "full") lines.push("", "The remainder of the parcel is below the project's uneconomic-remnant threshold (a full take); the remnant is not included in this description.");
  lines.push(
    "",
    `Closure: the courses as computed close on the point of beginning within ${formatDistance(closure.closure, u, 4)}; as written (bearings to the second, distances to 0.001) within ` +
      `${formatDistance(closure.roundedClosure, u, 4)}, ${formatPrecisionRatio(closure.perimeter, closure.roundedClosure)}.`,
  );
  return lines.join("\n");
}

function partLines(part: PartDescription, u: LengthUnit): string[] {
  const out: string[] = part.label ? [`${part.label.toUpperCase()}:`] : [];
  const [outline, ...holes] = part.rings;
  if (!outline) return out;
  const pob = outline.start;
  const where = `${formatCoordinates(pob.point)}${pob.stationText ? `, ${formatDistance(Math.abs(pob.offset ?? 0), u)} ${(pob.offset ?? 0) >= 0 ? "right" : "left"} of centreline station ${pob.stationText}` : ""}`;
  const c = part.commencement;
  if (c) {
    out.push(`COMMENCING at a corner of said parcel at ${formatCoordinates(c.point)};`);
    out.push(`THENCE${c.alongParcelLine ? " along the line of said parcel," : ""} ${c.bearing}, a distance of ${formatDistance(c.distance, u)} to the POINT OF BEGINNING, at ${where};`);
  } else out.push(`BEGINNING at a corner of said parcel, the POINT OF BEGINNING, at ${where};`);
  out.push(...courseLines(outline.courses, "the POINT OF BEGINNING"));
  out.push(`containing ${describeArea(outline.area, u).text}, more or less.`);
  holes.forEach((h, i) => {
    out.push(`EXCEPTING THEREFROM${holes.length > 1 ? ` (exception ${i + 1})` : ""} the land within the following courses: BEGINNING at ${formatCoordinates(h.start.point)};`);
    out.push(...courseLines(h.courses, "the point of beginning of this exception"));
    out.push(`containing ${describeArea(h.area, u).text}, more or less.`);
  });
  if (holes.length > 0) out.push(`Leaving ${describeArea(part.area, u).text}, more or less${part.label ? ` in ${part.label}` : ""}.`);
  return out;
}

function courseLines(courses: Course[], back: string): string[] {
  return courses.map((c, i) => `THENCE ${c.text}${i === courses.length - 1 ? ` to ${back},` : ";"}`);
}
