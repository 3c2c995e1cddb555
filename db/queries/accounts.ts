import "server-only";
import type { Knex } from "knex";
import { getDb } from "@/db/knex";

// auth_user rows. E-mails are stored lower-cased and trimmed; callers pass
// them normalised (the zod schemas do it). password_hash never leaves the
// accounts/passwords code: the public shape below has no such field.
export interface UserRecord {
  id: string;
  email: string;
  displayName: string;
}

interface UserRow {
  id: string;
  email: string;
  display_name: string;
  password_hash: string;
}

function toUser(row: UserRow): UserRecord {
  return { id: row.id, email: row.email, displayName: row.display_name };
}

export async function getUserById(id: string, db: Knex = getDb()): Promise<UserRecord | null> {
  const row = await db<UserRow>("auth_user").where({ id }).first();
  return row ? toUser(row) : null;
}

export async function getUserByEmail(email: string, db: Knex = getDb()): Promise<UserRecord | null> {
  const row = await db<UserRow>("auth_user").where({ email }).first();
  return row ? toUser(row) : null;
}

/** The stored hash for a sign-in check, with the user it belongs to. */
export async function getCredentialsByEmail(email: string, db: Knex = getDb()): Promise<{ user: UserRecord; passwordHash: string } | null> {
  const row = await db<UserRow>("auth_user").where({ email }).first();
  return row ? { user: toUser(row), passwordHash: row.password_hash } : null;
}

export async function insertUser(
  { id, email, displayName, passwordHash }: { id: string; email: string; displayName: string; passwordHash: string },
  db: Knex = getDb(),
): Promise<UserRecord> {
  await db("auth_user").insert({ id, email, display_name: displayName, password_hash: passwordHash });
  return { id, email, displayName };
}

export async function updateUserPasswordById({ id, passwordHash }: { id: string; passwordHash: string }, db: Knex = getDb()): Promise<void> {
  await db("auth_user").where({ id }).update({ password_hash: passwordHash });
}
