import "server-only";
import type { Knex } from "knex";
import { getDb } from "@/db/knex";

// Sign-ups waiting for their mailed link (token stored as its SHA-256).
export interface PendingSignUp {
  email: string;
  displayName: string;
  workspaceName: string;
  passwordHash: string;
}

export async function insertPendingSignUp(p: PendingSignUp & { tokenHash: string; expiresAt: Date }, db: Knex = getDb()): Promise<void> {
  await db("pending_sign_up").insert({ token_hash: p.tokenHash, email: p.email, display_name: p.displayName, workspace_name: p.workspaceName, password_hash: p.passwordHash, expires_at: p.expiresAt });
}

/** Uses the link: deletes and returns its sign-up if it is unexpired, else null. One DELETE, so a link works once. */
export async function consumePendingSignUpByTokenHash(tokenHash: string, db: Knex = getDb()): Promise<PendingSignUp | null> {
  const rows = await db("pending_sign_up")
    .where({ token_hash: tokenHash })
    .where("expires_at", ">", db.fn.now())
    .delete()
    .returning<{ email: string; display_name: string; workspace_name: string; password_hash: string }[]>(["email", "display_name", "workspace_name", "password_hash"]);
  const r = rows[0];
  return r ? { email: r.email, displayName: r.display_name, workspaceName: r.workspace_name, passwordHash: r.password_hash } : null;
}

/** The other links of an address stop working once one is used. */
export async function deletePendingSignUpsByEmail(email: string, db: Knex = getDb()): Promise<void> {
  await db("pending_sign_up").where({ email }).delete();
}
