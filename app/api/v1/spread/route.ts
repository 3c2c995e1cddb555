import { z } from "zod";
import { route } from "@/app/_lib/access";
import { AppError } from "@/lib/errors";
import { assertFinite } from "@/lib/finite";
import { designInputSchema } from "@/models/input";
import { monteCarlo } from "@/models/spread";

// POST { design, samples, seed, corner? }: seeded Monte Carlo over part
// tolerances; the same seed gives the same numbers.
const MAX_SAMPLES = 5_000;

const bodySchema = z
  .object({
    design: designInputSchema,
    samples: z.number().int().min(1).max(MAX_SAMPLES),
    seed: z.number().int().min(0).max(2 ** 32 - 1),
    corner: z.string().min(1).max(60).optional(),
  })
  .strict();

export const POST = route({ permission: "read", body: bodySchema }, async ({ body }) => {
  if (body.corner && body.corner !== "worst" && body.corner !== "all" && !body.design.corners.some((c) => c.id === body.corner)) {
    throw new AppError("bad_request", `No corner "${body.corner}" in this design.`, [{ path: "corner", message: "unknown corner id" }]);
  }
  const result = monteCarlo(body.design, { samples: body.samples, seed: body.seed, corner: body.corner });
  assertFinite(result);
  return result;
});
