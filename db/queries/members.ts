import "server-only";
import type { Knex } from "knex";
import { getDb } from "@/db/knex";
import type { Role } from "@/lib/roles";
import { insertActivity } from "./activity";
import { revokeApiTokensOfMember } from "./api-tokens";

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
  change: (trx: Knex.Transaction, target: { role: Role; displayName: string }) => Promise<void>,
): Promise<MemberChange> {
  return getDb().transaction(async (trx) => {
    const admins = await trx("membership").where({ workspace_id: workspaceId, role: "admin" }).forUpdate().select<{ user_id: string }[]>("user_id");
    const target = await trx("membership as m")
      .join("auth_user as u", "u.id", "m.user_id")
      .where({ "m.workspace_id": workspaceId, "m.user_id": userId })
      .forUpdate("m")
      .first<{ role: Role; display_name: string } | undefined>("m.role", "u.display_name");
    if (!target) return "not_found";
    const isAdmin = admins.some((a) => a.user_id === userId);
    if (isAdmin && !keepsAdmin && admins.length <= 1) return "last_admin";
    await change(trx, { role: target.role, displayName: target.display_name });
    return "done";
  });
}

/** Changes the role and logs it (with the member's name as it is now), in one transaction. */
export async function updateMemberRoleByUser({ workspaceId, userId, role, actor }: { workspaceId: string; userId: string; role: Role; actor: string }): Promise<MemberChange> {
  return withAdminGuard({ workspaceId, userId, keepsAdmin: role === "admin" }, async (trx, target) => {
    if (target.role === role) return;
    await trx("membership").where({ workspace_id: workspaceId, user_id: userId }).update({ role });
    const detail = { member: { id: userId, displayName: target.displayName }, from: target.role, to: role };
    await insertActivity({ workspaceId, projectId: null, actor, action: "member.role_changed", detail }, trx);
  });
}

/** Removes the member, revokes their API tokens in this workspace for good, and logs it, in one transaction. */
export async function deleteMemberByUser({ workspaceId, userId, actor }: { workspaceId: string; userId: string; actor: string }): Promise<MemberChange> {
  return withAdminGuard({ workspaceId, userId, keepsAdmin: false }, async (trx, target) => {
    await trx("membership").where({ workspace_id: workspaceId, user_id: userId }).delete();
    await revokeApiTokensOfMember({ workspaceId, userId }, trx);
    await insertActivity({ workspaceId, projectId: null, actor, action: "member.removed", detail: { member: { id: userId, displayName: target.displayName }, role: target.role } }, trx);
  });
}
