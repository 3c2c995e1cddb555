import { z } from "zod";
import { sweepSpecSchema } from "@/models/input/sweepSchema";

// Background jobs: what POST /api/v1/jobs accepts. Each job names an option
// revision of the caller's workspace; the worker loads it from there. The
// caps are policy numbers: beyond the synchronous API's (250 × 250 cells,
// 5 000 samples) but bounded so one job cannot fill the database.
export const JOB_KINDS = ["sweep", "monte-carlo", "report"] as const;
export type JobKind = (typeof JOB_KINDS)[number];
export type JobStatus = "queued" | "running" | "completed" | "failed";

/** 800 × 800 cells: about 12 MB of JSON in job_result.result (and up to 10 partial checkpoints on the way). */
export const MAX_JOB_SWEEP_CELLS = 640_000;
export const MAX_JOB_SAMPLES = 200_000;
export const MIN_REPORT_STEPS = 8;
export const MAX_REPORT_STEPS = 200;

const recordId = z.string().regex(/^[A-Za-z0-9_-]{1,64}$/);
const source = { optionId: recordId, revision: z.number().int().min(1).max(1_000_000) };

export const sweepJobPayloadSchema = z
  .object({
    ...source,
    spec: sweepSpecSchema({ maxSteps: 2000, maxCells: MAX_JOB_SWEEP_CELLS, per: "job" }),
  })
  .strict();

export const monteCarloJobPayloadSchema = z
  .object({ ...source, samples: z.number().int().min(1).max(MAX_JOB_SAMPLES), seed: z.number().int().min(0).max(2 ** 32 - 1), corner: z.string().min(1).max(60).optional() })
  .strict();

export const reportJobPayloadSchema = z.object({ ...source, heatmapSteps: z.number().int().min(MIN_REPORT_STEPS).max(MAX_REPORT_STEPS).default(60) }).strict();

export const jobCreateSchema = z.discriminatedUnion("kind", [
  z.object({ kind: z.literal("sweep"), payload: sweepJobPayloadSchema }).strict(),
  z.object({ kind: z.literal("monte-carlo"), payload: monteCarloJobPayloadSchema }).strict(),
  z.object({ kind: z.literal("report"), payload: reportJobPayloadSchema }).strict(),
]);
export type JobCreateInput = z.input<typeof jobCreateSchema>;
export type JobCreate = z.output<typeof jobCreateSchema>;

export const jobParamsSchema = z.object({ jobId: recordId });

// What a caller sees of a job (services/jobs/view.ts builds it): never the
// payload's internals beyond what they sent, never the checkpoint, and the
// result only when asked.
export interface PublicJob {
  id: string;
  kind: JobKind;
  status: JobStatus;
  progress: number;
  error: string | null;
  attempts: number;
  createdAt: string;
  updatedAt: string;
  finishedAt: string | null;
  fileUrl: string | null;
  result?: unknown;
}
