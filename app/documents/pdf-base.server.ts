import { createRequire } from "node:module";
import PDFDocument from "pdfkit";
import type { LengthUnit } from "~/geometry/units";

const require = createRequire(import.meta.url);

/** Public Sans (SIL Open Font License) as shipped in @fontsource/public-sans: embedded, never fetched. */
const FONT_FILES = {
  regular: "@fontsource/public-sans/files/public-sans-latin-400-normal.woff",
  bold: "@fontsource/public-sans/files/public-sans-latin-700-normal.woff",
} as const;

export const FONT = { regular: "PublicSans", bold: "PublicSans-Bold" } as const;

/** Page sizes: A4 for metric projects, US Letter for projects in feet (common practice). */
export function pageSizeFor(units: LengthUnit): "A4" | "LETTER" {
  return units === "m" ? "A4" : "LETTER";
}

export interface NewPdfOptions {
  units: LengthUnit;
  layout?: "portrait" | "landscape";
  title: string;
  subject: string;
  /** Fixed time stamp for the document info (tests); default now. */
  createdAt?: Date;
}

/** A pdfkit document with the shipped fonts registered, 36 pt margins and the document info set. */
export function createPdf(options: NewPdfOptions): PDFKit.PDFDocument {
  const regular = require.resolve(FONT_FILES.regular);
  const doc = new PDFDocument({
    size: pageSizeFor(options.units),
    layout: options.layout ?? "portrait",
    margin: 36,
    font: regular,
    info: { Title: options.title, Subject: options.subject, Creator: "Takeline", Producer: "Takeline (pdfkit)", CreationDate: options.createdAt ?? new Date() },
  });
  doc.registerFont(FONT.regular, regular);
  doc.registerFont(FONT.bold, require.resolve(FONT_FILES.bold));
  doc.font(FONT.regular);
  return doc;
}

/** Ends the document and collects its bytes. */
export function finishPdf(doc: PDFKit.PDFDocument): Promise<Buffer> {
  return new Promise((resolve, reject) => {
    const parts: Buffer[] = [];
    doc.on("data", (chunk: Buffer) => parts.push(chunk));
    doc.on("end", () => resolve(Buffer.concat(parts)));
    doc.on("error", reject);
    doc.end();
  });
}

/** "2026-12-02" (UTC) for a title block. */
export function formatDate(d: Date): string {
  return d.toISOString().slice(0, 10);
}
