import { z } from "zod";
import { route } from "@/app/_lib/access";
import { loadReportData } from "@/services/reports/data";
import { renderReportPdf } from "@/services/reports/pdf";
import { budgetCsv } from "@/services/reports/csv";
import { revisionParamsSchema } from "@/lib/options/schema";

// GET /api/v1/options/:optionId/revisions/:rev/report?format=pdf|csv
//   pdf: the design-review report (attachment); csv: every figure of the budget.
// Larger heatmaps render as a background job (POST /api/v1/jobs kind "report").
const reportQuerySchema = z.object({ format: z.enum(["pdf", "csv"]).default("pdf") }).strict();

function attachment(name: string): string {
  const safe = name.replace(/[^\w.-]+/g, "_").slice(0, 80) || "report";
  return `attachment; filename="${safe}"`;
}

export const GET = route({ permission: "read", params: revisionParamsSchema, query: reportQuerySchema }, async ({ member, params, query }) => {
  const data = await loadReportData({ workspaceId: member.workspace.id, optionId: params.optionId, revision: params.rev });
  const stem = `${data.option.name}-rev${data.revision.revision}`;
  if (query.format === "csv")
    return new Response(budgetCsv(data), {
      headers: { "content-type": "text/csv; charset=utf-8", "content-disposition": attachment(`${stem}-budget.csv`), "cache-control": "private, no-store" },
    });
  const pdf = await renderReportPdf(data);
  return new Response(new Uint8Array(pdf), {
    headers: { "content-type": "application/pdf", "content-length": String(pdf.byteLength), "content-disposition": attachment(`${stem}-review.pdf`), "cache-control": "private, no-store" },
  });
});
