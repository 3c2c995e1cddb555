import { loadInWorkspace, reply, route } from "@/app/_lib/access";
import { projectParamsSchema } from "@/lib/projects/schema";
import { choiceSchema } from "@/lib/choice/schema";
import { chooseOption } from "@/services/choice/service";
import { getProjectById } from "@/db/queries/projects";
import { getLatestChoiceByProject, listChoicesByProject } from "@/db/queries/choices";

// GET /api/v1/projects/:projectId/choice -> { choice (latest or null), history (newest first) }
export const GET = route({ permission: "read", params: projectParamsSchema }, async ({ member, params }) => {
  const project = await loadInWorkspace(member, (workspaceId) => getProjectById({ workspaceId, projectId: params.projectId }));
  const key = { workspaceId: member.workspace.id, projectId: project.id };
  return { choice: await getLatestChoiceByProject(key), history: await listChoicesByProject(key) };
});

// POST /api/v1/projects/:projectId/choice { optionId, revision?, reason } -> 201 { choice }
// Manager (or admin) only; the option must belong to the project.
export const POST = route({ permission: "option:choose", params: projectParamsSchema, body: choiceSchema }, async ({ member, params, body }) =>
  reply({ choice: await chooseOption(member, { projectId: params.projectId, ...body }) }, 201),
);
