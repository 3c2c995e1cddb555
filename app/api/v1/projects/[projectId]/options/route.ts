import { loadInWorkspace, reply, route } from "@/app/_lib/access";
import { AppError } from "@/lib/errors";
import { projectParamsSchema } from "@/lib/projects/schema";
import { optionCreateSchema } from "@/lib/options/schema";
import { templateDocument } from "@/services/options/templates";
import { getProjectById } from "@/db/queries/projects";
import { insertOptionWithFirstRevision, listOptionsByProject } from "@/db/queries/options";

// GET /api/v1/projects/:projectId/options -> { items }
export const GET = route({ permission: "read", params: projectParamsSchema }, async ({ member, params }) => {
  const project = await loadInWorkspace(member, (workspaceId) => getProjectById({ workspaceId, projectId: params.projectId }));
  return { items: await listOptionsByProject({ workspaceId: member.workspace.id, projectId: project.id }) };
});

// POST /api/v1/projects/:projectId/options { name, summary?, template | document } -> 201 { option }
export const POST = route(
  { permission: "option:write", params: projectParamsSchema, body: optionCreateSchema },
  async ({ member, params, body }) => {
    const project = await loadInWorkspace(member, (workspaceId) => getProjectById({ workspaceId, projectId: params.projectId }));
    const document = body.template !== undefined ? templateDocument(body.template) : body.document;
    if (document === undefined) throw new AppError("bad_request", "Check the request body.", [{ path: "template", message: "no such template" }]);
    const option = await insertOptionWithFirstRevision({
      workspaceId: member.workspace.id,
      projectId: project.id,
      name: body.name,
      summary: body.summary,
      document,
      note: body.template !== undefined ? `Started from the "${body.template}" template` : "First revision",
      createdBy: member.user.id,
    });
    return reply({ option }, 201);
  },
);
