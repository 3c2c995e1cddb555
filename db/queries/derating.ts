import "server-only";
import type { Knex } from "knex";
import { getDb } from "@/db/knex";
import { PART_TYPES, type PartType } from "@/models/policy";
import { insertActivity } from "./activity";

// A workspace's derating policy (one row per workspace, absent until someone
// sets it). SI numbers: margins in K, the Vgs fraction as a ratio, the
// headroom in V. Changes are logged with the old and new values.
export interface DeratingValues {
  tjMargin: Record<PartType, number>;
  vgsMaxFraction: number;
  minHeadroomAbovePlateau: number;
}

export interface WorkspaceDerating extends DeratingValues {
  updatedBy: { id: string; displayName: string } | null;
  updatedAt: string;
}

const MARGIN_COLUMN: Record<PartType, string> = {
  controller: "tj_margin_controller",
  mosfet: "tj_margin_mosfet",
  bjt: "tj_margin_bjt",
  driverIc: "tj_margin_driver_ic",
  clamp: "tj_margin_clamp",
};

type Row = Record<string, unknown> & { vgs_max_fraction: number; min_headroom_above_plateau: number; updated_by: string | null; updater_name: string | null; updated_at: Date };

function toValues(r: Row): DeratingValues {
  return {
    tjMargin: Object.fromEntries(PART_TYPES.map((p) => [p, Number(r[MARGIN_COLUMN[p]])])) as Record<PartType, number>,
    vgsMaxFraction: Number(r.vgs_max_fraction),
    minHeadroomAbovePlateau: Number(r.min_headroom_above_plateau),
  };
}

export async function getDeratingByWorkspace(workspaceId: string, db: Knex = getDb()): Promise<WorkspaceDerating | null> {
  const r = await db("workspace_derating as d")
    .leftJoin("auth_user as u", "u.id", "d.updated_by")
    .where("d.workspace_id", workspaceId)
    .first<Row | undefined>("d.*", "u.display_name as updater_name");
  if (!r) return null;
  return { ...toValues(r), updatedBy: r.updated_by ? { id: r.updated_by, displayName: r.updater_name ?? "" } : null, updatedAt: r.updated_at.toISOString() };
}

/** Sets the policy; the change and its log entry are one transaction. */
export async function upsertDeratingByWorkspace(
  { workspaceId, values, updatedBy }: { workspaceId: string; values: DeratingValues; updatedBy: string },
  db: Knex = getDb(),
): Promise<void> {
  await db.transaction(async (trx) => {
    const before = await trx("workspace_derating").where({ workspace_id: workspaceId }).forUpdate().first<Row | undefined>();
    const row = {
      workspace_id: workspaceId,
      ...Object.fromEntries(PART_TYPES.map((p) => [MARGIN_COLUMN[p], values.tjMargin[p]])),
      vgs_max_fraction: values.vgsMaxFraction,
      min_headroom_above_plateau: values.minHeadroomAbovePlateau,
      updated_by: updatedBy,
      updated_at: trx.fn.now(),
    };
    await trx("workspace_derating").insert(row).onConflict("workspace_id").merge();
    await insertActivity({ workspaceId, projectId: null, actor: updatedBy, action: "derating.changed", detail: { before: before ? toValues(before) : null, after: values } }, trx);
  });
}
