// Migration files are numbered in order (db/migration-names.ts renamed three
// of them once). Two new databases: one migrated with the files recorded
// under their OLD names (a database from before the renumbering), then
// brought up to date the way `npm start` does it; one migrated from the
// files as they are. Afterwards nothing is pending in either, both record the
// same names, and their schemas (columns, constraints, indexes, triggers,
// functions) match.
import crypto from "node:crypto";
import fs from "node:fs";
import path from "node:path";
import knexFactory, { type Knex } from "knex";
import pg from "pg";
import { afterAll, describe, expect, it } from "vitest";
import config from "@/knexfile";
import { RENAMED_MIGRATIONS, renameRecordedMigrations } from "@/db/migration-names";
import { withDatabase } from "@/scripts/lib/pg-dump";

const suffix = crypto.randomBytes(4).toString("hex");
const oldDb = `heatsplit_migr_old_${suffix}`;
const newDb = `heatsplit_migr_new_${suffix}`;
const MIGRATIONS = path.resolve(__dirname, "../../db/migrations");
const OLD_NAME = Object.fromEntries(Object.entries(RENAMED_MIGRATIONS).map(([o, n]) => [n, o]));

async function admin(sql: string): Promise<void> {
  const c = new pg.Client({ connectionString: process.env.DATABASE_ADMIN_URL });
  await c.connect();
  await c.query(sql).finally(() => c.end());
}

function knexFor(db: string): Knex {
  return knexFactory({ ...config, connection: withDatabase(process.env.DATABASE_URL!, db), pool: { min: 0, max: 2 } });
}

/**
 * The folder's migrations as knex runs them, named as the files are now or
 * (old) as they were before the renumbering. Loaded by this test's own
 * import (knex's loader cannot read TypeScript here).
 */
function folderSource(names: "new" | "old"): Knex.MigrationSource<string> {
  const nameOf = (file: string) => (names === "old" ? (OLD_NAME[file] ?? file) : file);
  return {
    async getMigrations() {
      const files = fs.readdirSync(MIGRATIONS).filter((f) => f.endsWith(".ts"));
      return files.sort((a, b) => nameOf(a).localeCompare(nameOf(b)));
    },
    getMigrationName: nameOf,
    getMigration: (file) => import(path.join(MIGRATIONS, file)),
  };
}

const SCHEMA_QUERIES = {
  columns: `select table_name, column_name, data_type, is_nullable, column_default from information_schema.columns where table_schema = 'public' order by 1, 2`,
  constraints: `select c.relname, k.conname, pg_get_constraintdef(k.oid) as def from pg_constraint k join pg_class c on c.oid = k.conrelid join pg_namespace n on n.oid = c.relnamespace where n.nspname = 'public' order by 1, 2`,
  indexes: `select tablename, indexname, indexdef from pg_indexes where schemaname = 'public' order by 1, 2`,
  triggers: `select c.relname, t.tgname, pg_get_triggerdef(t.oid) as def from pg_trigger t join pg_class c on c.oid = t.tgrelid join pg_namespace n on n.oid = c.relnamespace where n.nspname = 'public' and not t.tgisinternal order by 1, 2`,
  functions: `select p.proname, pg_get_functiondef(p.oid) as def from pg_proc p join pg_namespace n on n.oid = p.pronamespace where n.nspname = 'public' order by 1`,
};

async function schemaOf(knex: Knex): Promise<Record<string, unknown[]>> {
  const out: Record<string, unknown[]> = {};
  for (const [k, sql] of Object.entries(SCHEMA_QUERIES)) out[k] = (await knex.raw(sql)).rows;
  return out;
}

const recordedNames = async (knex: Knex) => (await knex("knex_migrations").orderBy("id").select<{ name: string }[]>("name")).map((r) => r.name);

afterAll(async () => {
  await admin(`drop database if exists ${oldDb} with (force)`);
  await admin(`drop database if exists ${newDb} with (force)`);
});

describe("renumbered migrations", () => {
  it("the files are numbered in order, one number each", () => {
    const numbers = fs
      .readdirSync(MIGRATIONS)
      .filter((f) => f.endsWith(".ts"))
      .map((f) => Number(/^\d{8}_(\d{4})_/.exec(f)?.[1]));
    expect(numbers.every(Number.isInteger)).toBe(true);
    expect(numbers).toEqual([...numbers].sort((a, b) => a - b));
    expect(new Set(numbers).size).toBe(numbers.length);
    expect(numbers[0]).toBe(1);
    expect(numbers.every((n, i) => i === 0 || n === numbers[i - 1] + 1)).toBe(true);
  });

  it("a database migrated under the old names is brought up to date with nothing re-run, and matches a new one", async () => {
    await admin(`create database ${oldDb} owner heatsplit`);
    await admin(`create database ${newDb} owner heatsplit`);
    const old = knexFor(oldDb);
    const fresh = knexFor(newDb);
    try {
      const [, appliedOld] = (await old.migrate.latest({ migrationSource: folderSource("old") })) as [number, string[]];
      expect(appliedOld).toEqual(expect.arrayContaining(Object.keys(RENAMED_MIGRATIONS)));
      // what scripts/lib/migrate.ts does before knex compares the table with the folder
      expect(await renameRecordedMigrations(old)).toBe(Object.keys(RENAMED_MIGRATIONS).length);
      expect(await renameRecordedMigrations(old)).toBe(0);
      const [, rerun] = (await old.migrate.latest({ migrationSource: folderSource("new") })) as [number, string[]];
      expect(rerun).toEqual([]);

      const [, appliedNew] = (await fresh.migrate.latest({ migrationSource: folderSource("new") })) as [number, string[]];
      expect(appliedNew.length).toBe(appliedOld.length);
      expect(await recordedNames(old)).toEqual(await recordedNames(fresh));
      const [a, b] = [await schemaOf(old), await schemaOf(fresh)];
      expect(a.columns.length).toBeGreaterThan(50);
      expect(a).toEqual(b);
    } finally {
      await old.destroy();
      await fresh.destroy();
    }
  }, 120_000);
});
