import { computeAlignmentGeometry } from "~/geometry/compute-alignment-geometry";
import { buildCorridor } from "~/geometry/corridor-build";
import { boundsOverlap } from "~/geometry/corridor-pieces";
import { corridorOutline } from "~/geometry/corridor-outline";
import type { Bounds } from "~/geometry/corridor-types";
import type { PolygonCoords, TakeParcelInput } from "~/geometry/take-types";
import type { LengthUnit } from "~/geometry/units";
import { lengthWord } from "~/legal/legal-format";
import type { Alternative } from "~/models/alternatives.server";
import { boundsOfPolygons } from "./exhibit-map.server";
import { fitMapFrame, scaleBarLength, type Box } from "./map-frame";
import { FONT } from "./pdf-base.server";
import { drawCentreline } from "./pdf-centreline.server";
import { drawNorthArrow, drawPolygons, drawScaleBar, withinFrame } from "./pdf-map-draw.server";
import { stationTextOf } from "./take-sources.server";

/** Alternatives with the parcels they take, for the report's map. */
export interface ReportMapInput {
  alternatives: Alternative[];
  taken: Map<number, Set<string>>;
  parcels: TakeParcelInput[];
  units: LengthUnit;
}

/**
 * The report's map figure in vector: every parcel in the window (thin grey, the ones any
 * alternative takes from tinted), each alternative's right-of-way in its own colour with its
 * centreline and stations, a legend, a north arrow and a scale bar.
 */
export function drawReportMap(doc: PDFKit.PDFDocument, box: Box, input: ReportMapInput): void {
  const drawn = input.alternatives.map((a) => {
    const geometry = computeAlignmentGeometry(a.alignment);
    const outline = corridorOutline(buildCorridor(geometry.elements, a.corridor), 0.05);
    return { a, geometry, outline };
  });
  const world = drawn.map((d) => boundsOfPolygons([d.outline])).reduce<Bounds>((u, b) => [Math.min(u[0], b[0]), Math.min(u[1], b[1]), Math.max(u[2], b[2]), Math.max(u[3], b[3])], [Infinity, Infinity, -Infinity, -Infinity]);
  const frame = fitMapFrame(Number.isFinite(world[0]) ? world : [0, 0, 1, 1], box, input.units, 0.06);
  const anyTaken = new Set([...input.taken.values()].flatMap((s) => [...s]));
  withinFrame(doc, frame, () => {
    const inView = input.parcels.filter((p) => boundsOverlap(boundsOfPolygons(p.polygons), frame.world));
    drawPolygons(doc, frame, inView.filter((p) => !anyTaken.has(p.parcelId)).flatMap((p) => p.polygons), { stroke: "#adb5bd", lineWidth: 0.3 });
    drawPolygons(doc, frame, inView.filter((p) => anyTaken.has(p.parcelId)).flatMap((p) => p.polygons) as PolygonCoords[], { fill: "#fff3bf", stroke: "#868e96", lineWidth: 0.4 });
    for (const d of drawn) {
      drawPolygons(doc, frame, [d.outline], { fill: d.a.colour, fillOpacity: 0.35, stroke: d.a.colour, lineWidth: 0.8 });
      drawCentreline(doc, frame, d.geometry.elements, stationTextOf(d.geometry), d.a.colour);
    }
  });
  drawNorthArrow(doc, box.x + box.width - 22, box.y + 10);
  doc.save().rect(box.x + 6, box.y + box.height - 34, 170, 28).fillOpacity(0.85).fill("#ffffff").restore();
  drawScaleBar(doc, frame, scaleBarLength(frame), lengthWord(input.units), box.x + 14, box.y + box.height - 30);
  let x = box.x;
  const y = box.y + box.height + 6;
  for (const d of drawn) {
    doc.save().rect(x, y, 14, 8).fillOpacity(0.6).fillAndStroke(d.a.colour, d.a.colour).restore();
    doc.font(FONT.regular).fontSize(7.5).fillColor("#212529").text(d.a.name, x + 18, y, { lineBreak: false });
    x += 18 + doc.widthOfString(d.a.name) + 16;
  }
  doc.save().rect(x, y, 14, 8).fillAndStroke("#fff3bf", "#868e96").restore();
  doc.font(FONT.regular).fontSize(7.5).fillColor("#212529").text("Parcel with a take in any alternative", x + 18, y, { lineBreak: false });
}
