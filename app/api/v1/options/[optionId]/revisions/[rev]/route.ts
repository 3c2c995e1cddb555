import { loadInWorkspace, route } from "@/app/_lib/access";
import { revisionParamsSchema } from "@/lib/options/schema";
import { getRevisionByNumber } from "@/db/queries/options";
import { AppError } from "@/lib/errors";
import { updateRevisionNoteByNumber } from "@/db/queries/revision-notes";
import { revisionNotePatchSchema } from "@/lib/review/schema";

// GET /api/v1/options/:optionId/revisions/:rev -> { revision } (document included)
export const GET = route({ permission: "read", params: revisionParamsSchema }, async ({ member, params }) => {
  const revision = await loadInWorkspace(member, (workspaceId) => getRevisionByNumber({ workspaceId, optionId: params.optionId, revision: params.rev }));
  return { revision };
});

// PATCH /api/v1/options/:optionId/revisions/:rev { note } -> { revision }
// The only in-place change a revision takes (fixing a draft's note). A revision
// submitted for review is frozen: 409, save a new revision instead.
export const PATCH = route(
  { permission: "option:write", params: revisionParamsSchema, body: revisionNotePatchSchema },
  async ({ member, params, body }) => {
    const key = { workspaceId: member.workspace.id, optionId: params.optionId, revision: params.rev };
    const result = await updateRevisionNoteByNumber({ ...key, note: body.note, actor: member.user.id });
    if (result === "not_found") throw new AppError("not_found", "Not found.");
    if (result === "frozen") throw new AppError("conflict", `Revision ${params.rev} is frozen for review and cannot change; save a new revision instead.`);
    return { revision: await getRevisionByNumber(key) };
  },
);
