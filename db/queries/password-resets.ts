import "server-only";
import type { Knex } from "knex";
import { getDb } from "@/db/knex";

// Password-reset tokens, stored as SHA-256 hashes, single use.
export async function insertPasswordReset(
  { tokenHash, userId, expiresAt }: { tokenHash: string; userId: string; expiresAt: Date },
  db: Knex = getDb(),
): Promise<void> {
  await db("password_reset").insert({ token_hash: tokenHash, user_id: userId, expires_at: expiresAt });
}

/**
 * Uses the token if it is unused and unexpired and returns its user id;
 * null otherwise. One UPDATE, so two requests with the same link cannot
 * both succeed.
 */
export async function consumePasswordResetByTokenHash(tokenHash: string, db: Knex = getDb()): Promise<string | null> {
  const rows = await db("password_reset")
    .where({ token_hash: tokenHash })
    .whereNull("used_at")
    .where("expires_at", ">", db.fn.now())
    .update({ used_at: db.fn.now() })
    .returning<{ user_id: string }[]>("user_id");
  return rows[0]?.user_id ?? null;
}

/** After a reset, every other link the user was sent stops working too. */
export async function expirePasswordResetsByUser(userId: string, db: Knex = getDb()): Promise<void> {
  await db("password_reset").where({ user_id: userId }).whereNull("used_at").update({ used_at: db.fn.now() });
}
