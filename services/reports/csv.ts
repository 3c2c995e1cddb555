import "server-only";
import { LOSS_MECHANISMS } from "@/models/losses";
import type { ReportData } from "./data";
import { writeCsv } from "@/lib/csv";

// Every figure of the budget as rows: one per corner × part × mechanism
// (loss), one total per corner × part, and for junction parts Tj, the
// derated limit, Tj(max) and the margin; one total per corner. Units are in
// the header; numbers are SI and unrounded (JavaScript's shortest
// round-trip form) so a spreadsheet recomputes what the app shows. The first
// line is one cell starting "#" with the caution; every cell goes through
// the shared writer (lib/csv.ts), so an option or part name cannot
// split a line or plant a formula.
export const LOSS_COLUMN = "loss [W]";
export const TEMPERATURE_COLUMN = "temperature [°C]";
export const DIFFERENCE_COLUMN = "difference [K]";
export const BUDGET_CSV_HEADER = ["corner_id", "corner_label", "part_id", "part_label", "figure", "mechanism", LOSS_COLUMN, TEMPERATURE_COLUMN, DIFFERENCE_COLUMN, "note"];

export function budgetCsv(d: ReportData): string {
  const rows: (string | number)[][] = [];
  for (const c of d.evaluation.corners) {
    for (const p of c.parts) {
      const row = (figure: string, mechanism: string, loss: number | "", temp: number | "", diff: number | "", note = "") => rows.push([c.cornerId, c.label, p.id, p.label, figure, mechanism, loss, temp, diff, note]);
      for (const m of LOSS_MECHANISMS) row("loss", m, p.losses[m], "", "");
      row("loss_total", "", p.total, "", "");
      const j = p.junction;
      if (!j) continue;
      if (j.runaway) row("tj", "", "", "", "", "thermal runaway: no steady state");
      else row("tj", "", "", j.tj, "");
      row("tj_limit_derated", "", "", j.limit, "");
      row("tj_max", "", "", j.tjMax, "");
      if (!j.runaway) row("margin", "", "", "", j.margin, "derated limit − Tj");
    }
    rows.push([c.cornerId, c.label, "", "", "corner_loss_total", "", c.totalLoss, "", "", ""]);
  }
  const preamble = `# Heatsplit budget: ${d.option.name.replace(/[\r\n]/g, " ")}, revision ${d.revision.revision}. Estimates, not measurements: confirm on the bench before release.`;
  return writeCsv([[preamble], BUDGET_CSV_HEADER, ...rows]);
}
