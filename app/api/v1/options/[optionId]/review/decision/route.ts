import { route } from "@/app/_lib/access";
import { decideReview } from "@/services/review/service";
import { optionParamsSchema } from "@/lib/options/schema";
import { reviewDecisionSchema } from "@/lib/review/schema";

// POST /api/v1/options/:optionId/review/decision
//   { revision, decision: "approved" | "rejected", comments: [{ body, targetPart?, targetFigure? }] } -> { review }
// A rejection needs a comment; the submitter gets the decision by e-mail.
// 404 when that revision was not submitted, 409 when already decided,
// 403 for the person who submitted it.
export const POST = route({ permission: "option:review", params: optionParamsSchema, body: reviewDecisionSchema }, async ({ member, params, body }) => {
  const review = await decideReview(member, { optionId: params.optionId, ...body });
  return { review };
});
