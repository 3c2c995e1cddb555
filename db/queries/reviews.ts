import "server-only";
import type { Knex } from "knex";
import { getDb } from "@/db/knex";
import { insertActivity } from "./activity";
import { newTimeOrderedId } from "@/db/ids";

// Reviews of option revisions and the reviewer's comments. One review per
// (option, revision): submitting freezes the revision in the same
// transaction, so what the reviewer reads can no longer change (the
// option_revision trigger refuses in-place edits of a frozen row). Every
// function takes the workspace id; another workspace's review is not found.
export type ReviewStatus = "submitted" | "approved" | "rejected";

export interface ReviewComment {
  id: string;
  body: string;
  targetPart: string | null;
  targetFigure: string | null;
  author: { id: string; displayName: string } | null;
  createdAt: string;
}

export interface ReviewRecord {
  id: string;
  projectId: string;
  optionId: string;
  revision: number;
  status: ReviewStatus;
  submittedBy: { id: string; displayName: string; email: string } | null;
  submittedAt: string;
  decidedBy: { id: string; displayName: string } | null;
  decidedAt: string | null;
  comments: ReviewComment[];
}

interface ReviewRow {
  id: string;
  project_id: string;
  option_id: string;
  revision: number;
  status: ReviewStatus;
  submitted_by: string | null;
  submitter_name: string | null;
  submitter_email: string | null;
  submitted_at: Date;
  decided_by: string | null;
  decider_name: string | null;
  decided_at: Date | null;
}


function reviewQuery(db: Knex, workspaceId: string) {
  return db("option_review as r")
    .leftJoin("auth_user as s", "s.id", "r.submitted_by")
    .leftJoin("auth_user as d", "d.id", "r.decided_by")
    .where("r.workspace_id", workspaceId)
    .select<ReviewRow[]>("r.*", "s.display_name as submitter_name", "s.email as submitter_email", "d.display_name as decider_name");
}

async function withComments(rows: ReviewRow[], db: Knex): Promise<ReviewRecord[]> {
  const ids = rows.map((r) => r.id);
  const comments = ids.length
    ? await db("review_comment as c").leftJoin("auth_user as u", "u.id", "c.author_id").whereIn("c.review_id", ids).orderBy([{ column: "c.created_at" }, { column: "c.id" }])
        .select<{ id: string; review_id: string; body: string; target_part: string | null; target_figure: string | null; author_id: string | null; author_name: string | null; created_at: Date }[]>(
          "c.*", "u.display_name as author_name")
    : [];
  return rows.map((r) => ({
    id: r.id,
    projectId: r.project_id,
    optionId: r.option_id,
    revision: r.revision,
    status: r.status,
    submittedBy: r.submitted_by ? { id: r.submitted_by, displayName: r.submitter_name ?? "", email: r.submitter_email ?? "" } : null,
    submittedAt: r.submitted_at.toISOString(),
    decidedBy: r.decided_by ? { id: r.decided_by, displayName: r.decider_name ?? "" } : null,
    decidedAt: r.decided_at?.toISOString() ?? null,
    comments: comments.filter((c) => c.review_id === r.id).map((c) => ({
      id: c.id,
      body: c.body,
      targetPart: c.target_part,
      targetFigure: c.target_figure,
      author: c.author_id ? { id: c.author_id, displayName: c.author_name ?? "" } : null,
      createdAt: c.created_at.toISOString(),
    })),
  }));
}

/** Every review of an option, newest revision first, with comments. */
export async function listReviewsByOption({ workspaceId, optionId }: { workspaceId: string; optionId: string }, db: Knex = getDb()): Promise<ReviewRecord[]> {
  const rows = await reviewQuery(db, workspaceId).andWhere("r.option_id", optionId).orderBy("r.revision", "desc");
  return withComments(rows, db);
}

export async function getReviewById({ workspaceId, reviewId }: { workspaceId: string; reviewId: string }, db: Knex = getDb()): Promise<ReviewRecord | null> {
  const rows = await reviewQuery(db, workspaceId).andWhere("r.id", reviewId);
  return (await withComments(rows, db))[0] ?? null;
}

export type SubmitResult = { ok: true; review: ReviewRecord } | { ok: false; reason: "revision_not_found" | "already_submitted" };

/** Freezes the revision and opens its review; logged in the same transaction. */
export async function insertReviewSubmission(
  { workspaceId, optionId, revision, submittedBy, note }: { workspaceId: string; optionId: string; revision: number; submittedBy: string; note: string },
  db: Knex = getDb(),
): Promise<SubmitResult> {
  return db.transaction(async (trx): Promise<SubmitResult> => {
    const rev = await trx("option_revision as r")
      .join("design_option as o", "o.id", "r.option_id")
      .where({ "o.workspace_id": workspaceId, "r.option_id": optionId, "r.revision": revision })
      .forUpdate()
      .first<{ project_id: string } | undefined>("o.project_id");
    if (!rev) return { ok: false, reason: "revision_not_found" };
    const existing = await trx("option_review").where({ option_id: optionId, revision }).first("id");
    if (existing) return { ok: false, reason: "already_submitted" };
    const id = newTimeOrderedId("rvw");
    await trx("option_revision").where({ option_id: optionId, revision }).update({ frozen: true });
    await trx("option_review").insert({ id, workspace_id: workspaceId, project_id: rev.project_id, option_id: optionId, revision, status: "submitted", submitted_by: submittedBy });
    await insertActivity({ workspaceId, projectId: rev.project_id, optionId, revision, actor: submittedBy, action: "review.submitted", detail: note ? { note } : {} }, trx);
    return { ok: true, review: (await getReviewById({ workspaceId, reviewId: id }, trx))! };
  });
}

export interface NewComment {
  body: string;
  targetPart?: string | null;
  targetFigure?: string | null;
}

export type DecideResult = { ok: true; review: ReviewRecord } | { ok: false; reason: "not_found" | "already_decided" };

/** The reviewer's decision with its comments; only a review still "submitted" can be decided. */
export async function updateReviewDecisionById(
  { workspaceId, reviewId, status, decidedBy, comments }: { workspaceId: string; reviewId: string; status: "approved" | "rejected"; decidedBy: string; comments: NewComment[] },
  db: Knex = getDb(),
): Promise<DecideResult> {
  return db.transaction(async (trx): Promise<DecideResult> => {
    const review = await trx("option_review").where({ id: reviewId, workspace_id: workspaceId }).forUpdate().first<{ status: ReviewStatus; project_id: string; option_id: string; revision: number } | undefined>();
    if (!review) return { ok: false, reason: "not_found" };
    if (review.status !== "submitted") return { ok: false, reason: "already_decided" };
    await trx("option_review").where({ id: reviewId }).update({ status, decided_by: decidedBy, decided_at: trx.fn.now() });
    if (comments.length) {
      await trx("review_comment").insert(comments.map((c) => ({
        id: newTimeOrderedId("rvc"), review_id: reviewId, option_id: review.option_id, revision: review.revision, author_id: decidedBy,
        body: c.body, target_part: c.targetPart ?? null, target_figure: c.targetFigure ?? null,
      })));
    }
    await insertActivity({
      workspaceId, projectId: review.project_id, optionId: review.option_id, revision: review.revision, actor: decidedBy,
      action: status === "approved" ? "review.approved" : "review.rejected", detail: { reviewId, comments: comments.length },
    }, trx);
    return { ok: true, review: (await getReviewById({ workspaceId, reviewId }, trx))! };
  });
}

/** E-mail addresses of the workspace's members with one of the roles. */
export async function listMemberEmailsByRoles({ workspaceId, roles }: { workspaceId: string; roles: readonly string[] }, db: Knex = getDb()): Promise<string[]> {
  const rows = await db("membership as m").join("auth_user as u", "u.id", "m.user_id").where("m.workspace_id", workspaceId).whereIn("m.role", roles).select<{ email: string }[]>("u.email");
  return [...new Set(rows.map((r) => r.email))];
}
