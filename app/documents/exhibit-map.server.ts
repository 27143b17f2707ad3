import { boundsOverlap } from "~/geometry/corridor-pieces";
import { buildCorridor } from "~/geometry/corridor-build";
import { corridorOutline, easementOutline } from "~/geometry/corridor-outline";
import type { Bounds } from "~/geometry/corridor-types";
import type { PolygonCoords, TakeParcelInput } from "~/geometry/take-types";
import type { Vec2 } from "~/geometry/vec2";
import { boundaryToPolygons, segmentsOfCourses, type Course, type TakeDescription } from "~/legal";
import { lengthWord } from "~/legal/legal-format";
import { fitMapFrame, scaleBarLength, type Box, type MapFrame } from "./map-frame";
import { FONT } from "./pdf-base.server";
import { drawCentreline } from "./pdf-centreline.server";
import { drawNorthArrow, drawPolygons, drawScaleBar, withinFrame } from "./pdf-map-draw.server";
import type { AlternativeSources } from "./take-sources.server";

/** Exhibit colours (Takeline's own): take, remainder, easement, lines. */
export const EXHIBIT_STYLE = {
  take: { fill: "#e8590c", fillOpacity: 0.55, stroke: "#a63c06", lineWidth: 0.9 },
  remainder: { fill: "#d3e4cd", fillOpacity: 1, stroke: "#212529", lineWidth: 1.2 },
  easement: { fill: "#4c9be8", fillOpacity: 0.45 },
  neighbour: { stroke: "#adb5bd", lineWidth: 0.4 },
  rightOfWay: { stroke: "#495057", lineWidth: 0.7, dash: [4, 2] as [number, number] },
} as const;

/** Course labels on the drawing and in the tables: L1, L2, … for lines and C1, C2, … for curves, in the order written. */
export function courseLabels(courses: Course[]): string[] {
  let [l, c] = [0, 0];
  return courses.map((k) => (k.kind === "line" ? `L${++l}` : `C${++c}`));
}

/**
 * The exhibit's drawing in `box`: neighbouring parcels, the parcel shaded as remainder, the
 * temporary easement inside it, the take, the right-of-way lines, the centreline with stations,
 * POC/POB and course labels, a north arrow and a scale bar. Returns the frame used.
 */
export function drawExhibitMap(doc: PDFKit.PDFDocument, box: Box, sources: AlternativeSources, parcel: TakeParcelInput, description: TakeDescription): MapFrame {
  const frame = fitMapFrame(exhibitWindow(parcel, description), box, sources.units);
  const { elements } = sources.geometry;
  const corridor = buildCorridor(elements, sources.alternative.corridor);
  const take = boundaryToPolygons(description.parts.map((p) => ({ rings: p.rings.map((r) => ({ hole: r.hole, segments: segmentsOfCourses(r.courses) })) })), 0.25 / frame.pointsPerUnit);
  withinFrame(doc, frame, () => {
    for (const other of sources.parcels.values()) {
      if (other.parcelId !== parcel.parcelId && boundsOverlap(boundsOfPolygons(other.polygons), frame.world)) drawPolygons(doc, frame, other.polygons, EXHIBIT_STYLE.neighbour);
    }
    drawPolygons(doc, frame, parcel.polygons, EXHIBIT_STYLE.remainder);
    if (corridor.easement) clipTo(doc, frame, parcel.polygons, () => drawPolygons(doc, frame, easementOutline(corridor, 0.25 / frame.pointsPerUnit), EXHIBIT_STYLE.easement));
    drawPolygons(doc, frame, take, EXHIBIT_STYLE.take);
    drawPolygons(doc, frame, [corridorOutline(corridor, 0.25 / frame.pointsPerUnit)], EXHIBIT_STYLE.rightOfWay);
    drawCentreline(doc, frame, elements, sources.stationText);
    labelCourses(doc, frame, description.courses);
    for (const part of description.parts) {
      if (part.commencement) marker(doc, frame, part.commencement.point, "POC", "above");
      marker(doc, frame, part.rings[0]!.start.point, part.label ? `POB ${part.label.replace("Part ", "")}` : "POB", "below");
    }
  });
  drawNorthArrow(doc, box.x + box.width - 22, box.y + 10);
  doc.save().rect(box.x + 6, box.y + box.height - 34, 170, 28).fillOpacity(0.85).fill("#ffffff").restore();
  drawScaleBar(doc, frame, scaleBarLength(frame), lengthWord(sources.units), box.x + 14, box.y + box.height - 30);
  return frame;
}

function clipTo(doc: PDFKit.PDFDocument, frame: MapFrame, polygons: PolygonCoords[], draw: () => void): void {
  doc.save();
  for (const rings of polygons) {
    for (const ring of rings) {
      const pts = ring.map(([x, y]) => frame.toPage([x!, y!]));
      doc.moveTo(pts[0]![0], pts[0]![1]);
      for (const [x, y] of pts.slice(1)) doc.lineTo(x, y);
      doc.closePath();
    }
  }
  doc.clip("even-odd");
  draw();
  doc.restore();
}

function labelCourses(doc: PDFKit.PDFDocument, frame: MapFrame, courses: Course[]): void {
  const labels = courseLabels(courses);
  doc.save().font(FONT.bold).fontSize(6.5).fillColor("#7a2d05");
  courses.forEach((c, i) => {
    const [x, y] = frame.toPage(midpoint(c));
    doc.text(labels[i]!, x - 10, y - 3.5, { width: 20, align: "center", lineBreak: false });
  });
  doc.restore();
}

/** The middle of a course: of the chord for a line, on the arc for a curve. */
function midpoint(c: Course): Vec2 {
  if (c.kind === "line") return [(c.from[0] + c.to[0]) / 2, (c.from[1] + c.to[1]) / 2];
  const a0 = Math.atan2(c.from[1] - c.center[1], c.from[0] - c.center[0]);
  const half = ((c.direction === "left" ? 1 : -1) * (c.deltaDeg * Math.PI)) / 360;
  return [c.center[0] + c.radius * Math.cos(a0 + half), c.center[1] + c.radius * Math.sin(a0 + half)];
}

function marker(doc: PDFKit.PDFDocument, frame: MapFrame, p: Vec2, text: string, place: "above" | "below"): void {
  const [x, y] = frame.toPage(p);
  doc.save().lineWidth(0.8).circle(x, y, 2.5).fillAndStroke("#ffffff", "#212529");
  doc.font(FONT.bold).fontSize(7).fillColor("#212529").text(text, x + 4, place === "above" ? y - 11 : y + 3, { lineBreak: false });
  doc.restore();
}

/**
 * What the drawing shows: the whole parcel, unless the take is small beside it (the parcel's box
 * over six times the take's box with 40 % around it), then the take with that margin.
 */
function exhibitWindow(parcel: TakeParcelInput, description: TakeDescription): Bounds {
  const whole = boundsOfPolygons(parcel.polygons);
  const ends = description.courses.flatMap((c) => [c.from, c.to]);
  const t: Bounds = [Math.min(...ends.map((p) => p[0])), Math.min(...ends.map((p) => p[1])), Math.max(...ends.map((p) => p[0])), Math.max(...ends.map((p) => p[1]))];
  const pad = 0.4 * Math.max(t[2] - t[0], t[3] - t[1]);
  const near: Bounds = [t[0] - pad, t[1] - pad, t[2] + pad, t[3] + pad];
  const area = (b: Bounds) => (b[2] - b[0]) * (b[3] - b[1]);
  return area(whole) > 6 * area(near) ? near : whole;
}

/** Bounds of (Multi)Polygon coordinates. */
export function boundsOfPolygons(polygons: PolygonCoords[]): Bounds {
  const b: Bounds = [Infinity, Infinity, -Infinity, -Infinity];
  for (const rings of polygons) for (const ring of rings) for (const [x, y] of ring) [b[0], b[1], b[2], b[3]] = [Math.min(b[0], x!), Math.min(b[1], y!), Math.max(b[2], x!), Math.max(b[3], y!)];
  return b;
}
