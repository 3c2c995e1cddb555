import "server-only";
import type { Knex } from "knex";
import { getDb } from "@/db/knex";
import { getRevisionByNumber, insertOptionWithFirstRevision, type OptionRecord, type PartRefs } from "./options";

// Writing revisions: a save names the revision it started from. The new
// row is base + 1; the (option_id, revision) primary key makes a second save
// from the same base fail on insert even when both run at the same instant
// (the later insert waits for the first transaction, then sees the key).
export type SaveRevisionResult =
  | { ok: true; revision: number; createdAt: string }
  | { ok: false; reason: "not_found" }
  | { ok: false; reason: "conflict"; latestRevision: number };

class RevisionConflict extends Error {}

const UNIQUE_VIOLATION = "23505";

export async function insertRevisionOnBase(
  {
    workspaceId,
    optionId,
    baseRevision,
    document,
    partRefs,
    note,
    createdBy,
  }: { workspaceId: string; optionId: string; baseRevision: number; document: unknown; partRefs: PartRefs; note: string; createdBy: string | null },
  db: Knex = getDb(),
): Promise<SaveRevisionResult> {
  try {
    return await db.transaction(async (trx): Promise<SaveRevisionResult> => {
      const option = await trx("design_option").where({ id: optionId, workspace_id: workspaceId }).first("latest_revision", "project_id");
      if (!option) return { ok: false, reason: "not_found" };
      if (option.latest_revision !== baseRevision) throw new RevisionConflict();
      const revision = baseRevision + 1;
      try {
        const [row] = await trx("option_revision")
          .insert({ option_id: optionId, revision, document: JSON.stringify(document), part_refs: JSON.stringify(partRefs), note, created_by: createdBy })
          .returning("created_at");
        const updated = await trx("design_option")
          .where({ id: optionId, latest_revision: baseRevision })
          .update({ latest_revision: revision, updated_at: trx.fn.now() });
        if (updated !== 1) throw new RevisionConflict();
        await trx("project").where({ id: option.project_id }).update({ updated_at: trx.fn.now() });
        return { ok: true, revision, createdAt: (row.created_at as Date).toISOString() };
      } catch (e) {
        if ((e as { code?: string }).code === UNIQUE_VIOLATION) throw new RevisionConflict();
        throw e;
      }
    });
  } catch (e) {
    if (!(e instanceof RevisionConflict)) throw e;
    const latest = await db("design_option").where({ id: optionId, workspace_id: workspaceId }).first("latest_revision");
    return latest ? { ok: false, reason: "conflict", latestRevision: latest.latest_revision } : { ok: false, reason: "not_found" };
  }
}

/**
 * A new option in the same project whose revision 1 is the source's latest
 * document and part references. The source is untouched.
 */
export async function duplicateDesignOption(
  { workspaceId, optionId, name, createdBy }: { workspaceId: string; optionId: string; name?: string; createdBy: string | null },
  db: Knex = getDb(),
): Promise<OptionRecord | null> {
  const source = await db("design_option").where({ id: optionId, workspace_id: workspaceId }).first();
  if (!source) return null;
  const latest = await getRevisionByNumber({ workspaceId, optionId, revision: source.latest_revision }, db);
  if (!latest) return null;
  return insertOptionWithFirstRevision(
    {
      workspaceId,
      projectId: source.project_id,
      name: name ?? `${source.name} (copy)`,
      summary: source.summary,
      document: latest.document,
      partRefs: latest.partRefs,
      note: `Duplicated from "${source.name}" revision ${latest.revision}`,
      createdBy,
    },
    db,
  );
}

/** The subset of `ids` that are parts of this workspace's library. */
export async function listKnownPartIds({ workspaceId, ids }: { workspaceId: string; ids: string[] }, db: Knex = getDb()): Promise<Set<string>> {
  if (ids.length === 0) return new Set();
  const rows = await db("part").where("workspace_id", workspaceId).whereIn("id", ids).select<{ id: string }[]>("id");
  return new Set(rows.map((r) => r.id));
}
