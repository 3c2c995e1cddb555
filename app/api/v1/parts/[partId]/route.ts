import { loadInWorkspace, route } from "@/app/_lib/access";
import { AppError } from "@/lib/errors";
import { validatePartDraft, flattenParams } from "@/lib/parts/values";
import { removeObjectQuietly } from "@/services/parts/datasheets";
import { partParamsSchema, partPatchSchema } from "@/lib/parts/schema";
import { deletePartById, getPartById, updatePartById } from "@/db/queries/parts";
import { deleteStoredFileById } from "@/db/queries/files";
import { getDb } from "@/db/knex";
import { insertActivity } from "@/db/queries/activity";

// GET /api/v1/parts/:partId -> { part }
export const GET = route({ permission: "read", params: partParamsSchema }, async ({ member, params }) => {
  const part = await loadInWorkspace(member, (workspaceId) => getPartById({ workspaceId, id: params.partId }));
  return { part };
});

// PATCH /api/v1/parts/:partId { any field of POST } -> { part } (logged in the activity)
// Given params replace the stored ones and are checked, with the kind, as a whole.
export const PATCH = route({ permission: "part:write", params: partParamsSchema, body: partPatchSchema }, async ({ member, params, body }) => {
  const current = await loadInWorkspace(member, (workspaceId) => getPartById({ workspaceId, id: params.partId }));
  const r = validatePartDraft({
    kind: body.kind ?? current.kind,
    manufacturer: body.manufacturer ?? current.manufacturer,
    mpn: body.mpn ?? current.mpn,
    description: body.description ?? current.description,
    unitCost: body.unitCost === undefined ? current.unitCost : body.unitCost,
    params: flattenParams(body.params ?? current.params),
    tolerance: body.tolerance ?? current.tolerance,
  });
  if (!r.ok) throw new AppError("bad_request", "Check the request body.", r.issues);
  const workspaceId = member.workspace.id;
  const part = await getDb().transaction(async (trx) => {
    const updated = await updatePartById({ workspaceId, id: current.id, values: r.value }, trx);
    if (!updated) throw new AppError("not_found", "Not found.");
    const detail = { partId: current.id, mpn: updated.mpn, manufacturer: updated.manufacturer, ...(updated.mpn !== current.mpn ? { previousMpn: current.mpn } : {}) };
    await insertActivity({ workspaceId, projectId: null, actor: member.user.id, action: "part.updated", detail }, trx);
    return updated;
  });
  return { part };
});

// DELETE /api/v1/parts/:partId -> 204 (its datasheet goes with it; logged in the activity)
export const DELETE = route({ permission: "part:write", params: partParamsSchema }, async ({ member, params }) => {
  const workspaceId = member.workspace.id;
  const objectKey = await getDb().transaction(async (trx) => {
    const gone = await deletePartById({ workspaceId, id: params.partId }, trx);
    if (!gone) throw new AppError("not_found", "Not found.");
    await insertActivity({ workspaceId, projectId: null, actor: member.user.id, action: "part.deleted", detail: { partId: params.partId, mpn: gone.mpn, manufacturer: gone.manufacturer } }, trx);
    return gone.datasheetFileId ? deleteStoredFileById({ workspaceId, id: gone.datasheetFileId }, trx) : null;
  });
  if (objectKey) await removeObjectQuietly(objectKey);
  return undefined;
});
