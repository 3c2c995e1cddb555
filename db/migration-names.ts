import type { Knex } from "knex";

// Migration files are numbered in order, one number each. Three were
// renumbered once (two files had shared 0002 and none had 0005); their code
// is unchanged. A database migrated before that records the old names in
// knex_migrations; renameRecordedMigrations() rewrites them to the new ones
// before knex compares the table with the folder (scripts/lib/migrate.ts),
// so such a database needs nothing re-run. Never rename a landed file again:
// add a new one. tests/integration/migrations.test.ts migrates one database
// under the old names and one under the new and compares them.
export const RENAMED_MIGRATIONS: Readonly<Record<string, string>> = {
  "20261201_0002_parts.ts": "20261201_0003_parts.ts",
  "20261201_0003_projects_options.ts": "20261201_0004_projects_options.ts",
  "20261201_0004_option_choice.ts": "20261201_0005_option_choice.ts",
};

/** Rewrites old names in knex_migrations (when the table exists); returns how many rows changed. */
export async function renameRecordedMigrations(knex: Knex, tableName = "knex_migrations"): Promise<number> {
  if (!(await knex.schema.hasTable(tableName))) return 0;
  return knex.transaction(async (trx) => {
    const rows = await trx(tableName).whereIn("name", Object.keys(RENAMED_MIGRATIONS)).select<{ id: number; name: string }[]>("id", "name");
    for (const r of rows) await trx(tableName).where({ id: r.id }).update({ name: RENAMED_MIGRATIONS[r.name] });
    return rows.length;
  });
}
