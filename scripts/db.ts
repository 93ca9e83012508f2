/**
 * Database chores: `tsx scripts/db.ts migrate | rollback | seed` (npm run db:migrate, db:rollback, db:seed).
 * Migrations are listed in db/migrations/index.ts, so no TypeScript loader is needed by knex.
 */
import knex from "knex";
import { knexConfig } from "../db/config";
import { seedDemo, DEMO_USERS, DEMO_PASSWORD } from "../db/seeds/demo";

async function main(): Promise<void> {
  const command = process.argv[2];
  const db = knex(knexConfig());
  try {
    switch (command) {
      case "migrate": {
        const [, done] = await db.migrate.latest();
        console.error(done.length ? `migrated: ${done.join(", ")}` : "schema up to date");
        break;
      }
      case "rollback": {
        const [, undone] = await db.migrate.rollback(undefined, true);
        console.error(undone.length ? `rolled back: ${undone.join(", ")}` : "nothing to roll back");
        break;
      }
      case "seed": {
        const { created } = await seedDemo(db);
        console.error(created ? "demo data seeded" : "demo data already present");
        console.error(`demo sign-ins (password "${DEMO_PASSWORD}"):`);
        for (const u of DEMO_USERS) console.error(`  ${u.role.padEnd(9)} ${u.email}`);
        break;
      }
      default:
        console.error("usage: tsx scripts/db.ts migrate | rollback | seed");
        process.exitCode = 2;
    }
  } finally {
    await db.destroy();
  }
}

main().catch((err: unknown) => {
  console.error(err instanceof Error ? err.message : err);
  process.exit(1);
});
