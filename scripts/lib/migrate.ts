// Runs the knex migrations and, for the demo stack, the idempotent demo seed.
import knexFactory from "knex";
import config from "../../knexfile";

export async function migrateAndSeed(opts: { url: string; seedDemo: boolean }): Promise<void> {
  const knex = knexFactory({ ...config, connection: opts.url });
  try {
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
