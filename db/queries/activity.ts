import "server-only";
import type { Knex } from "knex";
import { getDb } from "@/db/knex";

// The activity log: append-only (the table's trigger refuses UPDATE and
// DELETE). Revisions are logged by a trigger on option_revision; every other
// change (review, choice, derating, members, tokens, option renames and
// archiving, parts) logs through insertActivity inside the transaction that
// makes the change, so a change and its log entry are written together or
// not at all. A BEFORE INSERT trigger stores the actor's and the option's
// names as they are at that moment (migration 0009), and entries naming
// someone else (a member, a token, a part) carry that name in their detail,
// so a later rename never rewrites how an old entry reads.
export type ActivityAction =
  | "revision.saved"
  | "revision.note_changed"
  | "review.submitted"
  | "review.approved"
  | "review.rejected"
  | "option.chosen"
  | "option.renamed"
  | "option.archived"
  | "option.restored"
  | "derating.changed"
  | "member.role_changed"
  | "member.removed"
  | "token.created"
  | "token.revoked"
  | "part.updated"
  | "part.deleted"
  | "parts.imported";

export interface ActivityEntry {
  id: string;
  projectId: string | null;
  optionId: string | null;
  optionName: string | null;
  revision: number | null;
  actor: { id: string; displayName: string } | null;
  action: string;
  detail: Record<string, unknown>;
  at: string;
}

export interface NewActivity {
  workspaceId: string;
  projectId: string | null;
  optionId?: string | null;
  revision?: number | null;
  actor: string | null;
  action: ActivityAction;
  detail?: Record<string, unknown>;
}

export async function insertActivity(a: NewActivity, db: Knex = getDb()): Promise<void> {
  await db("activity_log").insert({
    workspace_id: a.workspaceId,
    project_id: a.projectId,
    option_id: a.optionId ?? null,
    revision: a.revision ?? null,
    actor: a.actor,
    action: a.action,
    detail: JSON.stringify(a.detail ?? {}),
  });
}

interface ActivityRow {
  id: string;
  project_id: string | null;
  option_id: string | null;
  option_name: string | null;
  revision: number | null;
  actor: string | null;
  actor_name: string | null;
  action: string;
  detail: Record<string, unknown>;
  at: Date;
}

/**
 * A project's log in the order it happened (oldest first), with the
 * workspace-wide entries (derating policy, members, tokens, parts) that
 * apply to it too. Names are the stored ones, never joined live.
 */
export async function listActivityByProject(
  { workspaceId, projectId, limit = 500 }: { workspaceId: string; projectId: string; limit?: number },
  db: Knex = getDb(),
): Promise<ActivityEntry[]> {
  const rows = await db("activity_log as a")
    .where("a.workspace_id", workspaceId)
    .andWhere((q) => q.where("a.project_id", projectId).orWhereNull("a.project_id"))
    .orderBy("a.id", "desc")
    .limit(limit)
    .select<ActivityRow[]>("a.id", "a.project_id", "a.option_id", "a.option_name", "a.revision", "a.actor", "a.actor_name", "a.action", "a.detail", "a.at");
  return rows.reverse().map((r) => ({
    id: String(r.id),
    projectId: r.project_id,
    optionId: r.option_id,
    optionName: r.option_name,
    revision: r.revision,
    actor: r.actor ? { id: r.actor, displayName: r.actor_name ?? "former member" } : null,
    action: r.action,
    detail: r.detail ?? {},
    at: r.at.toISOString(),
  }));
}
