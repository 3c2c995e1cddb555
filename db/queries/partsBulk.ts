import "server-only";
import type { Knex } from "knex";
import { getDb } from "@/db/knex";
import { insertActivity } from "./activity";
import type { PartValues } from "@/lib/parts/values";
import { newPartId } from "./parts";

// Many parts at once, keyed by the natural key (workspace, mpn): the CSV
// import: all rows or none, updating what is there.

/** Rows per INSERT statement: 500 rows × 10 columns stays far below PostgreSQL's 65 535 bindings. */
const CHUNK_ROWS = 500;

export async function listPartMpnsByWorkspace({ workspaceId, mpns }: { workspaceId: string; mpns: string[] }, db: Knex = getDb()): Promise<Set<string>> {
  const found = new Set<string>();
  for (let i = 0; i < mpns.length; i += CHUNK_ROWS) {
    const rows = await db("part").where("workspace_id", workspaceId).whereIn("mpn", mpns.slice(i, i + CHUNK_ROWS)).select<{ mpn: string }[]>("mpn");
    for (const r of rows) found.add(r.mpn);
  }
  return found;
}

function rowOf(workspaceId: string, userId: string, v: PartValues) {
  return {
    id: newPartId(),
    workspace_id: workspaceId,
    created_by: userId,
    kind: v.kind,
    manufacturer: v.manufacturer,
    mpn: v.mpn,
    description: v.description,
    params: JSON.stringify(v.params),
    tolerance: JSON.stringify(v.tolerance),
    unit_cost: v.unitCost,
  };
}

/**
 * Inserts or updates every row in ONE transaction: a failure anywhere rolls
 * all of it back. An existing part keeps its id, datasheet and created_*.
 */
export async function upsertPartsByMpn(
  { workspaceId, userId, rows }: { workspaceId: string; userId: string; rows: PartValues[] },
  db: Knex = getDb(),
): Promise<{ created: number; updated: number }> {
  return db.transaction(async (trx) => {
    const existing = await listPartMpnsByWorkspace({ workspaceId, mpns: rows.map((r) => r.mpn) }, trx);
    for (let i = 0; i < rows.length; i += CHUNK_ROWS) {
      await trx("part")
        .insert(rows.slice(i, i + CHUNK_ROWS).map((v) => rowOf(workspaceId, userId, v)))
        .onConflict(["workspace_id", "mpn"])
        .merge({
          kind: trx.raw("excluded.kind"),
          manufacturer: trx.raw("excluded.manufacturer"),
          description: trx.raw("excluded.description"),
          params: trx.raw("excluded.params"),
          tolerance: trx.raw("excluded.tolerance"),
          unit_cost: trx.raw("excluded.unit_cost"),
          updated_at: trx.fn.now(),
        });
    }
    const updated = rows.filter((r) => existing.has(r.mpn)).length;
    await insertActivity({ workspaceId, projectId: null, actor: userId, action: "parts.imported", detail: { created: rows.length - updated, updated } }, trx);
    return { created: rows.length - updated, updated };
  });
}
