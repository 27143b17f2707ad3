import { FONT } from "./pdf-base.server";

export interface TableColumn {
  header: string;
  width: number;
  align?: "left" | "right" | "center";
}

export interface TableSpec {
  title?: string;
  columns: TableColumn[];
  rows: string[][];
  fontSize?: number;
}

/**
 * Draws a ruled table from the current y at the left margin; a row that would pass the bottom
 * margin starts a new page and repeats the header. Each cell is one text run, so text tools read
 * it back whole. Returns the y below the table.
 */
export function drawTable(doc: PDFKit.PDFDocument, spec: TableSpec, y0 = doc.y): number {
  const size = spec.fontSize ?? 7.5;
  const rowH = size + 5;
  const x0 = doc.page.margins.left;
  const width = spec.columns.reduce((s, c) => s + c.width, 0);
  const bottom = () => doc.page.height - doc.page.margins.bottom;
  let y = y0;
  if (spec.title) {
    if (y + 3 * rowH > bottom()) y = newPage(doc);
    doc.font(FONT.bold).fontSize(size + 1.5).fillColor("#212529").text(spec.title, x0, y, { lineBreak: false });
    y += size + 6;
  }
  const header = () => {
    doc.save().rect(x0, y, width, rowH).fill("#e9ecef").restore();
    row(doc, spec.columns, spec.columns.map((c) => c.header), x0, y, size, FONT.bold);
    y += rowH;
  };
  if (y + 2 * rowH > bottom()) y = newPage(doc);
  header();
  for (const cells of spec.rows) {
    if (y + rowH > bottom()) {
      y = newPage(doc);
      header();
    }
    row(doc, spec.columns, cells, x0, y, size, FONT.regular);
    doc.save().lineWidth(0.3).moveTo(x0, y + rowH).lineTo(x0 + width, y + rowH).stroke("#adb5bd").restore();
    y += rowH;
  }
  doc.y = y + 8;
  return doc.y;
}

function row(doc: PDFKit.PDFDocument, columns: TableColumn[], cells: string[], x0: number, y: number, size: number, font: string): void {
  let x = x0;
  doc.font(font).fontSize(size).fillColor("#212529");
  columns.forEach((c, i) => {
    const text = fitText(doc, cells[i] ?? "", c.width - 6);
    const w = doc.widthOfString(text);
    const at = c.align === "right" ? x + c.width - 3 - w : c.align === "center" ? x + (c.width - w) / 2 : x + 3;
    doc.text(text, at, y + 2.5, { lineBreak: false });
    x += c.width;
  });
}

/** The text cut (with "…") to fit `width` points in the current font. */
function fitText(doc: PDFKit.PDFDocument, text: string, width: number): string {
  if (doc.widthOfString(text) <= width) return text;
  let cut = text;
  while (cut.length > 1 && doc.widthOfString(`${cut}…`) > width) cut = cut.slice(0, -1);
  return `${cut}…`;
}

function newPage(doc: PDFKit.PDFDocument): number {
  doc.addPage();
  return doc.page.margins.top;
}
