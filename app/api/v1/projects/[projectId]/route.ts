import { loadInWorkspace, route } from "@/app/_lib/access";
import { projectParamsSchema, projectPatchSchema } from "@/lib/projects/schema";
import { getProjectById } from "@/db/queries/projects";
import { updateProject } from "@/services/projects/service";
import { listOptionsByProject } from "@/db/queries/options";

// GET /api/v1/projects/:projectId -> { project, options }
export const GET = route({ permission: "read", params: projectParamsSchema }, async ({ member, params }) => {
  const project = await loadInWorkspace(member, (workspaceId) => getProjectById({ workspaceId, projectId: params.projectId }));
  const options = await listOptionsByProject({ workspaceId: member.workspace.id, projectId: project.id });
  return { project, options };
});

// PATCH /api/v1/projects/:projectId (any subset of the fields) -> { project }
export const PATCH = route({ permission: "project:write", params: projectParamsSchema, body: projectPatchSchema }, async ({ member, params, body }) => ({
  project: await updateProject(member, { projectId: params.projectId, patch: body }),
}));
