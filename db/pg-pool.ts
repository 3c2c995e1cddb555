import "server-only";
import pg from "pg";

// lucia's PostgreSQL adapter wants a node-postgres Pool of its own; knex keeps
// its own pool (db/knex.ts). Both are small and kept on globalThis so a
// re-evaluated module does not open a second pool.
const globalForPool = globalThis as unknown as { heatsplitPgPool?: pg.Pool };

export function getPgPool(): pg.Pool {
  if (!globalForPool.heatsplitPgPool) {
    const url = process.env.DATABASE_URL;
    if (!url) throw new Error("DATABASE_URL is not set");
    const pool = new pg.Pool({ connectionString: url, max: Number(process.env.DB_SESSION_POOL_MAX ?? 5) });
    // An idle client dropped by a database restart emits "error"; without a
    // listener that is an uncaught exception. The pool replaces the client.
    pool.on("error", (e) => console.error("session pool:", e.message));
    globalForPool.heatsplitPgPool = pool;
  }
  return globalForPool.heatsplitPgPool;
}
