import { loadInWorkspace, route } from "@/app/_lib/access";
import { revisionParamsSchema } from "@/lib/options/schema";
import { getRevisionByNumber } from "@/db/queries/options";
import { updateRevisionNote } from "@/services/options/service";
import { revisionNotePatchSchema } from "@/lib/review/schema";

// GET /api/v1/options/:optionId/revisions/:rev -> { revision } (document included)
export const GET = route({ permission: "read", params: revisionParamsSchema }, async ({ member, params }) => {
  const revision = await loadInWorkspace(member, (workspaceId) => getRevisionByNumber({ workspaceId, optionId: params.optionId, revision: params.rev }));
  return { revision };
});

// PATCH /api/v1/options/:optionId/revisions/:rev { note } -> { revision }
// The only in-place change a revision takes (fixing a draft's note). A revision
// submitted for review is frozen: 409, save a new revision instead.
export const PATCH = route({ permission: "option:write", params: revisionParamsSchema, body: revisionNotePatchSchema }, async ({ member, params, body }) => ({
  revision: await updateRevisionNote(member, { optionId: params.optionId, revision: params.rev, note: body.note }),
}));
