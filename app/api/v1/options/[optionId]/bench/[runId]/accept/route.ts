import { reply, route } from "@/app/_lib/access";
import { acceptFitSchema, benchRunParamsSchema } from "@/lib/bench/schema";
import { acceptBenchFit } from "@/services/bench/service";

// POST /api/v1/options/:optionId/bench/:runId/accept { parts: ["controller", …] }
//   -> 201 { revision } : a NEW revision (base = the run's revision) whose
//   document carries each chosen part's fitted RθJA (or RθSA of a MOSFET
//   heatsink chain). 409 when the option moved on since the measured revision.
export const POST = route({ permission: "option:review", params: benchRunParamsSchema, body: acceptFitSchema }, async ({ member, params, body }) =>
  reply({ revision: await acceptBenchFit(member, { ...params, ...body }) }, 201),
);
