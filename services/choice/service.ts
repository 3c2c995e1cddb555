import "server-only";
import type { Member } from "@/services/auth/member";
import type { AppErrorCode, FieldIssue } from "@/lib/errors";
import { getDesignOptionById } from "@/db/queries/options";
import { insertOptionChoice, type OptionChoiceRecord } from "@/db/queries/choices";
import { mailChosen } from "@/services/review/notify";

// Shared by the choice route and the compare page's server action: the
// caller has already checked the "option:choose" permission and loaded the
// project in the member's workspace. The choice is logged in the activity
// log and e-mailed to the workspace's designers and reviewers.
export type RecordChoiceResult =
  | { ok: true; choice: OptionChoiceRecord }
  | { ok: false; code: AppErrorCode; message: string; issues: FieldIssue[] };

export async function recordOptionChoice(input: {
  member: Member;
  projectId: string;
  optionId: string;
  revision?: number;
  reason: string;
}): Promise<RecordChoiceResult> {
  const workspaceId = input.member.workspace.id;
  const option = await getDesignOptionById({ workspaceId, optionId: input.optionId });
  if (!option || option.projectId !== input.projectId || option.archived)
    return { ok: false, code: "bad_request", message: "Choose one of this project's options.", issues: [{ path: "optionId", message: "not an option of this project" }] };
  const revision = input.revision ?? option.latestRevision;
  const saved = await insertOptionChoice({ workspaceId, projectId: input.projectId, optionId: option.id, revision, reason: input.reason, chosenBy: input.member.user.id });
  if (saved === "option_not_found") return { ok: false, code: "bad_request", message: "Choose one of this project's options.", issues: [{ path: "optionId", message: "not an option of this project" }] };
  if (saved === "revision_not_found")
    return { ok: false, code: "bad_request", message: `Option "${option.name}" has no revision ${revision}.`, issues: [{ path: "revision", message: "no such revision" }] };
  // Designers and reviewers hear about the sign-off (logged with the choice in insertOptionChoice).
  await mailChosen({
    workspaceId, projectId: input.projectId, optionId: option.id, optionName: option.name, revision,
    actorName: input.member.user.displayName, actorEmail: input.member.user.email, reason: input.reason,
  });
  return { ok: true, choice: saved };
}
