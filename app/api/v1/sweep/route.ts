import { z } from "zod";
import { route } from "@/app/_lib/access";
import { AppError } from "@/lib/errors";
import { assertFinite } from "@/lib/finite";
import { designInputSchema } from "@/models/input";
import { sweepSpecSchema } from "@/models/input/sweepSchema";
import { SweepSpecError, sweepGrid } from "@/models/sweep";

// POST { design, spec }: one metric of one part over a two-axis grid, with
// the limit contour and the design point. Grid size is capped so a request
// stays a request; larger sweeps belong to the browser's worker or a job.
const MAX_CELLS = 250 * 250;

const bodySchema = z
  .object({
    design: designInputSchema,
    spec: sweepSpecSchema({ maxSteps: 400, maxCells: MAX_CELLS, per: "request" }),
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
