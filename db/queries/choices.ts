import "server-only";
import type { Knex } from "knex";
import { getDb } from "@/db/knex";
import { insertActivity } from "./activity";
import { newTimeOrderedId } from "@/db/ids";

// The manager's recorded choice of design option per project. Append-only:
// a new choice is a new row and the latest one wins, so the sign-off history
// can be shown and audited. Every function takes the workspace id, so a
// caller from another workspace finds nothing.
export interface OptionChoiceRecord {
  id: string;
  projectId: string;
  optionId: string;
  optionName: string;
  revision: number;
  reason: string;
  chosenBy: { id: string; displayName: string };
  chosenAt: Date;
}

interface ChoiceRow {
  id: string;
  project_id: string;
  option_id: string;
  option_name: string;
  revision: number;
  reason: string;
  chosen_by: string;
  chosen_by_name: string;
  chosen_at: Date;
}

const columns = [
  "c.id",
  "c.project_id",
  "c.option_id",
  "o.name as option_name",
  "c.revision",
  "c.reason",
  "c.chosen_by",
  "u.display_name as chosen_by_name",
  "c.chosen_at",
];

function toChoice(r: ChoiceRow): OptionChoiceRecord {
  return {
    id: r.id,
    projectId: r.project_id,
    optionId: r.option_id,
    optionName: r.option_name,
    revision: r.revision,
    reason: r.reason,
    chosenBy: { id: r.chosen_by, displayName: r.chosen_by_name },
    chosenAt: r.chosen_at,
  };
}

function baseQuery(db: Knex, { workspaceId, projectId }: { workspaceId: string; projectId: string }) {
  return db("option_choice as c")
    .join("design_option as o", "o.id", "c.option_id")
    .join("auth_user as u", "u.id", "c.chosen_by")
    .where({ "c.workspace_id": workspaceId, "c.project_id": projectId })
    .orderBy([
      { column: "c.chosen_at", order: "desc" },
      { column: "c.id", order: "desc" },
    ]);
}

export async function getLatestChoiceByProject(
  key: { workspaceId: string; projectId: string },
  db: Knex = getDb(),
): Promise<OptionChoiceRecord | null> {
  const row = await baseQuery(db, key).first<ChoiceRow | undefined>(columns);
  return row ? toChoice(row) : null;
}

/** Newest first; the first entry is the choice in force. */
export async function listChoicesByProject(
  key: { workspaceId: string; projectId: string; limit?: number },
  db: Knex = getDb(),
): Promise<OptionChoiceRecord[]> {
  const rows = await baseQuery(db, key)
    .limit(key.limit ?? 20)
    .select<ChoiceRow[]>(columns);
  return rows.map(toChoice);
}

/**
 * Records a choice. The option must belong to the project and workspace and
 * the revision must exist; otherwise nothing is written and null comes back
 * (the caller answers 404 / 409). The id sorts by time so two choices in the
 * same millisecond still have an order.
 */
export async function insertOptionChoice(
  input: { workspaceId: string; projectId: string; optionId: string; revision: number; reason: string; chosenBy: string },
  db: Knex = getDb(),
): Promise<OptionChoiceRecord | "option_not_found" | "revision_not_found"> {
  return db.transaction(async (trx) => {
    const option = await trx("design_option")
      .where({ id: input.optionId, project_id: input.projectId, workspace_id: input.workspaceId, archived: false })
      .first<{ id: string } | undefined>("id");
    if (!option) return "option_not_found";
    const rev = await trx("option_revision").where({ option_id: input.optionId, revision: input.revision }).first<{ revision: number } | undefined>("revision");
    if (!rev) return "revision_not_found";
    const id = newTimeOrderedId("chc");
    await trx("option_choice").insert({
      id,
      workspace_id: input.workspaceId,
      project_id: input.projectId,
      option_id: input.optionId,
      revision: input.revision,
      reason: input.reason,
      chosen_by: input.chosenBy,
    });
    await insertActivity(
      { workspaceId: input.workspaceId, projectId: input.projectId, optionId: input.optionId, revision: input.revision, actor: input.chosenBy, action: "option.chosen", detail: { choiceId: id, reason: input.reason } },
      trx,
    );
    const row = await trx("option_choice as c")
      .join("design_option as o", "o.id", "c.option_id")
      .join("auth_user as u", "u.id", "c.chosen_by")
      .where("c.id", id)
      .first<ChoiceRow>(columns);
    return toChoice(row);
  });
}
