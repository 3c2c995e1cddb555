import { loadInWorkspace, route } from "@/app/_lib/access";
import { AppError } from "@/lib/errors";
import { projectParamsSchema, projectPatchSchema, vinOrderIssues } from "@/lib/projects/schema";
import { getProjectById, updateProjectById } from "@/db/queries/projects";
import { listOptionsByProject } from "@/db/queries/options";

// GET /api/v1/projects/:projectId -> { project, options }
export const GET = route({ permission: "read", params: projectParamsSchema }, async ({ member, params }) => {
  const project = await loadInWorkspace(member, (workspaceId) => getProjectById({ workspaceId, projectId: params.projectId }));
  const options = await listOptionsByProject({ workspaceId: member.workspace.id, projectId: project.id });
  return { project, options };
});

// PATCH /api/v1/projects/:projectId (any subset of the fields) -> { project }
export const PATCH = route(
  { permission: "project:write", params: projectParamsSchema, body: projectPatchSchema },
  async ({ member, params, body }) => {
    const current = await loadInWorkspace(member, (workspaceId) => getProjectById({ workspaceId, projectId: params.projectId }));
    const issues = vinOrderIssues({ ...current, ...body });
    if (issues.length) throw new AppError("bad_request", "Check the request body.", issues);
    const project = await updateProjectById({ workspaceId: member.workspace.id, projectId: current.id, patch: body });
    if (!project) throw new AppError("not_found", "Not found.");
    return { project };
  },
);
