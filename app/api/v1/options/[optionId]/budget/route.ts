import { loadInWorkspace, route } from "@/app/_lib/access";
import { AppError } from "@/lib/errors";
import { loadLatestEvaluation } from "@/services/evaluation/revision";
import { optionParamsSchema } from "@/lib/options/schema";
import { getDesignOptionById } from "@/db/queries/options";

// GET /api/v1/options/:optionId/budget -> { optionId, projectId, revision, evaluation }
// The evaluation of the latest revision: the numbers the budget dashboard shows.
// A latest revision that no longer parses (e.g. saved before a schema change)
// answers 400 with the issues, so the caller can send the user to the editor.
export const GET = route({ permission: "read", params: optionParamsSchema }, async ({ member, params }) => {
  const option = await loadInWorkspace(member, (workspaceId) => getDesignOptionById({ workspaceId, optionId: params.optionId }));
  const budget = await loadLatestEvaluation({ workspaceId: member.workspace.id, option });
  if (!budget) throw new AppError("not_found", "This option has no saved revision yet.");
  if (!budget.ok) throw new AppError("bad_request", `Revision ${budget.revision.revision} does not evaluate; fix it in the editor.`, budget.issues);
  return { optionId: option.id, projectId: option.projectId, revision: budget.revision.revision, evaluation: budget.evaluation };
});
