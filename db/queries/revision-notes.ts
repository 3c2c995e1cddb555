import "server-only";
import type { Knex } from "knex";
import { getDb } from "@/db/knex";
import { insertActivity } from "./activity";

// The one in-place change a revision allows: correcting its note while it
// is a draft. Once submitted for review the revision is frozen and the
// option_revision trigger refuses any change (SQLSTATE HS409), whatever
// code path tries it; this function reports that as "frozen".
const FROZEN_REVISION = "HS409";

export function isFrozenRevisionError(e: unknown): boolean {
  return (e as { code?: string } | null)?.code === FROZEN_REVISION;
}

export async function updateRevisionNoteByNumber(
  { workspaceId, optionId, revision, note, actor }: { workspaceId: string; optionId: string; revision: number; note: string; actor: string },
  db: Knex = getDb(),
): Promise<"done" | "not_found" | "frozen"> {
  try {
    return await db.transaction(async (trx): Promise<"done" | "not_found"> => {
      const option = await trx("design_option").where({ id: optionId, workspace_id: workspaceId }).first<{ project_id: string } | undefined>("project_id");
      if (!option) return "not_found";
      const n = await trx("option_revision").where({ option_id: optionId, revision }).update({ note });
      if (n !== 1) return "not_found";
      await insertActivity({ workspaceId, projectId: option.project_id, optionId, revision, actor, action: "revision.note_changed", detail: { note } }, trx);
      return "done";
    });
  } catch (e) {
    if (isFrozenRevisionError(e)) return "frozen";
    throw e;
  }
}
