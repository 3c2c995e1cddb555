import "server-only";
import type { Member } from "@/services/auth/member";
import { AppError } from "@/lib/errors";
import { getDesignOptionById, type OptionRecord } from "@/db/queries/options";
import { insertReviewSubmission, listReviewsByOption, updateReviewDecisionById, type NewComment, type ReviewRecord } from "@/db/queries/reviews";
import { mailDecided, mailSubmitted } from "./notify";

// The review steps, shared by the route handlers and the review page's
// server actions. Callers have checked the permission; these load the
// option in the member's workspace and apply the workflow's own rules:
// one review per revision, decisions only on a pending review, and nobody
// decides a revision they submitted themselves (a second pair of eyes).
export async function loadOption(member: Member, optionId: string): Promise<OptionRecord> {
  const option = await getDesignOptionById({ workspaceId: member.workspace.id, optionId });
  if (!option) throw new AppError("not_found", "Not found.");
  return option;
}

export async function submitForReview(member: Member, input: { optionId: string; revision?: number; note?: string }): Promise<ReviewRecord> {
  const option = await loadOption(member, input.optionId);
  if (option.archived) throw new AppError("conflict", "This option is archived; restore it before submitting it for review.");
  const revision = input.revision ?? option.latestRevision;
  const result = await insertReviewSubmission({ workspaceId: member.workspace.id, optionId: option.id, revision, submittedBy: member.user.id, note: input.note ?? "" });
  if (!result.ok && result.reason === "revision_not_found") throw new AppError("not_found", `Option "${option.name}" has no revision ${revision}.`);
  if (!result.ok) throw new AppError("conflict", `Revision ${revision} was already submitted for review. Save a new revision to submit changes.`);
  await mailSubmitted({ workspaceId: member.workspace.id, projectId: option.projectId, optionId: option.id, optionName: option.name, revision, actorName: member.user.displayName, actorEmail: member.user.email, note: input.note });
  return result.review;
}

export async function decideReview(
  member: Member,
  input: { optionId: string; revision: number; decision: "approved" | "rejected"; comments: NewComment[] },
): Promise<ReviewRecord> {
  const option = await loadOption(member, input.optionId);
  const review = (await listReviewsByOption({ workspaceId: member.workspace.id, optionId: option.id })).find((r) => r.revision === input.revision);
  if (!review) throw new AppError("not_found", `Revision ${input.revision} has not been submitted for review.`);
  if (review.submittedBy?.id === member.user.id) throw new AppError("forbidden", "You submitted this revision; another reviewer decides it.");
  const result = await updateReviewDecisionById({ workspaceId: member.workspace.id, reviewId: review.id, status: input.decision, decidedBy: member.user.id, comments: input.comments });
  if (!result.ok && result.reason === "not_found") throw new AppError("not_found", "Not found.");
  if (!result.ok) throw new AppError("conflict", `Revision ${input.revision} was already ${review.status}.`);
  await mailDecided({
    workspaceId: member.workspace.id, projectId: option.projectId, optionId: option.id, optionName: option.name, revision: input.revision,
    actorName: member.user.displayName, actorEmail: member.user.email, decision: input.decision, submitterEmail: review.submittedBy?.email ?? null, comments: input.comments,
  });
  return result.review;
}
