import type { Knex } from "knex";
import * as m001 from "./001-organisations-users-projects";
import * as m002 from "./002-sections-materials-runs";
import * as m004 from "./004-documents";
import * as m005 from "./005-loading-conditions";
import * as m006 from "./006-review";
import * as m007 from "./007-design-studies";
import * as m008 from "./008-run-water-condition";
import * as m009 from "./009-below-required-sign-off";
import * as m010 from "./010-sign-in-counters-and-session-versions";
import * as m011 from "./011-jobs";
import * as m012 from "./012-section-archive";
import * as m013 from "./013-seepage";
import * as m014 from "./014-probabilistic";
import * as m015 from "./015-password-resets-and-last-sign-in";

interface Migration {
  up(knex: Knex): Promise<void>;
  down(knex: Knex): Promise<void>;
}

// Listed explicitly so the same migrations load under Next.js, tsx and vitest alike,
// where knex's own file loader would need a TypeScript require hook.
const migrations: Record<string, Migration> = {
  "001-organisations-users-projects": m001,
  "002-sections-materials-runs": m002,
  "004-documents": m004,
  "005-loading-conditions": m005,
  "006-review": m006,
  "007-design-studies": m007,
  "008-run-water-condition": m008,
  "009-below-required-sign-off": m009,
  "010-sign-in-counters-and-session-versions": m010,
  "011-jobs": m011,
  "012-section-archive": m012,
  "013-seepage": m013,
  "014-probabilistic": m014,
  "015-password-resets-and-last-sign-in": m015,
};

export const migrationSource: Knex.MigrationSource<string> = {
  getMigrations: async () => Object.keys(migrations).sort(),
  getMigrationName: (name) => name,
  getMigration: async (name) => migrations[name],
};
