import type { Knex } from "knex";

// One configuration for every environment: the connection comes from
// DATABASE_URL, which scripts/stack.ts sets for the server it starts (and a
// deployment sets for its managed PostgreSQL).
const config: Knex.Config = {
  client: "pg",
  connection: process.env.DATABASE_URL,
  pool: { min: 0, max: Number(process.env.DB_POOL_MAX ?? 10) },
  migrations: {
    directory: "./db/migrations",
    extension: "ts",
    loadExtensions: [".ts"],
    tableName: "knex_migrations",
  },
};

export default config;
