import { loadInWorkspace, route } from "@/app/_lib/access";
import { projectParamsSchema } from "@/lib/projects/schema";
import { getProjectById } from "@/db/queries/projects";
import { listActivityByProject } from "@/db/queries/activity";

// GET /api/v1/projects/:projectId/activity -> { items } (oldest first; the log is append-only)
// Includes the workspace-wide entries (derating policy changes), whose projectId is null.
export const GET = route({ permission: "read", params: projectParamsSchema }, async ({ member, params }) => {
  const project = await loadInWorkspace(member, (workspaceId) => getProjectById({ workspaceId, projectId: params.projectId }));
  return { items: await listActivityByProject({ workspaceId: member.workspace.id, projectId: project.id }) };
});
