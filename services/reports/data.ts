import "server-only";
import type { Design } from "@/models/input/schema";
import { evaluateDesign, type Evaluation } from "@/models/evaluate";
import { sweepGrid, type SweepResult } from "@/models/sweep";
import { AppError } from "@/lib/errors";
import { loadRevisionEvaluation } from "@/services/evaluation/revision";
import type { WorkspaceDerating } from "@/db/queries/derating";
import { getDesignOptionById, type OptionRecord, type RevisionRecord } from "@/db/queries/options";
import { getProjectById } from "@/db/queries/projects";
import { getReviewSummaryByRevision, type ReviewSummary } from "@/db/queries/report-review";

// Everything a design-review report of one revision shows, computed once so
// the PDF and the CSV carry the same numbers as the budget API.
export interface ReportData {
  projectName: string;
  option: OptionRecord;
  revision: RevisionRecord;
  design: Design;
  evaluation: Evaluation;
  review: ReviewSummary | null;
  /** The workspace policy that replaced the document's derating block; null = the document's own block applied. */
  workspacePolicy: WorkspaceDerating | null;
  generatedAt: string;
}

/** Grid of the report's heatmap in the synchronous download; a job may ask for more (up to REPORT_JOB_MAX_STEPS). */
export const REPORT_HEATMAP_STEPS = 24;
export const REPORT_JOB_MAX_STEPS = 200;

/** Callers check the member's permission first; another workspace's option is simply not found (404). */
export async function loadReportData({ workspaceId, optionId, revision }: { workspaceId: string; optionId: string; revision: number }): Promise<ReportData> {
  const option = await getDesignOptionById({ workspaceId, optionId });
  if (!option) throw new AppError("not_found", "Not found.");
  // The one evaluation of a stored revision (services/evaluation/revision.ts): the budget API's numbers.
  const [loaded, project] = await Promise.all([loadRevisionEvaluation({ workspaceId, optionId: option.id, revision }), getProjectById({ workspaceId, projectId: option.projectId })]);
  if (!loaded) throw new AppError("not_found", "Not found.");
  if (!loaded.ok) throw new AppError("bad_request", `Revision ${revision} does not evaluate; fix it in the editor.`, loaded.issues);
  return {
    projectName: project?.name ?? "",
    option,
    revision: loaded.revision,
    design: loaded.design,
    evaluation: loaded.evaluation,
    review: await getReviewSummaryByRevision({ optionId: option.id, revision }),
    workspacePolicy: loaded.policy,
    generatedAt: new Date().toISOString(),
  };
}

/**
 * The controller's temperature rise over fsw (0.4×…2× the worst corner's,
 * log) × gate-charge scale (0.5…2× every MOSFET's Qg) with the derated
 * limit contour: where moving the drive off the controller pays.
 */
export function controllerHeatmap(design: Design, steps = REPORT_HEATMAP_STEPS, onProgress?: (f: number) => void): SweepResult {
  const ev = evaluateDesign(design);
  const worst = ev.parts.find((p) => p.id === "controller")?.worstCornerId ?? design.corners[0].id;
  const fsw = design.corners.find((c) => c.id === worst)?.fsw ?? design.corners[0].fsw;
  return sweepGrid(design, {
    part: "controller", metric: "rise", corner: worst,
    x: { axis: "fsw", from: fsw * 0.4, to: fsw * 2, steps, scale: "log" },
    y: { axis: "qgScale", from: 0.5, to: 2, steps },
    onProgress,
  });
}
