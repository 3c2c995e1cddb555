import { loadInWorkspace, reply, route } from "@/app/_lib/access";
import { projectParamsSchema } from "@/lib/projects/schema";
import { optionCreateSchema } from "@/lib/options/schema";
import { createOption } from "@/services/options/service";
import { getProjectById } from "@/db/queries/projects";
import { listOptionsByProject } from "@/db/queries/options";

// GET /api/v1/projects/:projectId/options -> { items }
export const GET = route({ permission: "read", params: projectParamsSchema }, async ({ member, params }) => {
  const project = await loadInWorkspace(member, (workspaceId) => getProjectById({ workspaceId, projectId: params.projectId }));
  return { items: await listOptionsByProject({ workspaceId: member.workspace.id, projectId: project.id }) };
});

// POST /api/v1/projects/:projectId/options { name, summary?, template | document } -> 201 { option }
export const POST = route({ permission: "option:write", params: projectParamsSchema, body: optionCreateSchema }, async ({ member, params, body }) =>
  reply({ option: await createOption(member, { projectId: params.projectId, ...body }) }, 201),
);
