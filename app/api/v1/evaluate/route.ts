import { z } from "zod";
import { route } from "@/app/_lib/access";
import { assertFinite } from "@/lib/finite";
import { compareOptions, evaluateDesign } from "@/models";
import { designInputSchema } from "@/models/input";

// POST a design option document (unit strings or SI numbers); answers the
// full budget. With `baseline`, also the comparison figure: how many watts
// and kelvin leave the controller relative to that baseline option.
const bodySchema = z
  .object({
    design: designInputSchema,
    baseline: designInputSchema.optional(),
    corners: z.array(z.string().min(1)).max(64).optional(),
  })
  .strict();

export const POST = route({ permission: "read", body: bodySchema }, async ({ body }) => {
  const evaluation = evaluateDesign(body.design, { corners: body.corners });
  let comparison = null;
  if (body.baseline) {
    const base = evaluateDesign(body.baseline, { corners: body.corners });
    comparison = compareOptions(
      [
        { id: "baseline", name: body.baseline.name, evaluation: base },
        { id: "design", name: body.design.name, evaluation },
      ],
      "baseline",
    ).find((c) => c.id === "design")?.vsBaseline ?? null;
  }
  const result = { evaluation, comparison };
  assertFinite(result);
  return result;
});
