/**
 * The JSON form of a sweep spec (models/sweep.ts SweepSpec without the
 * callbacks), shared by the synchronous sweep API and the background-job
 * API. Only the caps differ: each caller states its own.
 */
import { z } from "zod";
import { LOSS_MECHANISMS } from "../losses";

export function sweepSpecSchema(caps: { maxSteps: number; maxCells: number; per: string }) {
  const axis = z
    .object({
      axis: z.enum(["fsw", "qgScale", "vin", "ambient", "rGate"]),
      from: z.number().finite(),
      to: z.number().finite(),
      steps: z.number().int().min(2).max(caps.maxSteps),
      scale: z.enum(["linear", "log"]).optional(),
      position: z.string().min(1).max(40).optional(),
      edge: z.enum(["both", "on", "off"]).optional(),
    })
    .strict();
  return z
    .object({
      part: z.string().min(1).max(60),
      metric: z.enum(["rise", "tj", "loss"]).optional(),
      mechanism: z.enum(LOSS_MECHANISMS).optional(),
      corner: z.string().min(1).max(60).optional(),
      x: axis,
      y: axis,
      limit: z.number().finite().optional(),
    })
    .strict()
    .refine((s) => s.x.axis !== s.y.axis, { message: "x and y must be different axes", path: ["y", "axis"] })
    .refine((s) => s.x.steps * s.y.steps <= caps.maxCells, { message: `at most ${caps.maxCells} cells per ${caps.per}`, path: ["y", "steps"] });
}
