import "server-only";
import type { Knex } from "knex";
import { getDb } from "@/db/knex";
import { insertActivity } from "./activity";
import { updateOptionById, type OptionRecord } from "./options";

// An option's name, summary and archived flag change here, with the
// activity entries for a rename and for archiving or restoring written in
// the same transaction (the summary is description only, not logged).
export async function patchOptionLogged(
  { workspaceId, optionId, patch, actor }: { workspaceId: string; optionId: string; patch: { name?: string; summary?: string; archived?: boolean }; actor: string },
  db: Knex = getDb(),
): Promise<OptionRecord | null> {
  return db.transaction(async (trx) => {
    const before = await trx("design_option").where({ id: optionId, workspace_id: workspaceId }).forUpdate().first<{ name: string; archived: boolean; project_id: string } | undefined>("name", "archived", "project_id");
    if (!before) return null;
    const option = await updateOptionById({ workspaceId, optionId, patch }, trx);
    if (!option) return null;
    const base = { workspaceId, projectId: before.project_id, optionId, actor };
    if (patch.name !== undefined && patch.name !== before.name) await insertActivity({ ...base, action: "option.renamed", detail: { from: before.name, to: patch.name } }, trx);
    if (patch.archived !== undefined && patch.archived !== before.archived) await insertActivity({ ...base, action: patch.archived ? "option.archived" : "option.restored" }, trx);
    return option;
  });
}
