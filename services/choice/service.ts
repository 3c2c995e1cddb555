import "server-only";
import { AppError } from "@/lib/errors";
import type { Member } from "@/services/auth/member";
import { loadInWorkspace } from "@/services/records";
import { mailChosen } from "@/services/review/notify";
import { getProjectById } from "@/db/queries/projects";
import { getDesignOptionById } from "@/db/queries/options";
import { insertOptionChoice, type OptionChoiceRecord } from "@/db/queries/choices";

// The manager's sign-off, one door for the choice route and the compare
// page's server action. The choice is logged in the activity (with the
// insert) and e-mailed to the workspace's designers and reviewers.
const NOT_THIS_PROJECT = () =>
  new AppError("bad_request", "Choose one of this project's options.", [{ path: "optionId", message: "not an option of this project" }]);

export async function chooseOption(
  member: Member,
  input: { projectId: string; optionId: string; revision?: number; reason: string },
): Promise<OptionChoiceRecord> {
  const project = await loadInWorkspace(member, (workspaceId) => getProjectById({ workspaceId, projectId: input.projectId }));
  const workspaceId = member.workspace.id;
  const option = await getDesignOptionById({ workspaceId, optionId: input.optionId });
  if (!option || option.projectId !== project.id || option.archived) throw NOT_THIS_PROJECT();
  const revision = input.revision ?? option.latestRevision;
  const saved = await insertOptionChoice({ workspaceId, projectId: project.id, optionId: option.id, revision, reason: input.reason, chosenBy: member.user.id });
  if (saved === "option_not_found") throw NOT_THIS_PROJECT();
  if (saved === "revision_not_found")
    throw new AppError("bad_request", `Option "${option.name}" has no revision ${revision}.`, [{ path: "revision", message: "no such revision" }]);
  await mailChosen({
    workspaceId,
    projectId: project.id,
    optionId: option.id,
    optionName: option.name,
    revision,
    actorName: member.user.displayName,
    actorEmail: member.user.email,
    reason: input.reason,
  });
  return saved;
}
