// Backups restore what they saved: the test database is dumped (pg_dump -Fc,
// as scripts/backup.ts does) from a snapshot this test holds open, restored
// into a new empty database, and its projects, design options and revisions
// are compared row for row with what the snapshot saw (other tests may keep
// writing meanwhile; the snapshot does not move).
import crypto from "node:crypto";
import fs from "node:fs";
import os from "node:os";
import path from "node:path";
import pg from "pg";
import { afterAll, expect, it } from "vitest";
import { dumpDatabase, restoreDatabase, withDatabase } from "@/scripts/lib/pg-dump";
import { createMember } from "./support/db";
import { createProjectWithOption, signedInClient, templateInput } from "./support/projects";

const TABLES = [
  { name: "project", order: "id" },
  { name: "design_option", order: "id" },
  { name: "option_revision", order: "option_id, revision" },
];
const restoredDb = `heatsplit_restore_${crypto.randomBytes(4).toString("hex")}`;
const file = path.join(os.tmpdir(), `${restoredDb}.dump`);

async function admin(sql: string): Promise<void> {
  const c = new pg.Client({ connectionString: process.env.DATABASE_ADMIN_URL });
  await c.connect();
  await c.query(sql).finally(() => c.end());
}

async function readTables(c: pg.Client): Promise<Record<string, unknown[]>> {
  const out: Record<string, unknown[]> = {};
  for (const t of TABLES) out[t.name] = (await c.query(`select * from ${t.name} order by ${t.order}`)).rows;
  return out;
}

afterAll(async () => {
  fs.rmSync(file, { force: true });
  await admin(`drop database if exists ${restoredDb} with (force)`);
});

it("a dump restored into a new database has the same projects, options and revisions, row for row", async () => {
  const designer = await createMember("backup");
  const client = await signedInClient(designer.email);
  const { optionId } = await createProjectWithOption(client);
  const saved = await client.post(`/api/v1/options/${optionId}/revisions`, { baseRevision: 1, document: templateInput(), partRefs: {}, note: "before the backup ✓" });
  expect(saved.status).toBe(201);

  const source = new pg.Client({ connectionString: process.env.DATABASE_URL });
  await source.connect();
  let before: Record<string, unknown[]>;
  try {
    await source.query("begin isolation level repeatable read");
    const snapshot = (await source.query("select pg_export_snapshot() as s")).rows[0].s as string;
    before = await readTables(source);
    await dumpDatabase({ url: process.env.DATABASE_URL!, file, snapshot });
    await source.query("commit");
  } finally {
    await source.end();
  }
  expect(fs.statSync(file).size).toBeGreaterThan(1000);

  await admin(`create database ${restoredDb} owner heatsplit`);
  const restoredUrl = withDatabase(process.env.DATABASE_URL!, restoredDb);
  await restoreDatabase({ url: restoredUrl, file });
  const target = new pg.Client({ connectionString: restoredUrl });
  await target.connect();
  const after = await readTables(target).finally(() => target.end());

  for (const t of TABLES) expect(before[t.name].length, t.name).toBeGreaterThan(0);
  expect((before.option_revision as { note: string }[]).some((r) => r.note === "before the backup ✓")).toBe(true);
  for (const t of TABLES) expect(after[t.name], t.name).toEqual(before[t.name]);
}, 60_000);
