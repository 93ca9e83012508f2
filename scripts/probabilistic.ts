/**
 * Command-line probabilistic run (ENGINE-IO-2.md §4, docs/probabilistic.md):
 *   npx tsx scripts/probabilistic.ts section.json      (or - for standard input)
 * The section carries `vary` on its materials and analysis.probabilistic. Standard output is
 * the whole result as JSON: the deterministic search (without the FS map) plus `probabilistic`
 * per method and `probabilisticRun`. Exit 0 when ok, 2 with every error and its path on bad
 * input, 1 on an internal failure.
 */
import { readFileSync } from "node:fs";
import { runProbabilistic } from "../lib/stability/probabilistic";

interface CliError {
  code: string;
  path: string;
  message: string;
}

const USAGE = "usage: probabilistic.ts <section.json | ->";

function fail(status: number, errors: CliError[]): never {
  process.stdout.write(`${JSON.stringify({ ok: false, errors }, null, 2)}\n`);
  process.exit(status);
}

function readInput(argv: string[]): unknown {
  const [file, ...rest] = argv;
  if (file === undefined || file.startsWith("--") || rest.length > 0)
    fail(2, [{ code: "bad-argument", path: rest[0] ?? file ?? "", message: `Give exactly one input. ${USAGE}` }]);
  let text: string;
  try {
    text = readFileSync(file === "-" ? 0 : file, "utf8");
  } catch (e) {
    fail(2, [{ code: "unreadable-input", path: "", message: `Cannot read ${file}: ${(e as Error).message}` }]);
  }
  try {
    return JSON.parse(text);
  } catch (e) {
    fail(2, [{ code: "invalid-json", path: "", message: `The input is not valid JSON: ${(e as Error).message}` }]);
  }
}

function main(): void {
  const r = runProbabilistic(readInput(process.argv.slice(2)));
  if (!r.ok) {
    process.stdout.write(`${JSON.stringify(r, null, 2)}\n`);
    process.exit(2);
  }
  const { fsMap, ...rest } = r;
  void fsMap;
  process.stdout.write(`${JSON.stringify(rest, null, 2)}\n`);
  process.exit(0);
}

try {
  main();
} catch (e) {
  fail(1, [{ code: "internal-error", path: "", message: `The engine failed unexpectedly: ${(e as Error).message}` }]);
}
