import { reply, route } from "@/app/_lib/access";
import { projectInputSchema, projectListQuerySchema } from "@/lib/projects/schema";
import { insertProject, listProjectsByWorkspace } from "@/db/queries/projects";

// GET /api/v1/projects?q=&status=&topology=&sort=&dir=&page=&pageSize=
export const GET = route({ permission: "read", query: projectListQuerySchema }, async ({ member, query }) => {
  const { items, total } = await listProjectsByWorkspace({ workspaceId: member.workspace.id, query });
  return { items, total, page: query.page, pageSize: query.pageSize, pageCount: Math.max(1, Math.ceil(total / query.pageSize)) };
});

// POST /api/v1/projects -> 201 { project }
export const POST = route({ permission: "project:write", body: projectInputSchema }, async ({ member, body }) => {
  const project = await insertProject({ workspaceId: member.workspace.id, values: body, createdBy: member.user.id });
  return reply({ project }, 201);
});
