/**
 * Bench correlation: the CSV format (our own column names), its row schema
 * and the policy numbers of an upload. The upload form, the API handler and
 * the in-app help all read these.
 */
import { z } from "zod";
import { recordIdSchema } from "../projects/schema";

/** Columns in the order the template lists them; `note` may be left out. */
export const BENCH_COLUMNS = ["part_id", "corner_id", "method", "measured_at", "temperature", "ambient", "note"] as const;
export const REQUIRED_BENCH_COLUMNS = BENCH_COLUMNS.filter((c) => c !== "note");
export type BenchColumn = (typeof BENCH_COLUMNS)[number];

/** Policy: a bench log of a few hundred readings; the file size limit is MAX_BENCH_BYTES (lib/limits.ts). */
export const MAX_BENCH_ROWS = 5_000;

/** Temperatures are written with their unit, e.g. "84.2 °C"; only °C is accepted. */
const CELSIUS = /^\s*([-+]?\d+(?:\.\d+)?(?:[eE][-+]?\d+)?)\s*°C\s*$/;

const celsius = (what: string) =>
  z.string().transform((s, ctx) => {
    const m = CELSIUS.exec(s);
    if (!m) {
      ctx.addIssue({ code: "custom", message: `${what} must be a number with the unit °C, e.g. "84.2 °C" (got "${s.trim()}")` });
      return z.NEVER;
    }
    const v = Number(m[1]);
    if (!(v >= -60 && v <= 400)) {
      ctx.addIssue({ code: "custom", message: `${what} ${v} °C is outside −60 … 400 °C` });
      return z.NEVER;
    }
    return v;
  });

/** One CSV row as strings in, typed values out; part and corner ids are checked against the design separately. */
export const benchRowSchema = z
  .object({
    part_id: z.string().trim().min(1, "give the part id (e.g. controller, Q1, Q1.npn)").max(60),
    corner_id: z.string().trim().min(1, "give the corner id").max(40),
    method: z.string().trim().toLowerCase().pipe(z.enum(["thermocouple", "ir"], { message: 'method must be "thermocouple" or "ir"' })),
    measured_at: z.string().trim().toLowerCase().pipe(z.enum(["case", "junction"], { message: 'measured_at must be "case" or "junction"' })),
    temperature: celsius("temperature"),
    ambient: celsius("ambient"),
    note: z.string().trim().max(500).optional().default(""),
  })
  .strict();
export type BenchRow = z.output<typeof benchRowSchema>;

/** The upload form's fields besides the file. */
export const benchUploadFieldsSchema = z.object({ revision: z.coerce.number().int().min(1).max(1_000_000).optional() }).strict();

export const benchParamsSchema = z.object({ optionId: recordIdSchema });
export const benchRunParamsSchema = z.object({ optionId: recordIdSchema, runId: recordIdSchema });

/** Accepting the fit: which parts' fitted resistances go into the new revision. */
export const acceptFitSchema = z
  .object({ parts: z.array(z.string().min(1).max(60)).min(1, "choose at least one part").max(50), note: z.string().trim().max(300).optional() })
  .strict();
export type AcceptFitInput = z.input<typeof acceptFitSchema>;

export const BENCH_TEMPLATE = [
  BENCH_COLUMNS.join(","),
  "controller,vnom,ir,junction,71.5 °C,25.0 °C,package top + ΨJT",
  "Q1,vmin,ir,case,64.0 °C,25.0 °C,",
].join("\n");
