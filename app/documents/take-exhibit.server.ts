import type { ParcelTake, TakeParcelInput } from "~/geometry/take-types";
import { DRAFT_CAUTION, type TakeDescription } from "~/legal";
import { drawExhibitMap, EXHIBIT_STYLE } from "./exhibit-map.server";
import { drawAreaTable, drawBeginnings, drawCourseTable, drawCurveTable } from "./exhibit-tables.server";
import { createPdf, finishPdf, FONT, formatDate } from "./pdf-base.server";
import type { AlternativeSources } from "./take-sources.server";

/**
 * The take exhibit of one parcel as a PDF: title block (project, alternative and version, parcel
 * and owner, date), the caution, the drawing (see drawExhibitMap) with its legend, then the area,
 * course and curve tables and the points of commencement and beginning, flowing onto further
 * pages as needed. Every figure comes from the legal description, so the PDF and the
 * description API always agree.
 */
export function writeTakeExhibit(sources: AlternativeSources, take: ParcelTake, parcel: TakeParcelInput, description: TakeDescription, createdAt = new Date()): Promise<Buffer> {
  const { alternative, project } = sources;
  const doc = createPdf({ units: sources.units, title: `Take exhibit: parcel ${parcel.parcelId}`, subject: `${project.name}, ${alternative.name}`, createdAt });
  const left = doc.page.margins.left;
  const width = doc.page.width - left - doc.page.margins.right;
  doc.font(FONT.bold).fontSize(14).fillColor("#212529").text("RIGHT-OF-WAY TAKE EXHIBIT", left, 36, { lineBreak: false });
  doc.font(FONT.regular).fontSize(9);
  doc.text(`Parcel ${parcel.parcelId}${parcel.owner ? `, ${parcel.owner}` : ""}${parcel.address ? `, ${parcel.address}` : ""}`, left, 56, { width, lineBreak: false, ellipsis: true });
  doc.text(`Project: ${project.name}. Alternative: ${alternative.name} (version ${sources.impacts.version}). Classification: ${take.classification} take. Date: ${formatDate(createdAt)}.`, left, 68, { width });
  const cautionY = doc.y + 4;
  doc.save().lineWidth(0.8).rect(left, cautionY, width, 30).stroke("#c92a2a").restore();
  doc.font(FONT.regular).fontSize(6.8).fillColor("#c92a2a").text(DRAFT_CAUTION, left + 5, cautionY + 4, { width: width - 10 });
  const mapBox = { x: left, y: cautionY + 38, width, height: Math.min(400, doc.page.height * 0.45) };
  drawExhibitMap(doc, mapBox, sources, parcel, description);
  drawLegend(doc, left, mapBox.y + mapBox.height + 6);
  doc.y = mapBox.y + mapBox.height + 24;
  drawAreaTable(doc, description, take, sources.units);
  drawCourseTable(doc, description);
  drawCurveTable(doc, description);
  drawBeginnings(doc, description);
  return finishPdf(doc);
}

function drawLegend(doc: PDFKit.PDFDocument, x: number, y: number): void {
  const items: [string, (x: number, y: number) => void][] = [
    ["Right-of-way take", (a, b) => doc.rect(a, b, 14, 8).fillOpacity(EXHIBIT_STYLE.take.fillOpacity).fillAndStroke(EXHIBIT_STYLE.take.fill, EXHIBIT_STYLE.take.stroke)],
    ["Remainder", (a, b) => doc.rect(a, b, 14, 8).fillAndStroke(EXHIBIT_STYLE.remainder.fill, EXHIBIT_STYLE.remainder.stroke)],
    ["Temporary easement", (a, b) => doc.rect(a, b, 14, 8).fillOpacity(EXHIBIT_STYLE.easement.fillOpacity).fill(EXHIBIT_STYLE.easement.fill)],
    ["Right-of-way line", (a, b) => doc.lineWidth(0.7).dash(4, { space: 2 }).moveTo(a, b + 4).lineTo(a + 14, b + 4).stroke(EXHIBIT_STYLE.rightOfWay.stroke)],
    ["Centreline, stations", (a, b) => doc.lineWidth(0.8).dash(9, { space: 3 }).moveTo(a, b + 4).lineTo(a + 14, b + 4).stroke("#212529")],
  ];
  let at = x;
  for (const [text, swatch] of items) {
    doc.save();
    swatch(at, y);
    doc.restore();
    doc.font(FONT.regular).fontSize(7).fillColor("#212529").text(text, at + 18, y, { lineBreak: false });
    at += 18 + doc.widthOfString(text) + 14;
  }
}
