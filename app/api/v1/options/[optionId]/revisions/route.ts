import { loadInWorkspace, reply, route } from "@/app/_lib/access";
import { AppError } from "@/lib/errors";
import { optionParamsSchema, revisionSaveSchema } from "@/lib/options/schema";
import { getDesignOptionById, listRevisionsByOption } from "@/db/queries/options";
import { insertRevisionOnBase, listKnownPartIds } from "@/db/queries/option-revisions";

// GET /api/v1/options/:optionId/revisions -> { items } (newest first, without documents)
export const GET = route({ permission: "read", params: optionParamsSchema }, async ({ member, params }) => {
  const option = await loadInWorkspace(member, (workspaceId) => getDesignOptionById({ workspaceId, optionId: params.optionId }));
  return { latestRevision: option.latestRevision, items: await listRevisionsByOption({ workspaceId: member.workspace.id, optionId: option.id }) };
});

// POST /api/v1/options/:optionId/revisions { baseRevision, document, partRefs, note }
//   -> 201 { revision } | 409 when someone saved after baseRevision
export const POST = route(
  { permission: "option:write", params: optionParamsSchema, body: revisionSaveSchema },
  async ({ member, params, body }) => {
    const option = await loadInWorkspace(member, (workspaceId) => getDesignOptionById({ workspaceId, optionId: params.optionId }));
    const refs = Object.entries(body.partRefs);
    const known = await listKnownPartIds({ workspaceId: member.workspace.id, ids: refs.map(([, id]) => id) });
    const unknown = refs.filter(([, id]) => !known.has(id)).map(([path]) => ({ path: `partRefs.${path}`, message: "no such part in this workspace's library" }));
    if (unknown.length) throw new AppError("bad_request", "Check the request body.", unknown);
    const saved = await insertRevisionOnBase({ workspaceId: member.workspace.id, optionId: option.id, ...body, createdBy: member.user.id });
    if (!saved.ok && saved.reason === "not_found") throw new AppError("not_found", "Not found.");
    if (!saved.ok)
      throw new AppError("conflict", `Revision ${saved.latestRevision} was saved after revision ${body.baseRevision}, which your edits started from. Nothing was saved.`);
    return reply({ revision: { revision: saved.revision, createdAt: saved.createdAt, note: body.note } }, 201);
  },
);
