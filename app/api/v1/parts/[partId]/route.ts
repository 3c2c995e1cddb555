import { loadInWorkspace, route } from "@/app/_lib/access";
import { partParamsSchema, partPatchSchema } from "@/lib/parts/schema";
import { deletePart, updatePart } from "@/services/parts/service";
import { getPartById } from "@/db/queries/parts";

// GET /api/v1/parts/:partId -> { part }
export const GET = route({ permission: "read", params: partParamsSchema }, async ({ member, params }) => {
  const part = await loadInWorkspace(member, (workspaceId) => getPartById({ workspaceId, id: params.partId }));
  return { part };
});

// PATCH /api/v1/parts/:partId { any field of POST } -> { part } (logged in the activity)
// Given params replace the stored ones and are checked, with the kind, as a whole.
export const PATCH = route({ permission: "part:write", params: partParamsSchema, body: partPatchSchema }, async ({ member, params, body }) => ({
  part: await updatePart(member, { partId: params.partId, patch: body }),
}));

// DELETE /api/v1/parts/:partId -> 204 (its datasheet goes with it; logged in the activity)
export const DELETE = route({ permission: "part:write", params: partParamsSchema }, async ({ member, params }) => {
  await deletePart(member, params);
  return undefined;
});
