import "server-only";
import crypto from "node:crypto";
import { setImmediate as yieldToEventLoop } from "node:timers/promises";
import type { Design } from "@/models/input/schema";
import { mergeSweepChunks, sweepGrid, type SweepResult, type SweepSpec } from "@/models/sweep";
import { monteCarlo, type MonteCarloResult } from "@/models/spread";
import { AppError } from "@/lib/errors";
import { loadRevisionEvaluation } from "@/services/evaluation/revision";
import { putObject, deleteObject } from "@/services/storage/storage";
import { controllerHeatmap, loadReportData } from "@/services/reports/data";
import { renderReportPdf } from "@/services/reports/pdf";
import { mergeMonteCarlo, batchSeed } from "./monteCarloMerge";
import { monteCarloJobPayloadSchema, reportJobPayloadSchema, sweepJobPayloadSchema } from "@/lib/jobs/schema";
import { completeJobById, updateJobProgressById, type JobRecord } from "@/db/queries/jobs";
import { insertStoredFile, newFileId, newObjectKey } from "@/db/queries/files";

// The work of each job kind, in chunks: after every chunk the progress and
// the chunks done so far go to job_result.checkpoint, and the event loop
// gets a turn (the worker shares its process with the app server). A retry
// after a crash starts from the checkpoint, not from zero.

/** About this many checkpoints per sweep: each rewrites the partial grid, so fewer is cheaper. */
const SWEEP_CHECKPOINTS = 10;
/** Monte Carlo samples per batch (each batch has its own derived seed). */
export const MC_BATCH_SAMPLES = 2_000;

async function designOf(job: JobRecord, optionId: string, revision: number): Promise<Design> {
  // Limits (sweep contour, Monte Carlo over-limit fractions) follow the workspace policy, as the budget does.
  const loaded = await loadRevisionEvaluation({ workspaceId: job.workspaceId, optionId, revision });
  if (!loaded) throw new AppError("not_found", `Option revision ${revision} no longer exists.`);
  if (!loaded.ok) throw new AppError("bad_request", `Revision ${revision} does not evaluate.`);
  return loaded.design;
}

export async function runSweepJob(job: JobRecord): Promise<void> {
  const p = sweepJobPayloadSchema.parse(job.payload);
  const design = await designOf(job, p.optionId, p.revision);
  const ny = p.spec.y.steps;
  const step = Math.max(1, Math.ceil(ny / SWEEP_CHECKPOINTS));
  const chunks = ((job.checkpoint as { chunks?: SweepResult[] } | null)?.chunks ?? []).filter((c) => c.complete);
  let next = chunks.length ? chunks[chunks.length - 1].rowRange.to : 0;
  const resumedFromRow = next;
  while (next < ny) {
    const spec: SweepSpec = { ...p.spec, rows: { from: next, to: Math.min(ny, next + step) } };
    const chunk = sweepGrid(design, spec);
    chunks.push(chunk);
    next = chunk.rowRange.to;
    await updateJobProgressById({ jobId: job.id, progress: (next / ny) * 0.99, checkpoint: { chunks } });
    await yieldToEventLoop();
  }
  await completeJobById({ jobId: job.id, result: { ...mergeSweepChunks(chunks), resumedFromRow } });
}

export async function runMonteCarloJob(job: JobRecord): Promise<void> {
  const p = monteCarloJobPayloadSchema.parse(job.payload);
  const design = await designOf(job, p.optionId, p.revision);
  if (p.corner && !["worst", "all"].includes(p.corner) && !design.corners.some((c) => c.id === p.corner)) throw new AppError("bad_request", `No corner "${p.corner}".`);
  const batches = ((job.checkpoint as { batches?: MonteCarloResult[] } | null)?.batches ?? []).slice();
  const count = Math.ceil(p.samples / MC_BATCH_SAMPLES);
  const resumedFromBatch = batches.length;
  for (let b = batches.length; b < count; b++) {
    const samples = Math.min(MC_BATCH_SAMPLES, p.samples - b * MC_BATCH_SAMPLES);
    batches.push(monteCarlo(design, { samples, seed: batchSeed(p.seed, b), corner: p.corner }));
    await updateJobProgressById({ jobId: job.id, progress: ((b + 1) / count) * 0.99, checkpoint: { batches } });
    await yieldToEventLoop();
  }
  await completeJobById({ jobId: job.id, result: { ...mergeMonteCarlo(p.seed, batches), resumedFromBatch } });
}

export async function runReportJob(job: JobRecord): Promise<void> {
  const p = reportJobPayloadSchema.parse(job.payload);
  const data = await loadReportData({ workspaceId: job.workspaceId, optionId: p.optionId, revision: p.revision });
  await updateJobProgressById({ jobId: job.id, progress: 0.05 });
  const heat = controllerHeatmap(data.design, p.heatmapSteps);
  await updateJobProgressById({ jobId: job.id, progress: 0.7 });
  await yieldToEventLoop();
  const pdf = new Uint8Array(await renderReportPdf(data, { heatmap: heat }));
  await updateJobProgressById({ jobId: job.id, progress: 0.9 });
  const key = newObjectKey({ workspaceId: job.workspaceId, kind: "report" });
  const filename = `${data.option.name.replace(/[^\w.-]+/g, "_").slice(0, 80)}-rev${p.revision}-review.pdf`;
  await putObject({ key, body: pdf, contentType: "application/pdf" });
  try {
    const file = await insertStoredFile({
      id: newFileId(), workspaceId: job.workspaceId, key, filename, contentType: "application/pdf", sizeBytes: pdf.byteLength,
      sha256: crypto.createHash("sha256").update(pdf).digest("hex"), kind: "report", createdBy: job.createdBy,
    });
    await completeJobById({ jobId: job.id, result: { filename, sizeBytes: pdf.byteLength, heatmapSteps: p.heatmapSteps }, fileId: file.id });
  } catch (e) {
    await deleteObject(key).catch(() => undefined);
    throw e;
  }
}
