"use server";

import { revalidatePath } from "next/cache";
import { action } from "@/app/_lib/access";
import { decideReview, submitForReview } from "@/services/review/service";
import { reviewDecisionFormSchema, reviewSubmitFormSchema } from "@/lib/review/schema";

const pagePath = (projectId: string, optionId: string) => `/projects/${projectId}/options/${optionId}/review`;

export const submitReviewAction = action({ permission: "option:submit", schema: reviewSubmitFormSchema }, async (input, member) => {
  const review = await submitForReview(member, input);
  revalidatePath(pagePath(review.projectId, review.optionId));
  return { ok: true, message: `Revision ${review.revision} is submitted and frozen. The reviewers have been e-mailed.` };
});

export const decideReviewAction = action({ permission: "option:review", schema: reviewDecisionFormSchema }, async (input, member) => {
  const review = await decideReview(member, input);
  revalidatePath(pagePath(review.projectId, review.optionId));
  return { ok: true, message: `Revision ${review.revision} ${review.status}. The designer has been e-mailed.` };
});
