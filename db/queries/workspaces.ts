import "server-only";
import type { Knex } from "knex";
import { getDb } from "@/db/knex";
import type { Role } from "@/lib/roles";

// Workspaces and the memberships that tie users to them.
export interface WorkspaceRecord {
  id: string;
  name: string;
}

export interface MembershipRecord {
  workspace: WorkspaceRecord;
  role: Role;
}

export async function insertWorkspace({ id, name }: WorkspaceRecord, db: Knex = getDb()): Promise<WorkspaceRecord> {
  await db("workspace").insert({ id, name });
  return { id, name };
}

export async function insertMembership(
  { workspaceId, userId, role }: { workspaceId: string; userId: string; role: Role },
  db: Knex = getDb(),
): Promise<void> {
  await db("membership").insert({ workspace_id: workspaceId, user_id: userId, role }).onConflict(["workspace_id", "user_id"]).ignore();
}

/** Oldest membership first, so the default workspace is stable. */
export async function listMembershipsByUser(userId: string, db: Knex = getDb()): Promise<MembershipRecord[]> {
  const rows = await db("membership as m")
    .join("workspace as w", "w.id", "m.workspace_id")
    .where("m.user_id", userId)
    .orderBy([{ column: "m.created_at" }, { column: "w.name" }])
    .select<{ id: string; name: string; role: Role }[]>("w.id", "w.name", "m.role");
  return rows.map((r) => ({ workspace: { id: r.id, name: r.name }, role: r.role }));
}
