import { reply, route } from "@/app/_lib/access";
import { projectInputSchema, projectListQuerySchema } from "@/lib/projects/schema";
import { listProjectsByWorkspace } from "@/db/queries/projects";
import { createProject } from "@/services/projects/service";

// GET /api/v1/projects?q=&status=&topology=&sort=&dir=&page=&pageSize=
export const GET = route({ permission: "read", query: projectListQuerySchema }, async ({ member, query }) => {
  const { items, total } = await listProjectsByWorkspace({ workspaceId: member.workspace.id, query });
  return { items, total, page: query.page, pageSize: query.pageSize, pageCount: Math.max(1, Math.ceil(total / query.pageSize)) };
});

// POST /api/v1/projects -> 201 { project }
export const POST = route({ permission: "project:write", body: projectInputSchema }, async ({ member, body }) =>
  reply({ project: await createProject(member, body) }, 201),
);
