import { loadInWorkspace, route } from "@/app/_lib/access";
import { optionParamsSchema, optionPatchSchema } from "@/lib/options/schema";
import { getDesignOptionById, getRevisionByNumber } from "@/db/queries/options";
import { updateOption } from "@/services/options/service";

// GET /api/v1/options/:optionId -> { option, revision } (the latest revision, document included)
export const GET = route({ permission: "read", params: optionParamsSchema }, async ({ member, params }) => {
  const option = await loadInWorkspace(member, (workspaceId) => getDesignOptionById({ workspaceId, optionId: params.optionId }));
  const revision = await getRevisionByNumber({ workspaceId: member.workspace.id, optionId: option.id, revision: option.latestRevision });
  return { option, revision };
});

// PATCH /api/v1/options/:optionId { name?, summary?, archived? } -> { option } (renames and archiving are logged)
export const PATCH = route({ permission: "option:write", params: optionParamsSchema, body: optionPatchSchema }, async ({ member, params, body }) => ({
  option: await updateOption(member, { optionId: params.optionId, patch: body }),
}));
