import type { AlignmentElement } from "~/geometry/alignment-types";
import { locateAtInternalStation } from "~/geometry/alignment-locate";
import { unitVectorFromAzimuthDeg } from "~/geometry/bearings";
import { densifyElements } from "~/geometry/densify";
import { roundDown125, type MapFrame } from "./map-frame";
import { FONT } from "./pdf-base.server";
import { drawPolyline } from "./pdf-map-draw.server";

/**
 * Draws the centreline (dash-dot) with a tick every fifth of the label interval and a station
 * label at each labelled tick, where they fall inside the frame. The label interval is a 1-2-5
 * number of at least 90 pt on the page. Ticks are at internal stations; labels show the displayed
 * station (station equations applied) through `stationText`.
 */
export function drawCentreline(doc: PDFKit.PDFDocument, frame: MapFrame, elements: AlignmentElement[], stationText: (s: number) => string, colour = "#212529"): void {
  drawPolyline(doc, frame, densifyElements(elements, { chordTolerance: 0.25 / frame.pointsPerUnit }), { stroke: colour, lineWidth: 0.8, dash: [9, 3] });
  const label = 2 * roundDown125(90 / frame.pointsPerUnit);
  const tick = label / 5;
  const first = elements[0]!.startStation;
  const last = elements[elements.length - 1]!.endStation;
  const [x0, y0, x1, y1] = frame.world;
  doc.save().lineWidth(0.6).strokeColor(colour).fillColor(colour).font(FONT.regular).fontSize(6.5);
  for (let s = Math.ceil(first / tick) * tick; s <= last + 1e-9; s += tick) {
    const at = locateAtInternalStation(elements, s);
    const [px, py] = at.point;
    if (px < x0 || px > x1 || py < y0 || py > y1) continue;
    const labelled = Math.abs(s / label - Math.round(s / label)) < 1e-9;
    const half = labelled ? 6 : 3.5;
    // Page normal of the line: the azimuth's right-hand perpendicular, y flipped for the page.
    const [ux, uy] = unitVectorFromAzimuthDeg(at.azimuthDeg + 90);
    const [cx, cy] = frame.toPage(at.point);
    doc.moveTo(cx - ux * half, cy + uy * half).lineTo(cx + ux * half, cy - uy * half).stroke();
    // Labels stay horizontal, just beyond the tick's right-hand end (right of the line looking ahead).
    if (labelled) doc.text(stationText(s), cx + ux * (half + 2) - (ux < 0 ? 34 : 0), cy - uy * (half + 2) - 3, { width: 34, align: ux < 0 ? "right" : "left", lineBreak: false });
  }
  doc.restore();
}
