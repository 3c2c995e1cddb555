import "server-only";
import type { Knex } from "knex";
import { getDb } from "@/db/knex";

// The review state of one option revision, for reports. The review workflow
// owns its tables (option_review and its comments); this module only reads
// them and does not assume their exact columns: it looks the tables and
// columns up first and answers `null` when there is no review record at all
// (the report then says "not reviewed"). Rows are matched by option id,
// which is unique across workspaces, after the caller loaded the option in
// the member's workspace.
export interface ReviewEntry {
  status: string | null;
  text: string | null;
  by: string | null;
  at: string | null;
}

export interface ReviewSummary {
  decisions: ReviewEntry[];
  comments: ReviewEntry[];
}

const STATUS_COLS = ["status", "state", "decision", "outcome"];
const TEXT_COLS = ["comment", "body", "text", "note", "reason", "message"];
// Several may exist (a review is submitted by one person and decided by another): the first non-null wins.
const BY_COLS = ["decided_by", "author_id", "created_by", "reviewer_id", "submitted_by", "user_id"];
const AT_COLS = ["decided_at", "created_at", "submitted_at", "updated_at"];

async function columnsOf(db: Knex, table: string): Promise<string[]> {
  const rows = await db("information_schema.columns").where({ table_name: table, table_schema: db.raw("current_schema()") }).select<{ column_name: string }[]>("column_name");
  return rows.map((r) => r.column_name);
}

async function readEntries(db: Knex, table: string, { optionId, revision }: { optionId: string; revision: number }): Promise<ReviewEntry[] | null> {
  const cols = await columnsOf(db, table);
  if (!cols.includes("option_id")) return null;
  const pick = (names: string[]) => names.find((n) => cols.includes(n)) ?? null;
  const first = (names: string[]) => {
    const present = names.filter((n) => cols.includes(n)).map((n) => `t.${n}`);
    return present.length ? `coalesce(${present.join(", ")})` : null;
  };
  const status = pick(STATUS_COLS), text = pick(TEXT_COLS), by = first(BY_COLS), at = first(AT_COLS);
  const q = db(`${table} as t`).where("t.option_id", optionId);
  if (cols.includes("revision")) q.andWhere("t.revision", revision);
  if (by) q.leftJoin("auth_user as u", "u.id", db.raw(by));
  if (at) q.orderByRaw(`${at} asc`);
  const rows = await q.limit(200).select<Record<string, unknown>[]>(
    db.raw(status ? `t.${status}::text as status` : "null as status"),
    db.raw(text ? `t.${text}::text as text` : "null as text"),
    db.raw(by ? "u.display_name as by" : "null as by"),
    db.raw(at ? `${at} as at` : "null as at"),
  );
  return rows.map((r) => ({
    status: (r.status as string | null) ?? null,
    text: (r.text as string | null) ?? null,
    by: (r.by as string | null) ?? null,
    at: r.at instanceof Date ? r.at.toISOString() : ((r.at as string | null) ?? null),
  }));
}

export async function getReviewSummaryByRevision({ optionId, revision }: { optionId: string; revision: number }, db: Knex = getDb()): Promise<ReviewSummary | null> {
  try {
    const tables = await db("information_schema.tables")
      .where({ table_schema: db.raw("current_schema()") })
      .whereIn("table_name", ["option_review", "option_review_comment", "review_comment", "option_comment"])
      .select<{ table_name: string }[]>("table_name");
    const names = new Set(tables.map((t) => t.table_name));
    if (!names.has("option_review")) return null;
    const decisions = (await readEntries(db, "option_review", { optionId, revision })) ?? [];
    const commentTable = ["option_review_comment", "review_comment", "option_comment"].find((t) => names.has(t));
    const comments = commentTable ? ((await readEntries(db, commentTable, { optionId, revision })) ?? []) : [];
    return decisions.length || comments.length ? { decisions, comments } : null;
  } catch (e) {
    // A review schema this reader does not understand must not break the report.
    console.error("report: could not read the review record:", e);
    return null;
  }
}
