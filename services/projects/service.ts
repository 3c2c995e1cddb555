import "server-only";
import { AppError } from "@/lib/errors";
import { vinOrderIssues, type ProjectPatch, type ProjectValues } from "@/lib/projects/schema";
import type { Member } from "@/services/auth/member";
import { loadInWorkspace } from "@/services/records";
import { getProjectById, insertProject, updateProjectById, type ProjectRecord } from "@/db/queries/projects";

// Projects: the one door for creating and changing one, used by
// /api/v1/projects and the new-project page's server action.

export async function createProject(member: Member, values: ProjectValues): Promise<ProjectRecord> {
  return insertProject({ workspaceId: member.workspace.id, values, createdBy: member.user.id });
}

/** Any subset of the fields; the merged record must keep Vin min ≤ nom ≤ max. */
export async function updateProject(member: Member, input: { projectId: string; patch: ProjectPatch }): Promise<ProjectRecord> {
  const current = await loadInWorkspace(member, (workspaceId) => getProjectById({ workspaceId, projectId: input.projectId }));
  const issues = vinOrderIssues({ ...current, ...input.patch });
  if (issues.length) throw new AppError("bad_request", "Check the request body.", issues);
  const project = await updateProjectById({ workspaceId: member.workspace.id, projectId: current.id, patch: input.patch });
  if (!project) throw new AppError("not_found", "Not found.");
  return project;
}
