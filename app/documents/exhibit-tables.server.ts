import type { ParcelTake } from "~/geometry/take-types";
import type { LengthUnit } from "~/geometry/units";
import { describeArea, formatCoordinates, type ArcCourse, type TakeDescription } from "~/legal";
import { areaWords, lengthWord } from "~/legal/legal-format";
import { courseLabels } from "./exhibit-map.server";
import { drawTable } from "./pdf-table.server";

/** Where a course lies: its part and, for an excepted hole, which exception. */
function placeOf(part: number, ring: number, multiPart: boolean): string {
  const p = multiPart ? `Part ${part}` : "Take";
  return ring === 0 ? p : `${p}, exception ${ring}`;
}

/** The course table: every course as written (bearing to the second, distance to 0.001), lines and curves by label. */
export function drawCourseTable(doc: PDFKit.PDFDocument, d: TakeDescription): void {
  const u = lengthWord(d.units);
  const labels = courseLabels(d.courses);
  const multi = d.parts.length > 1;
  drawTable(doc, {
    title: "Course table (clockwise from each point of beginning)",
    columns: [
      { header: "Course", width: 46 },
      { header: "Of", width: 110 },
      { header: "Along", width: 110 },
      { header: "Bearing (chord for curves)", width: 150 },
      { header: `Distance (${u})`, width: 90, align: "right" },
    ],
    rows: d.courses.map((c, i) => [labels[i]!, placeOf(c.part, c.ring, multi), c.on === "parcel" ? "parcel line" : "new right-of-way line", c.bearing, (c.kind === "line" ? c.distance : c.chordDistance).toFixed(3)]),
  });
}

/** The curve table: radius, central angle, arc length, chord bearing and chord, turn, and tangency. */
export function drawCurveTable(doc: PDFKit.PDFDocument, d: TakeDescription): void {
  const labels = courseLabels(d.courses);
  const arcs = d.courses.map((c, i) => [c, labels[i]!] as const).filter((x): x is readonly [ArcCourse, string] => x[0].kind === "arc");
  if (arcs.length === 0) return;
  const u = lengthWord(d.units);
  drawTable(doc, {
    title: "Curve table",
    columns: [
      { header: "Curve", width: 40 },
      { header: `Radius (${u})`, width: 70, align: "right" },
      { header: "Central angle", width: 66, align: "right" },
      { header: `Arc (${u})`, width: 62, align: "right" },
      { header: "Chord bearing", width: 90 },
      { header: `Chord (${u})`, width: 62, align: "right" },
      { header: "Turn", width: 34 },
      { header: "Radial bearing", width: 82 },
    ],
    rows: arcs.map(([c, label]) => [label, c.radius.toFixed(3), c.delta, c.arcLength.toFixed(3), c.bearing, c.chordDistance.toFixed(3), c.direction, c.tangent ? "tangent" : c.radialBearing]),
  });
}

/** Areas of the parcel, the take (enclosed by the courses), the temporary easement and the remainder, in both units. */
export function drawAreaTable(doc: PDFKit.PDFDocument, d: TakeDescription, take: ParcelTake, units: LengthUnit): void {
  const a = (v: number) => describeArea(v, units);
  const words = areaWords(units);
  const row = (name: string, v: number) => [name, a(v).small.toFixed(2), a(v).large.toFixed(4)];
  drawTable(doc, {
    title: "Area table",
    columns: [
      { header: "", width: 230 },
      { header: words.small, width: 110, align: "right" },
      { header: words.large, width: 90, align: "right" },
    ],
    rows: [
      row("Parcel", take.parcelArea),
      row("Right-of-way take (enclosed by the courses)", d.area),
      row("Temporary construction easement", take.easementArea),
      row(`Remainder (${take.remainderPieces} piece${take.remainderPieces === 1 ? "" : "s"})`, take.remainderArea),
    ],
  });
}

/** Points of commencement and beginning with their coordinates and centreline position; the closure. */
export function drawBeginnings(doc: PDFKit.PDFDocument, d: TakeDescription): void {
  const u = lengthWord(d.units);
  const rows: string[][] = [];
  for (const p of d.parts) {
    const name = p.label || "Take";
    if (p.commencement) rows.push([`${name}: POC`, formatCoordinates(p.commencement.point), `${p.commencement.bearing}, ${p.commencement.distance.toFixed(3)} ${u} to the POB`]);
    const s = p.rings[0]!.start;
    const where = s.stationText ? `${Math.abs(s.offset ?? 0).toFixed(3)} ${u} ${(s.offset ?? 0) >= 0 ? "right" : "left"} of station ${s.stationText}` : "";
    rows.push([`${name}: POB`, formatCoordinates(s.point), where]);
  }
  rows.push(["Closure", `${d.closure.toFixed(4)} ${u} as computed`, `${d.roundedClosure.toFixed(4)} ${u} as written`]);
  drawTable(doc, { title: "Points of commencement (POC) and beginning (POB); closure", columns: [{ header: "Point", width: 90 }, { header: "Grid coordinates", width: 200 }, { header: "Tie / centreline", width: 216 }], rows });
}
