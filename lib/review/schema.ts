import { z } from "zod";
import { recordIdSchema } from "../projects/schema";

// The review workflow's inputs, shared by the review page's forms and
// /api/v1/options/:optionId/review. Revisions arrive as form strings too.
const blankToUndefined = (v: unknown) => (typeof v === "string" && v.trim() === "" ? undefined : v);
const revision = z.coerce.number().int().min(1).max(1_000_000);
export const MAX_COMMENTS = 50;

export const reviewSubmitSchema = z
  .object({
    /** Omitted: the option's latest revision. */
    revision: z.preprocess(blankToUndefined, revision.optional()),
    note: z.preprocess(blankToUndefined, z.string().trim().max(2000).optional()),
  })
  .strict();
export type ReviewSubmitInput = z.input<typeof reviewSubmitSchema>;

export const reviewCommentSchema = z
  .object({
    body: z.string().trim().min(1, "write the comment").max(4000),
    /** A part id of the design, e.g. "Q1", "controller", "Q1.npn". */
    targetPart: z.preprocess(blankToUndefined, z.string().trim().max(80).optional()),
    /** A figure, e.g. "Q1 Tj at vin-max". */
    targetFigure: z.preprocess(blankToUndefined, z.string().trim().max(200).optional()),
  })
  .strict();

const asList = (v: unknown) => (v === undefined ? [] : Array.isArray(v) ? v : [v]);

/** The form posts one comment as flat fields (body, targetPart, targetFigure); the API sends comments[]. */
function formToComments(raw: unknown): unknown {
  if (!raw || typeof raw !== "object" || Array.isArray(raw)) return raw;
  const { body, targetPart, targetFigure, ...rest } = raw as Record<string, unknown>;
  if (body === undefined && targetPart === undefined && targetFigure === undefined) return raw;
  const bodies = asList(body), parts = asList(targetPart), figures = asList(targetFigure);
  const comments = bodies
    .map((b, i) => ({ body: b, targetPart: parts[i], targetFigure: figures[i] }))
    .filter((c) => !(typeof c.body === "string" && c.body.trim() === "" && !c.targetPart && !c.targetFigure));
  return { ...rest, comments: [...asList(rest.comments), ...comments] };
}

const decisionObject = z
  .object({
    revision,
    decision: z.enum(["approved", "rejected"], "approve or reject"),
    comments: z.array(reviewCommentSchema).max(MAX_COMMENTS).default([]),
  })
  .strict();

function needsCommentOnReject(d: { decision: string; comments: unknown[] }, ctx: z.RefinementCtx): void {
  if (d.decision === "rejected" && d.comments.length === 0) ctx.addIssue({ code: "custom", path: ["body"], message: "say what has to change: a rejection needs a comment" });
}

export const reviewDecisionSchema = z.preprocess(formToComments, decisionObject.superRefine(needsCommentOnReject));
export type ReviewDecisionInput = z.input<typeof reviewDecisionSchema>;

/** The page's forms also post the option they are for. */
export const reviewSubmitFormSchema = reviewSubmitSchema.extend({ optionId: recordIdSchema });
export const reviewDecisionFormSchema = z.preprocess(formToComments, decisionObject.extend({ optionId: recordIdSchema }).superRefine(needsCommentOnReject));

/** PATCH of a draft revision's note (a frozen revision refuses it). */
export const revisionNotePatchSchema = z.object({ note: z.string().trim().max(2000) }).strict();
