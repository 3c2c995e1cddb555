import { z } from "zod";
import { route } from "@/app/_lib/access";
import { AppError } from "@/app/_lib/errors";
import { assertFinite } from "@/app/_lib/finite";
import { LOSS_MECHANISMS, designInputSchema } from "@/models";
import { SweepSpecError, sweepGrid } from "@/models/sweep";

// POST { design, spec }: one metric of one part over a two-axis grid, with
// the limit contour and the design point. Grid size is capped so a request
// stays a request; larger sweeps belong to the browser's worker or a job.
const MAX_CELLS = 250 * 250;

const axisSchema = z
  .object({
    axis: z.enum(["fsw", "qgScale", "vin", "ambient", "rGate"]),
    from: z.number().finite(),
    to: z.number().finite(),
    steps: z.number().int().min(2).max(400),
    scale: z.enum(["linear", "log"]).optional(),
    position: z.string().min(1).max(40).optional(),
    edge: z.enum(["both", "on", "off"]).optional(),
  })
  .strict();

const bodySchema = z
  .object({
    design: designInputSchema,
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
      .refine((s) => s.x.steps * s.y.steps <= MAX_CELLS, { message: `at most ${MAX_CELLS} cells per request`, path: ["y", "steps"] }),
  })
  .strict();

export const POST = route({ permission: "read", body: bodySchema }, async ({ body }) => {
  try {
    const result = sweepGrid(body.design, body.spec);
    assertFinite(result);
    return result;
  } catch (e) {
    // A spec that names a part or position the design lacks is the caller's error.
    if (e instanceof SweepSpecError) {
      throw new AppError("bad_request", e.message, [{ path: "spec", message: e.message }]);
    }
    throw e;
  }
});
