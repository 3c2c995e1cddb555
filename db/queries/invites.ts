import "server-only";
import type { Knex } from "knex";
import { getDb } from "@/db/knex";
import type { Role } from "@/lib/roles";

// Invitations to a workspace. Only the SHA-256 of the link's token is stored.
export interface InviteRecord {
  id: string;
  workspaceId: string;
  workspaceName: string;
  email: string;
  role: Role;
  expiresAt: Date;
  acceptedAt: Date | null;
  createdAt: Date;
}

interface InviteRow {
  id: string;
  workspace_id: string;
  workspace_name: string;
  email: string;
  role: Role;
  expires_at: Date;
  accepted_at: Date | null;
  created_at: Date;
}

function toInvite(r: InviteRow): InviteRecord {
  return {
    id: r.id,
    workspaceId: r.workspace_id,
    workspaceName: r.workspace_name,
    email: r.email,
    role: r.role,
    expiresAt: r.expires_at,
    acceptedAt: r.accepted_at,
    createdAt: r.created_at,
  };
}

const columns = ["i.id", "i.workspace_id", "w.name as workspace_name", "i.email", "i.role", "i.expires_at", "i.accepted_at", "i.created_at"];

export async function insertInvite(
  row: { id: string; workspaceId: string; email: string; role: Role; tokenHash: string; invitedBy: string; expiresAt: Date },
  db: Knex = getDb(),
): Promise<void> {
  await db("invite").insert({
    id: row.id,
    workspace_id: row.workspaceId,
    email: row.email,
    role: row.role,
    token_hash: row.tokenHash,
    invited_by: row.invitedBy,
    expires_at: row.expiresAt,
  });
}

/** Open invites (not accepted, not expired), newest first. */
export async function listOpenInvitesByWorkspace(workspaceId: string, db: Knex = getDb()): Promise<InviteRecord[]> {
  const rows = await db("invite as i")
    .join("workspace as w", "w.id", "i.workspace_id")
    .where("i.workspace_id", workspaceId)
    .whereNull("i.accepted_at")
    .where("i.expires_at", ">", db.fn.now())
    .orderBy("i.created_at", "desc")
    .select<InviteRow[]>(columns);
  return rows.map(toInvite);
}

export async function getInviteByTokenHash(tokenHash: string, db: Knex = getDb()): Promise<InviteRecord | null> {
  const row = await db("invite as i").join("workspace as w", "w.id", "i.workspace_id").where("i.token_hash", tokenHash).first<InviteRow | undefined>(columns);
  return row ? toInvite(row) : null;
}

/** Marks the invite used; false when it was already used (single use under races). */
export async function markInviteAcceptedById(id: string, db: Knex = getDb()): Promise<boolean> {
  const n = await db("invite").where({ id }).whereNull("accepted_at").update({ accepted_at: db.fn.now() });
  return n === 1;
}

export async function deleteInviteById({ workspaceId, id }: { workspaceId: string; id: string }, db: Knex = getDb()): Promise<boolean> {
  const n = await db("invite").where({ workspace_id: workspaceId, id }).whereNull("accepted_at").delete();
  return n === 1;
}
