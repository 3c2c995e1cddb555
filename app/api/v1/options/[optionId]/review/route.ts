import { reply, route } from "@/app/_lib/access";
import { loadOption, submitForReview } from "@/services/review/service";
import { optionParamsSchema } from "@/lib/options/schema";
import { reviewSubmitSchema } from "@/lib/review/schema";
import { listReviewsByOption } from "@/db/queries/reviews";

// GET /api/v1/options/:optionId/review -> { optionId, latestRevision, reviews } (newest revision first, with comments)
export const GET = route({ permission: "read", params: optionParamsSchema }, async ({ member, params }) => {
  const option = await loadOption(member, params.optionId);
  return { optionId: option.id, latestRevision: option.latestRevision, reviews: await listReviewsByOption({ workspaceId: member.workspace.id, optionId: option.id }) };
});

// POST /api/v1/options/:optionId/review { revision?, note? } -> 201 { review }
// Freezes the revision and e-mails the workspace's reviewers; 409 when it was already submitted.
export const POST = route({ permission: "option:submit", params: optionParamsSchema, body: reviewSubmitSchema }, async ({ member, params, body }) => {
  const review = await submitForReview(member, { optionId: params.optionId, ...body });
  return reply({ review }, 201);
});
