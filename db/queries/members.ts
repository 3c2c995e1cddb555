import "server-only";
import type { Knex } from "knex";
import { getDb } from "@/db/knex";
import type { Role } from "@/app/_lib/roles";

// The members of one workspace. Every function takes the workspace id, so a
// user of another workspace is simply not found (the caller answers 404).
export interface MemberRecord {
  userId: string;
  email: string;
  displayName: string;
  role: Role;
  joinedAt: Date;
}

export type MemberChange = "done" | "not_found" | "last_admin";

export async function listMembersByWorkspace(workspaceId: string, db: Knex = getDb()): Promise<MemberRecord[]> {
  const rows = await db("membership as m")
    .join("auth_user as u", "u.id", "m.user_id")
    .where("m.workspace_id", workspaceId)
    .orderBy("u.display_name")
    .select<{ user_id: string; email: string; display_name: string; role: Role; created_at: Date }[]>("m.user_id", "u.email", "u.display_name", "m.role", "m.created_at");
  return rows.map((r) => ({ userId: r.user_id, email: r.email, displayName: r.display_name, role: r.role, joinedAt: r.created_at }));
}

export async function getMemberByUser({ workspaceId, userId }: { workspaceId: string; userId: string }, db: Knex = getDb()): Promise<MemberRecord | null> {
  const members = await db("membership as m")
    .join("auth_user as u", "u.id", "m.user_id")
    .where({ "m.workspace_id": workspaceId, "m.user_id": userId })
    .select<{ user_id: string; email: string; display_name: string; role: Role; created_at: Date }[]>("m.user_id", "u.email", "u.display_name", "m.role", "m.created_at");
  const r = members[0];
  return r ? { userId: r.user_id, email: r.email, displayName: r.display_name, role: r.role, joinedAt: r.created_at } : null;
}

/**
 * Locks the workspace's admin rows, then applies `change` only if at least
 * one admin remains afterwards. The lock makes two admins demoting each
 * other at the same moment wait for one another instead of both succeeding.
 */
async function withAdminGuard(
  { workspaceId, userId, keepsAdmin }: { workspaceId: string; userId: string; keepsAdmin: boolean },
  change: (trx: Knex.Transaction) => Promise<void>,
): Promise<MemberChange> {
  return getDb().transaction(async (trx) => {
    const admins = await trx("membership").where({ workspace_id: workspaceId, role: "admin" }).forUpdate().select<{ user_id: string }[]>("user_id");
    const target = await trx("membership").where({ workspace_id: workspaceId, user_id: userId }).forUpdate().first<{ role: Role } | undefined>("role");
    if (!target) return "not_found";
    const isAdmin = admins.some((a) => a.user_id === userId);
    if (isAdmin && !keepsAdmin && admins.length <= 1) return "last_admin";
    await change(trx);
    return "done";
  });
}

export async function updateMemberRoleByUser({ workspaceId, userId, role }: { workspaceId: string; userId: string; role: Role }): Promise<MemberChange> {
  return withAdminGuard({ workspaceId, userId, keepsAdmin: role === "admin" }, async (trx) => {
    await trx("membership").where({ workspace_id: workspaceId, user_id: userId }).update({ role });
  });
}

export async function deleteMemberByUser({ workspaceId, userId }: { workspaceId: string; userId: string }): Promise<MemberChange> {
  return withAdminGuard({ workspaceId, userId, keepsAdmin: false }, async (trx) => {
    await trx("membership").where({ workspace_id: workspaceId, user_id: userId }).delete();
  });
}
