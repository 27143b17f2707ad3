import type { LengthUnit } from "~/geometry/units";
import { areaWords, lengthWord } from "~/legal/legal-format";
import { landSessionFor } from "~/models/alternative-impacts.server";
import { listAlternatives } from "~/models/alternatives.server";
import { readComparison, type Comparison } from "~/models/comparison.server";
import type { Project } from "~/models/projects.server";
import { UNIT_LABELS } from "~/utils/unit-labels";
import { createPdf, finishPdf, FONT, formatDate } from "./pdf-base.server";
import { drawReportMap } from "./report-map.server";
import { drawTable } from "./pdf-table.server";

const ESTIMATE_NOTE =
  "Costs are order-of-magnitude estimates from the project's take and cost rules, for comparing alternatives; they are not appraisals or offers. " +
  "Take areas are exact for the design right-of-way; descriptions of individual takes are drafts for a licensed surveyor.";

const money = (v: number) => Math.round(v).toLocaleString("en-US");
const area = (v: number) => v.toLocaleString("en-US", { minimumFractionDigits: 1, maximumFractionDigits: 1 });
const length = (v: number) => v.toFixed(1);

/**
 * The project report as a PDF (landscape): the comparison of every alternative (geometry, design
 * checks, takes and displacements; then the estimated cost lines), the map figure of all
 * corridors over the parcels, and the parcel × alternative table of take areas.
 */
export async function writeProjectReport(project: Project, createdAt = new Date()): Promise<Buffer> {
  const units = project.units as LengthUnit;
  const comparison = readComparison(project);
  const alternatives = listAlternatives(project.id);
  const doc = createPdf({ units, layout: "landscape", title: `Alternatives report: ${project.name}`, subject: "Comparison of alternatives", createdAt });
  const left = doc.page.margins.left;
  const width = doc.page.width - left - doc.page.margins.right;
  doc.font(FONT.bold).fontSize(15).fillColor("#212529").text("ALTERNATIVES REPORT", left, 36, { lineBreak: false });
  doc.font(FONT.regular).fontSize(9).text(`${project.name}. ${project.description}`, left, 56, { width });
  doc.text(`Lengths in ${UNIT_LABELS[units]}${project.crs ? `, grid coordinates in ${project.crs}` : ""}. ${alternatives.length} alternative${alternatives.length === 1 ? "" : "s"}. Date: ${formatDate(createdAt)}.`, { width });
  doc.fontSize(7.5).fillColor("#495057").text(ESTIMATE_NOTE, { width });
  doc.moveDown(0.6);
  drawSummaryTable(doc, comparison, units);
  drawCostTable(doc, comparison);
  doc.addPage();
  doc.font(FONT.bold).fontSize(10).fillColor("#212529").text("Figure 1. The alternatives' rights-of-way over the parcel fabric", left, 36, { lineBreak: false });
  const { land } = landSessionFor(project);
  const taken = new Map(comparison.alternatives.map((a) => [a.id, new Set(comparison.matrix.filter((r) => r.takes.some((t) => t.alternativeId === a.id)).map((r) => r.parcelId))]));
  drawReportMap(doc, { x: left, y: 52, width, height: doc.page.height - 52 - 60 }, { alternatives, taken, parcels: land.parcels, units });
  doc.addPage();
  drawMatrixTable(doc, comparison, units);
  return finishPdf(doc);
}

function drawSummaryTable(doc: PDFKit.PDFDocument, c: Comparison, units: LengthUnit): void {
  const u = lengthWord(units);
  const a2 = areaWords(units).small;
  drawTable(doc, {
    title: "Table 1. Alternatives compared",
    columns: [
      { header: "Alternative", width: 130 },
      { header: "Status", width: 60 },
      { header: `Length (${u})`, width: 58, align: "right" },
      { header: `Min. radius (${u})`, width: 64, align: "right" },
      { header: "Curves", width: 38, align: "right" },
      { header: "Design checks", width: 70 },
      { header: "Parcels (partial/full)", width: 84, align: "right" },
      { header: "Displacements", width: 60, align: "right" },
      { header: `Take (${a2})`, width: 70, align: "right" },
      { header: `Easement (${a2})`, width: 70, align: "right" },
      { header: "Est. cost", width: 66, align: "right" },
    ],
    rows: c.alternatives.map(({ name, status, summary: s }) => [
      name,
      status,
      length(s.length),
      s.minimumRadius === null ? "none" : length(s.minimumRadius),
      String(s.curveCount),
      s.checkStatus === "pass" ? "pass" : s.checkStatus === "accepted" ? `accepted (${s.checksAccepted})` : `${s.checkWarnings} warning${s.checkWarnings === 1 ? "" : "s"}`,
      `${s.parcelsAffected} (${s.partialTakes}/${s.fullTakes})`,
      String(s.displacements),
      area(s.takeArea),
      area(s.easementArea),
      money(s.estimatedCost),
    ]),
  });
}

function drawCostTable(doc: PDFKit.PDFDocument, c: Comparison): void {
  const keys = ["land", "buildings", "severance", "easement", "administrative", "contingency"] as const;
  drawTable(doc, {
    title: "Table 2. Estimated cost lines (order of magnitude, project currency)",
    columns: [{ header: "Alternative", width: 150 }, ...keys.map((k) => ({ header: k[0]!.toUpperCase() + k.slice(1), width: 84, align: "right" as const })), { header: "Total", width: 86, align: "right" }],
    rows: c.alternatives.map(({ name, summary: s }) => [name, ...keys.map((k) => money(s.costLines[k])), money(s.estimatedCost)]),
  });
}

function drawMatrixTable(doc: PDFKit.PDFDocument, c: Comparison, units: LengthUnit): void {
  const a2 = areaWords(units).small;
  const per = Math.max(60, Math.floor(440 / Math.max(1, c.alternatives.length)));
  drawTable(doc, {
    title: `Table 3. Take area (${a2}) from each parcel by alternative; F = full take`,
    columns: [{ header: "Parcel", width: 90 }, { header: "Owner", width: 150 }, { header: `Parcel (${a2})`, width: 76, align: "right" }, ...c.alternatives.map((a) => ({ header: a.name, width: per, align: "right" as const }))],
    rows: c.matrix.map((r) => [
      r.parcelId,
      r.owner ?? "",
      area(r.parcelArea),
      ...c.alternatives.map((a) => {
        const t = r.takes.find((x) => x.alternativeId === a.id);
        return !t ? "" : t.takeArea > 0 ? `${area(t.takeArea)}${t.classification === "full" ? " F" : ""}` : "easement only";
      }),
    ]),
    fontSize: 7,
  });
}
