// Runs the knex migrations (after bringing renamed files' records up to date,
// db/migration-names.ts) and, for the demo stack, the idempotent demo seed.
import knexFactory from "knex";
import config from "../../knexfile";
import { renameRecordedMigrations } from "../../db/migration-names";

export async function migrateAndSeed(opts: { url: string; seedDemo: boolean }): Promise<void> {
  const knex = knexFactory({ ...config, connection: opts.url });
  try {
    const renamed = await renameRecordedMigrations(knex);
    if (renamed) console.log(`  renamed ${renamed} recorded migration(s) to their new numbers`);
    const [, applied] = (await knex.migrate.latest()) as [number, string[]];
    if (applied.length) console.log(`  applied migrations: ${applied.join(", ")}`);
    if (opts.seedDemo) {
      const { seedDemoWorkspace } = await import("../../db/seeds/demo");
      const summary = await seedDemoWorkspace(knex);
      console.log(`  demo seed: ${summary}`);
    }
  } finally {
    await knex.destroy();
  }
}

// `npm run migrate`: the migrations of DATABASE_URL, nothing else.
if (process.argv[1]?.endsWith("migrate.ts") && process.argv[2] === "--run") {
  const url = process.env.DATABASE_URL;
  if (!url) throw new Error("DATABASE_URL is not set");
  migrateAndSeed({ url, seedDemo: false }).catch((e: unknown) => {
    console.error(e);
    process.exit(1);
  });
}
