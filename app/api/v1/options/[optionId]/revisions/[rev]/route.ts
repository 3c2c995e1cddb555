import { loadInWorkspace, route } from "@/app/_lib/access";
import { revisionParamsSchema } from "@/app/(workspace)/projects/[projectId]/options/schema";
import { getRevisionByNumber } from "@/db/queries/options";

// GET /api/v1/options/:optionId/revisions/:rev -> { revision } (document included)
export const GET = route({ permission: "read", params: revisionParamsSchema }, async ({ member, params }) => {
  const revision = await loadInWorkspace(member, (workspaceId) => getRevisionByNumber({ workspaceId, optionId: params.optionId, revision: params.rev }));
  return { revision };
});
