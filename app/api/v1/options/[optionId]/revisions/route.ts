import { loadInWorkspace, reply, route } from "@/app/_lib/access";
import { optionParamsSchema, revisionSaveSchema } from "@/lib/options/schema";
import { getDesignOptionById, listRevisionsByOption } from "@/db/queries/options";
import { saveRevision } from "@/services/options/service";

// GET /api/v1/options/:optionId/revisions -> { items } (newest first, without documents)
export const GET = route({ permission: "read", params: optionParamsSchema }, async ({ member, params }) => {
  const option = await loadInWorkspace(member, (workspaceId) => getDesignOptionById({ workspaceId, optionId: params.optionId }));
  return { latestRevision: option.latestRevision, items: await listRevisionsByOption({ workspaceId: member.workspace.id, optionId: option.id }) };
});

// POST /api/v1/options/:optionId/revisions { baseRevision, document, partRefs, note }
//   -> 201 { revision } | 409 when someone saved after baseRevision
export const POST = route({ permission: "option:write", params: optionParamsSchema, body: revisionSaveSchema }, async ({ member, params, body }) =>
  reply({ revision: await saveRevision(member, { optionId: params.optionId, ...body }) }, 201),
);
