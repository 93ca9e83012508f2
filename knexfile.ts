import { knexConfig } from "./db/config";

// Knex settings for tools that look for a knexfile; the project's scripts use db/config.ts directly.
export default knexConfig();
