import type { PolygonCoords } from "~/geometry/take-types";
import type { Vec2 } from "~/geometry/vec2";
import { FONT } from "./pdf-base.server";
import type { MapFrame } from "./map-frame";

/** How a shape is painted. Colours are hex; opacity 0–1. */
export interface PaintStyle {
  fill?: string;
  fillOpacity?: number;
  stroke?: string;
  lineWidth?: number;
  dash?: [number, number];
}

/** Drops points closer than a third of a point to the last one kept: the page cannot show them. */
function pagePoints(frame: MapFrame, ring: number[][] | Vec2[]): [number, number][] {
  const out: [number, number][] = [];
  for (const p of ring) {
    const q = frame.toPage([p[0]!, p[1]!]);
    const last = out[out.length - 1];
    if (!last || Math.abs(q[0] - last[0]) + Math.abs(q[1] - last[1]) > 0.33) out.push(q);
  }
  return out;
}

/** Paints (Multi)Polygon coordinates; holes are cut out by the even-odd rule. */
export function drawPolygons(doc: PDFKit.PDFDocument, frame: MapFrame, polygons: PolygonCoords[], style: PaintStyle): void {
  if (polygons.length === 0) return;
  doc.save();
  for (const rings of polygons) {
    for (const ring of rings) {
      const pts = pagePoints(frame, ring);
      if (pts.length < 3) continue;
      doc.moveTo(pts[0]![0], pts[0]![1]);
      for (const [x, y] of pts.slice(1)) doc.lineTo(x, y);
      doc.closePath();
    }
  }
  paint(doc, style, "even-odd");
  doc.restore();
}

/** Strokes a polyline. */
export function drawPolyline(doc: PDFKit.PDFDocument, frame: MapFrame, line: Vec2[], style: PaintStyle): void {
  const pts = pagePoints(frame, line);
  if (pts.length < 2) return;
  doc.save();
  doc.moveTo(pts[0]![0], pts[0]![1]);
  for (const [x, y] of pts.slice(1)) doc.lineTo(x, y);
  paint(doc, { ...style, fill: undefined }, "non-zero");
  doc.restore();
}

function paint(doc: PDFKit.PDFDocument, style: PaintStyle, rule: "even-odd" | "non-zero"): void {
  if (style.lineWidth !== undefined) doc.lineWidth(style.lineWidth);
  if (style.dash) doc.dash(style.dash[0], { space: style.dash[1] });
  if (style.fill) doc.fillOpacity(style.fillOpacity ?? 1);
  if (style.fill && style.stroke) doc.fillAndStroke(style.fill, style.stroke, rule);
  else if (style.fill) doc.fill(style.fill, rule);
  else if (style.stroke) doc.stroke(style.stroke);
}

/** Everything drawn inside `draw` is clipped to the frame's box, which is then outlined. */
export function withinFrame(doc: PDFKit.PDFDocument, frame: MapFrame, draw: () => void): void {
  const { x, y, width, height } = frame.box;
  doc.save();
  doc.rect(x, y, width, height).clip();
  draw();
  doc.restore();
  doc.save().lineWidth(0.75).rect(x, y, width, height).stroke("#343a40").restore();
}

/** A grid-north arrow with its "N", its tip at (x, y). */
export function drawNorthArrow(doc: PDFKit.PDFDocument, x: number, y: number): void {
  doc.save();
  doc.polygon([x, y], [x + 7, y + 24], [x, y + 18], [x - 7, y + 24]).fillAndStroke("#212529", "#212529");
  doc.font(FONT.bold).fontSize(9).fillColor("#212529").text("N", x - 4, y + 26, { width: 8, align: "center", lineBreak: false });
  doc.font(FONT.regular).fontSize(6.5).text("grid north", x - 20, y + 37, { width: 40, align: "center", lineBreak: false });
  doc.restore();
}

/** A scale bar of `length` units in four alternating parts, labelled 0, half and full length, with the ratio. */
export function drawScaleBar(doc: PDFKit.PDFDocument, frame: MapFrame, length: number, unitWord: string, x: number, y: number): void {
  const w = length * frame.pointsPerUnit;
  doc.save().lineWidth(0.5);
  for (let k = 0; k < 4; k++) doc.rect(x + (k * w) / 4, y, w / 4, 4).fillAndStroke(k % 2 === 0 ? "#212529" : "#ffffff", "#212529");
  doc.font(FONT.regular).fontSize(7).fillColor("#212529");
  for (const [f, text] of [[0, "0"], [0.5, plain(length / 2)], [1, `${plain(length)} ${unitWord}`]] as const) {
    doc.text(text, x + f * w - 30, y + 6, { width: 60, align: "center", lineBreak: false });
  }
  doc.text(`Scale 1:${frame.ratio.toLocaleString("en-US")}`, x, y + 16, { width: 200, lineBreak: false });
  doc.restore();
}

function plain(v: number): string {
  return Number(v.toPrecision(6)).toString();
}
