import { inject } from "vitest";

// Route the data layer (db/index.ts) to this run's database before any test imports it.
process.env.DATABASE_NAME = inject("dbName");
