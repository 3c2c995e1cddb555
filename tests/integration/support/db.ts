// Direct database access for integration tests: set up rows, read the
// development mailbox, move session expiry. Uses DATABASE_URL of the test stack.
import knexFactory, { type Knex } from "knex";
import { hash } from "@node-rs/argon2";
import crypto from "node:crypto";
import type { Role } from "@/lib/roles";

let db: Knex | undefined;

export function testDb(): Knex {
  db ??= knexFactory({ client: "pg", connection: process.env.DATABASE_URL, pool: { min: 0, max: 4 } });
  return db;
}

export async function closeTestDb(): Promise<void> {
  await db?.destroy();
  db = undefined;
}

/** Unique per run and per call, so files never collide on e-mails. */
export function uniqueEmail(label: string): string {
  const safe = label.toLowerCase().replace(/[^a-z0-9]+/g, "-").replace(/^-|-$/g, "") || "user";
  return `${safe}.${Date.now().toString(36)}.${crypto.randomBytes(4).toString("hex")}@example.test`;
}

export const TEST_PASSWORD = "correct horse battery staple";
let passwordHash: Promise<string> | undefined;

function testPasswordHash(): Promise<string> {
  passwordHash ??= hash(TEST_PASSWORD, { algorithm: 2, memoryCost: 19456, timeCost: 2, parallelism: 1 });
  return passwordHash;
}

export interface TestUser {
  id: string;
  email: string;
  role: Role;
}

/** A workspace and one user per given role (password TEST_PASSWORD), inserted directly. */
export async function createWorkspaceWithRoles(label: string, roles: readonly Role[]): Promise<{ workspaceId: string; name: string; users: Record<string, TestUser> }> {
  const k = testDb();
  const workspaceId = `ws_test_${crypto.randomBytes(6).toString("hex")}`;
  const name = `${label} ${workspaceId.slice(-4)}`;
  await k("workspace").insert({ id: workspaceId, name });
  const users: Record<string, TestUser> = {};
  for (const role of roles) {
    const user = await createUser(`${label}-${role}`);
    await k("membership").insert({ workspace_id: workspaceId, user_id: user.id, role });
    users[role] = { ...user, role };
  }
  return { workspaceId, name, users };
}

export async function createUser(label: string): Promise<{ id: string; email: string }> {
  const id = `usr_test_${crypto.randomBytes(6).toString("hex")}`;
  const email = uniqueEmail(label);
  await testDb()("auth_user").insert({ id, email, display_name: `Test ${label}`, password_hash: await testPasswordHash() });
  return { id, email };
}

/** A user who is a member (default designer) of a workspace of their own. */
export async function createMember(label: string, role: Role = "designer"): Promise<TestUser & { workspaceId: string }> {
  const ws = await createWorkspaceWithRoles(label, [role]);
  return { ...ws.users[role], workspaceId: ws.workspaceId };
}

export async function addMembership(workspaceId: string, userId: string, role: Role): Promise<void> {
  await testDb()("membership").insert({ workspace_id: workspaceId, user_id: userId, role });
}

/** Waits for the newest message to `email` (mail may be sent just after the response). */
export async function waitForMail(email: string, opts: { after?: number; timeoutMs?: number } = {}): Promise<{ id: number; subject: string; text: string }> {
  const until = Date.now() + (opts.timeoutMs ?? 10_000);
  while (Date.now() < until) {
    const row = await testDb()("dev_mailbox")
      .whereRaw("? = any(recipients)", [email.toLowerCase()])
      .where("id", ">", opts.after ?? 0)
      .orderBy("id", "desc")
      .first<{ id: string; subject: string; text_body: string } | undefined>();
    if (row) return { id: Number(row.id), subject: row.subject, text: row.text_body };
    await new Promise((r) => setTimeout(r, 100));
  }
  throw new Error(`no mail to ${email} within the timeout`);
}

export async function countMailTo(email: string): Promise<number> {
  const row = await testDb()("dev_mailbox").whereRaw("? = any(recipients)", [email.toLowerCase()]).count<{ n: string }>({ n: "*" }).first();
  return Number(row?.n ?? 0);
}

/** The link with the given path from a mail body, and its #token. */
export function linkFrom(text: string, path: string): { url: string; token: string } {
  const m = text.match(new RegExp(`https?://[^\\s]+${path.replace(/\//g, "\\/")}#token=([A-Za-z0-9_-]+)`));
  if (!m) throw new Error(`no ${path} link in mail:\n${text}`);
  return { url: m[0], token: m[1] };
}

/**
 * Sign-in failures and sign-ups from the loopback addresses are shared by
 * every test; tests that count them start and end clean. Clears the address,
 * pair and sign-up counters (per-recipient mail caps stay).
 */
export async function clearAddressThrottle(): Promise<void> {
  await testDb()("auth_guard").whereRaw("not starts_with(bucket, 'mail:')").delete();
}
