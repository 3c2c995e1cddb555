import "server-only";
import PDFDocument from "pdfkit";
import type { SweepResult } from "@/models/sweep";
import { controllerHeatmap, type ReportData } from "./data";
import { line, registerReportFonts } from "./pdfText";
import { PAGE } from "./pdfLayout";
import { budgetKey, cautions, cornerBudget, deratingPolicy, junctionSummary, reviewSection, titleBlock, warningsSection } from "./pdfSections";
import { heatmap, lossChart } from "./pdfCharts";

// The design-review report of one revision as a PDF. Pure rendering of
// ReportData (plus the heatmap sweep), so the route handler and the report
// job produce the same document.
export async function renderReportPdf(d: ReportData, opts: { heatmap?: SweepResult } = {}): Promise<Buffer> {
  const doc = new PDFDocument({
    size: "A4", margin: PAGE.margin, autoFirstPage: true, bufferPages: true,
    info: { Title: `Design review: ${d.option.name}, revision ${d.revision.revision}`, Author: "Heatsplit", Subject: d.design.name },
  });
  const chunks: Buffer[] = [];
  const done = new Promise<Buffer>((resolve, reject) => {
    doc.on("data", (c: Buffer) => chunks.push(c));
    doc.on("end", () => resolve(Buffer.concat(chunks)));
    doc.on("error", reject);
  });
  registerReportFonts(doc);
  let y = titleBlock(doc, d);
  y = cautions(doc, y);
  y = junctionSummary(doc, d, y);
  y = deratingPolicy(doc, d, y);
  y = reviewSection(doc, d, y);
  y = warningsSection(doc, d, y);
  const worst = d.evaluation.corners.find((c) => c.cornerId === d.evaluation.worstTotal.cornerId) ?? d.evaluation.corners[0];
  y = lossChart(doc, worst, y);
  y = heatmap(doc, opts.heatmap ?? controllerHeatmap(d.design), y, "Controller temperature rise over fsw × Qg");
  doc.addPage();
  y = budgetKey(doc, PAGE.margin);
  for (const c of d.evaluation.corners) y = cornerBudget(doc, c, y);
  // Page footers once the page count is known.
  const range = doc.bufferedPageRange();
  for (let i = range.start; i < range.start + range.count; i++) {
    doc.switchToPage(i);
    // Below the bottom margin: with the margin kept, pdfkit would start a new page.
    doc.page.margins.bottom = 0;
    line(doc, `${d.option.name} · revision ${d.revision.revision} · page ${i + 1} of ${range.count} · estimates, confirm on the bench`, PAGE.margin, PAGE.height - PAGE.margin + 8, { size: 7, color: "#8f8676", width: PAGE.width - 2 * PAGE.margin, align: "center" });
  }
  doc.end();
  return done;
}
