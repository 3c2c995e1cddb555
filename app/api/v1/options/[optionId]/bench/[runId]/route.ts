import { loadInWorkspace, route } from "@/app/_lib/access";
import { loadRunCorrelation } from "@/services/bench/service";
import { benchRunParamsSchema } from "@/lib/bench/schema";
import { getBenchRunById } from "@/db/queries/bench";

// GET /api/v1/options/:optionId/bench/:runId -> { run, correlation }
// Per part: every reading with the model's prediction at that corner and the
// bench ambient, the difference, the band flag, and the least-squares fit.
export const GET = route({ permission: "read", params: benchRunParamsSchema }, async ({ member, params }) => {
  const run = await loadInWorkspace(member, (workspaceId) => getBenchRunById({ workspaceId, optionId: params.optionId, runId: params.runId }));
  const { correlation } = await loadRunCorrelation({ workspaceId: member.workspace.id, run });
  return { run, correlation };
});
