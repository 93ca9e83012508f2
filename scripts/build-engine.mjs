#!/usr/bin/env node
/**
 * Bundles, at build time, what runs outside the Next.js server:
 * - .engine/sweep-worker.mjs: the stability engine and the design sweep, for the engine threads
 *   that check kept runs (lib/design/engine-threads.ts);
 * - .engine/worker.mjs: the queue worker (scripts/worker.ts) with the engine inside; npm
 *   packages stay outside and load from node_modules;
 * - .engine/probabilistic-worker.mjs: the thread a probabilistic job runs on (lib/jobs/probabilistic-thread.ts).
 * Run by `npm run build:engine`, by the "prebuild" script and by scripts/start.sh.
 * Plain JavaScript so it runs with node alone, without tsx. `--if-missing` skips a build already there.
 */
import { build } from "esbuild";
import fs from "node:fs";
import path from "node:path";
import { fileURLToPath } from "node:url";

const root = path.resolve(path.dirname(fileURLToPath(import.meta.url)), "..");
const bundles = [
  { entry: "lib/design/sweep-thread-entry.ts", outfile: ".engine/sweep-worker.mjs", packages: undefined },
  { entry: "scripts/worker.ts", outfile: ".engine/worker.mjs", packages: "external" },
  { entry: "lib/jobs/probabilistic-thread-entry.ts", outfile: ".engine/probabilistic-worker.mjs", packages: undefined },
];

const ifMissing = process.argv.includes("--if-missing");
for (const b of bundles) {
  const outfile = path.join(root, b.outfile);
  if (ifMissing && fs.existsSync(outfile)) continue;
  const started = Date.now();
  await build({
    entryPoints: [path.join(root, b.entry)],
    outfile,
    bundle: true,
    platform: "node",
    format: "esm",
    target: "node20",
    tsconfig: path.join(root, "tsconfig.json"),
    logLevel: "warning",
    legalComments: "none",
    ...(b.packages ? { packages: b.packages } : {}),
  });
  console.log(`build-engine: wrote ${b.outfile} in ${Date.now() - started} ms`);
}
