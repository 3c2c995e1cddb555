import "server-only";
import type { Knex } from "knex";
import { getDb } from "@/db/knex";
import type { Role } from "@/lib/roles";
import { newRecordId } from "@/db/ids";

// Personal API tokens. Only the SHA-256 of the secret is stored; listings
// never carry it. A token acts for its user in its workspace with the role
// the user has there NOW (read from membership on every request), so a
// demotion or removal takes effect at once.
export interface ApiTokenRecord {
  id: string;
  name: string;
  createdAt: string;
  expiresAt: string;
  lastUsedAt: string | null;
  revokedAt: string | null;
}

interface TokenRow {
  id: string;
  name: string;
  created_at: Date;
  expires_at: Date;
  last_used_at: Date | null;
  revoked_at: Date | null;
}

const iso = (d: Date | null) => d?.toISOString() ?? null;
const toRecord = (r: TokenRow): ApiTokenRecord => ({ id: r.id, name: r.name, createdAt: r.created_at.toISOString(), expiresAt: r.expires_at.toISOString(), lastUsedAt: iso(r.last_used_at), revokedAt: iso(r.revoked_at) });
const PUBLIC_COLUMNS = ["id", "name", "created_at", "expires_at", "last_used_at", "revoked_at"];

/** last_used_at is written at most this often per token, so busy scripts do not write on every call. */
const LAST_USED_RESOLUTION_SECONDS = 60;

export async function insertApiToken(
  { userId, workspaceId, name, tokenHash, expiresAt }: { userId: string; workspaceId: string; name: string; tokenHash: string; expiresAt: Date },
  db: Knex = getDb(),
): Promise<ApiTokenRecord> {
  const id = newRecordId("tok");
  const [row] = await db("api_token").insert({ id, user_id: userId, workspace_id: workspaceId, name, token_hash: tokenHash, expires_at: expiresAt }).returning<TokenRow[]>(PUBLIC_COLUMNS);
  return toRecord(row);
}

/** The user's tokens in this workspace, newest first, without secrets or hashes. */
export async function listApiTokensByUser({ userId, workspaceId }: { userId: string; workspaceId: string }, db: Knex = getDb()): Promise<ApiTokenRecord[]> {
  const rows = await db("api_token").where({ user_id: userId, workspace_id: workspaceId }).orderBy([{ column: "created_at", order: "desc" }, { column: "id" }]).select<TokenRow[]>(PUBLIC_COLUMNS);
  return rows.map(toRecord);
}

/**
 * Revokes one of the user's own tokens: null when there is no such token of
 * theirs, else its name and whether this call revoked it (false: it already was).
 */
export async function revokeApiTokenById(
  { userId, workspaceId, tokenId }: { userId: string; workspaceId: string; tokenId: string },
  db: Knex = getDb(),
): Promise<{ name: string; revokedNow: boolean } | null> {
  const row = await db("api_token").where({ id: tokenId, user_id: userId, workspace_id: workspaceId }).forUpdate().first<{ name: string; revoked_at: Date | null } | undefined>("name", "revoked_at");
  if (!row) return null;
  if (!row.revoked_at) await db("api_token").where({ id: tokenId }).update({ revoked_at: db.fn.now() });
  return { name: row.name, revokedNow: !row.revoked_at };
}

/** Every live token of the user, in every workspace (a password reset). */
export async function revokeApiTokensByUser(userId: string, db: Knex = getDb()): Promise<void> {
  await db("api_token").where({ user_id: userId }).whereNull("revoked_at").update({ revoked_at: db.fn.now() });
}

/** Every live token of the user in one workspace (they left it). */
export async function revokeApiTokensOfMember({ workspaceId, userId }: { workspaceId: string; userId: string }, db: Knex = getDb()): Promise<void> {
  await db("api_token").where({ user_id: userId, workspace_id: workspaceId }).whereNull("revoked_at").update({ revoked_at: db.fn.now() });
}

export interface TokenMember {
  tokenId: string;
  user: { id: string; email: string; displayName: string };
  workspace: { id: string; name: string };
  role: Role;
}

/**
 * A live token (not revoked, not expired, user still a member) -> who it
 * acts for. The membership must be older than the token: a member who left
 * and was invited back has a newer membership, which revives no old token
 * (leaving also revokes them; this holds even if a removal path forgot to).
 */
export async function getTokenMemberByHash(tokenHash: string, db: Knex = getDb()): Promise<TokenMember | null> {
  const r = await db("api_token as t")
    .join("membership as m", (j) => j.on("m.user_id", "t.user_id").andOn("m.workspace_id", "t.workspace_id").andOn("m.created_at", "<=", "t.created_at"))
    .join("auth_user as u", "u.id", "t.user_id")
    .join("workspace as w", "w.id", "t.workspace_id")
    .where("t.token_hash", tokenHash)
    .whereNull("t.revoked_at")
    .andWhere("t.expires_at", ">", db.fn.now())
    .first<{ id: string; user_id: string; email: string; display_name: string; workspace_id: string; workspace_name: string; role: Role } | undefined>(
      "t.id", "t.user_id", "u.email", "u.display_name", "t.workspace_id", "w.name as workspace_name", "m.role",
    );
  if (!r) return null;
  await db("api_token")
    .where("id", r.id)
    .andWhere((q) => q.whereNull("last_used_at").orWhere("last_used_at", "<", db.raw("now() - make_interval(secs => ?)", [LAST_USED_RESOLUTION_SECONDS])))
    .update({ last_used_at: db.fn.now() });
  return { tokenId: r.id, user: { id: r.user_id, email: r.email, displayName: r.display_name }, workspace: { id: r.workspace_id, name: r.workspace_name }, role: r.role };
}
