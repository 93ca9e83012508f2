import type { Knex } from "knex";
import { getDb } from "../index";

/** Throws the driver's error when the database cannot answer. */
export async function pingDatabase(db: Knex = getDb()): Promise<void> {
  await db.raw("SELECT 1");
}
