#!/usr/bin/env node
/**
 * Bundles the stability engine and the design sweep into one ES module that server worker
 * threads load: .engine/sweep-worker.mjs (git-ignored). Run by `npm run build:engine`, by the
 * "prebuild" script, and by the sweep route itself when the file is missing.
 * Plain JavaScript so it runs with node alone, without tsx.
 */
import { build } from "esbuild";
import path from "node:path";
import { fileURLToPath } from "node:url";

const root = path.resolve(path.dirname(fileURLToPath(import.meta.url)), "..");
const outfile = path.join(root, ".engine", "sweep-worker.mjs");

const started = Date.now();
await build({
  entryPoints: [path.join(root, "lib/design/sweep-thread-entry.ts")],
  outfile,
  bundle: true,
  platform: "node",
  format: "esm",
  target: "node20",
  tsconfig: path.join(root, "tsconfig.json"),
  logLevel: "warning",
  legalComments: "none",
});
console.log(`build-engine: wrote ${path.relative(root, outfile)} in ${Date.now() - started} ms`);
