import { loadInWorkspace, route } from "@/app/_lib/access";
import { AppError } from "@/lib/errors";
import { optionParamsSchema, optionPatchSchema } from "@/lib/options/schema";
import { getDesignOptionById, getRevisionByNumber } from "@/db/queries/options";
import { patchOptionLogged } from "@/db/queries/option-changes";

// GET /api/v1/options/:optionId -> { option, revision } (the latest revision, document included)
export const GET = route({ permission: "read", params: optionParamsSchema }, async ({ member, params }) => {
  const option = await loadInWorkspace(member, (workspaceId) => getDesignOptionById({ workspaceId, optionId: params.optionId }));
  const revision = await getRevisionByNumber({ workspaceId: member.workspace.id, optionId: option.id, revision: option.latestRevision });
  return { option, revision };
});

// PATCH /api/v1/options/:optionId { name?, summary?, archived? } -> { option } (renames and archiving are logged)
export const PATCH = route(
  { permission: "option:write", params: optionParamsSchema, body: optionPatchSchema },
  async ({ member, params, body }) => {
    const current = await loadInWorkspace(member, (workspaceId) => getDesignOptionById({ workspaceId, optionId: params.optionId }));
    const option = await patchOptionLogged({ workspaceId: member.workspace.id, optionId: current.id, patch: body, actor: member.user.id });
    if (!option) throw new AppError("not_found", "Not found.");
    return { option };
  },
);
