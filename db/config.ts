import type { Knex } from "knex";
import { readServerEnv } from "../lib/env";
import { migrationSource } from "./migrations";

/** Knex settings for one database; tests pass their own per-run database name. */
export function knexConfig(databaseName?: string): Knex.Config {
  const env = readServerEnv();
  return {
    client: "mysql2",
    connection: {
      host: env.DATABASE_HOST,
      port: env.DATABASE_PORT,
      user: env.DATABASE_USER,
      password: env.DATABASE_PASSWORD,
      database: databaseName ?? env.DATABASE_NAME,
      charset: "utf8mb4",
      // DATETIME columns hold UTC; mysql2 must not shift them by the server's zone.
      timezone: "Z",
      dateStrings: false,
    },
    pool: { min: 0, max: 8 },
    migrations: { migrationSource, tableName: "knex_migrations" },
  };
}
