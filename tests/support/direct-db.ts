/**
 * A direct connection to a test database, for checks that look at rows the app wrote (a job's
 * worker, a half-written result). Test code reaches Knex only through here (lint: only db/ and
 * tests/support import knex).
 */
import knex, { type Knex } from "knex";
import { knexConfig } from "../../db/config";

export type TestDb = Knex;

/** Opens the named database; the caller destroys it. */
export function openTestDb(dbName: string): TestDb {
  return knex(knexConfig(dbName));
}
