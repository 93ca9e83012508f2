import knex, { type Knex } from "knex";
import { knexConfig } from "./config";

// One pool per server process; Next's dev reloads would otherwise open a new pool per edit.
const globalForDb = globalThis as unknown as { scarplineDb?: Knex };

/** The app's single Knex instance. Only code under db/ imports Knex. */
export function getDb(): Knex {
  if (!globalForDb.scarplineDb) globalForDb.scarplineDb = knex(knexConfig());
  return globalForDb.scarplineDb;
}

export type { Knex };
