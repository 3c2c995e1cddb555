import "server-only";
import knexFactory, { type Knex } from "knex";

// One pool per server process. Next.js may evaluate this module more than
// once in development, so the instance is kept on globalThis.
const globalForDb = globalThis as unknown as { heatsplitDb?: Knex };

export function getDb(): Knex {
  if (!globalForDb.heatsplitDb) {
    const url = process.env.DATABASE_URL;
    if (!url) throw new Error("DATABASE_URL is not set");
    globalForDb.heatsplitDb = knexFactory({
      client: "pg",
      connection: url,
      pool: {
        min: 0,
        max: Number(process.env.DB_POOL_MAX ?? 10),
        // a dropped connection (database restart) is replaced, not reused
        acquireTimeoutMillis: 5_000,
      },
    });
  }
  return globalForDb.heatsplitDb;
}
