import { z } from "zod";
import { LOSS_MECHANISMS } from "@/models/losses";

// Background jobs: what POST /api/v1/jobs accepts. Each job names an option
// revision of the caller's workspace; the worker loads it from there. The
// caps are policy numbers: beyond the synchronous API's (250 × 250 cells,
// 5 000 samples) but bounded so one job cannot fill the database.
export const JOB_KINDS = ["sweep", "monte-carlo", "report"] as const;
export type JobKind = (typeof JOB_KINDS)[number];

/** 800 × 800 cells: about 12 MB of JSON in job_result.result (and up to 10 partial checkpoints on the way). */
export const MAX_JOB_SWEEP_CELLS = 640_000;
export const MAX_JOB_SAMPLES = 200_000;
export const MIN_REPORT_STEPS = 8;
export const MAX_REPORT_STEPS = 200;

const recordId = z.string().regex(/^[A-Za-z0-9_-]{1,64}$/);
const source = { optionId: recordId, revision: z.number().int().min(1).max(1_000_000) };

const axisSchema = z
  .object({
    axis: z.enum(["fsw", "qgScale", "vin", "ambient", "rGate"]),
    from: z.number().finite(),
    to: z.number().finite(),
    steps: z.number().int().min(2).max(2000),
    scale: z.enum(["linear", "log"]).optional(),
    position: z.string().min(1).max(40).optional(),
    edge: z.enum(["both", "on", "off"]).optional(),
  })
  .strict();

export const sweepJobPayloadSchema = z
  .object({
    ...source,
    spec: z
      .object({
        part: z.string().min(1).max(60),
        metric: z.enum(["rise", "tj", "loss"]).optional(),
        mechanism: z.enum(LOSS_MECHANISMS).optional(),
        corner: z.string().min(1).max(60).optional(),
        x: axisSchema,
        y: axisSchema,
        limit: z.number().finite().optional(),
      })
      .strict()
      .refine((s) => s.x.axis !== s.y.axis, { message: "x and y must be different axes", path: ["y", "axis"] })
      .refine((s) => s.x.steps * s.y.steps <= MAX_JOB_SWEEP_CELLS, { message: `at most ${MAX_JOB_SWEEP_CELLS} cells per job`, path: ["y", "steps"] }),
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
