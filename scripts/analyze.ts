/**
 * Command-line tool of the stability engine (docs/engine-io.md):
 *   npx tsx scripts/analyze.ts section.json                       grid search
 *   npx tsx scripts/analyze.ts section.json --circle xc,yc,r      one circle, slice table
 *   npx tsx scripts/analyze.ts section.json --surface "x1,y1 x2,y2 ..."   one polyline slip surface
 *   cat section.json | npx tsx scripts/analyze.ts -               read standard input
 * Options: --map adds the minimum-FS map per method to a search's output.
 * A drawdown with analysis.drawdown.method "staged" (materials with cR, phiR or freeDraining)
 * reports each stage's FS under `stages`; the FS shown is the final stage's.
 * A document with `vary` on its materials and analysis.probabilistic (docs/probabilistic.md) adds
 * `probabilistic` per method and `probabilisticRun` to the search's output.
 * Standard output carries only JSON. Exit 0 with "ok": true; exit 2 with "ok": false and
 * the error list on bad input or bad arguments; exit 1 on an internal failure.
 */
import { readFileSync } from "node:fs";
import { analyzeCircle } from "../lib/stability/analyze-circle";
import { analyzeSurface } from "../lib/stability/surfaces/analyze-surface";
import { runSurfaceSearch } from "../lib/stability/surfaces/search-surfaces";
import { hasProbabilisticSettings, runProbabilistic } from "../lib/stability/probabilistic";

interface CliError {
  code: string;
  path: string;
  message: string;
}

const USAGE = 'usage: analyze.ts <section.json | -> [--circle xc,yc,r | --surface "x1,y1 x2,y2 ..."] [--map]';

/** Bad arguments or input: carried up to the top level, which writes the errors and sets the exit status. */
class CliFailure extends Error {
  constructor(
    readonly status: number,
    readonly errors: CliError[],
  ) {
    super(errors.map((e) => e.message).join("; "));
  }
}

function fail(status: number, errors: CliError[]): never {
  throw new CliFailure(status, errors);
}

/**
 * Writes the JSON and sets the exit status without process.exit, which would cut a large
 * output short when standard output is a pipe (docs/engine-io.md: output is written whole).
 */
function finish(value: unknown, status: number): void {
  process.stdout.write(`${JSON.stringify(value, null, 2)}\n`);
  process.exitCode = status;
}

interface Args {
  file: string;
  circle?: { xc: number; yc: number; r: number };
  surface?: [number, number][];
  map: boolean;
}

/** Parses "x1,y1 x2,y2 ..." (points apart by spaces or semicolons) into points, or fails naming the bad one. */
function parseSurface(spec: string | undefined): [number, number][] {
  const parts = (spec ?? "")
    .trim()
    .split(/[\s;]+/)
    .filter((p) => p !== "");
  const pts: [number, number][] = [];
  parts.forEach((p, i) => {
    const nums = p.split(",").map((s) => Number(s.trim()));
    if (nums.length !== 2 || !nums.every(Number.isFinite))
      fail(2, [
        {
          code: "bad-argument",
          path: "--surface",
          message: `--surface point ${i + 1} ("${p}") must be two numbers x,y in metres. ${USAGE}`,
        },
      ]);
    pts.push([nums[0], nums[1]]);
  });
  if (pts.length < 2)
    fail(2, [
      { code: "bad-argument", path: "--surface", message: `--surface needs at least two points x,y. ${USAGE}` },
    ]);
  return pts;
}

function parseArgs(argv: string[]): Args {
  let file: string | undefined;
  let circle: { xc: number; yc: number; r: number } | undefined;
  let surface: [number, number][] | undefined;
  let map = false;
  for (let i = 0; i < argv.length; i++) {
    const a = argv[i];
    if (a === "--circle") {
      const spec = argv[++i];
      const nums = (spec ?? "").split(",").map((s) => Number(s.trim()));
      if (nums.length !== 3 || !nums.every(Number.isFinite)) {
        fail(2, [
          {
            code: "bad-argument",
            path: "--circle",
            message: `--circle needs three numbers xc,yc,r in metres (got "${spec ?? ""}"). ${USAGE}`,
          },
        ]);
      }
      circle = { xc: nums[0], yc: nums[1], r: nums[2] };
    } else if (a === "--surface") surface = parseSurface(argv[++i]);
    else if (a === "--map") map = true;
    else if (a.startsWith("--")) fail(2, [{ code: "bad-argument", path: a, message: `Unknown option ${a}. ${USAGE}` }]);
    else if (file === undefined) file = a;
    else
      fail(2, [
        { code: "bad-argument", path: a, message: `Only one input file is read (got "${file}" and "${a}"). ${USAGE}` },
      ]);
  }
  if (file === undefined) fail(2, [{ code: "bad-argument", path: "", message: `No input given. ${USAGE}` }]);
  if (circle && surface)
    fail(2, [{ code: "bad-argument", path: "--surface", message: `Give --circle or --surface, not both. ${USAGE}` }]);
  return { file, circle, surface, map };
}

function readInput(file: string): unknown {
  let text: string;
  try {
    text = readFileSync(file === "-" ? 0 : file, "utf8");
  } catch (e) {
    fail(2, [
      {
        code: "unreadable-input",
        path: "",
        message: `Cannot read ${file === "-" ? "standard input" : file}: ${(e as Error).message}`,
      },
    ]);
  }
  try {
    return JSON.parse(text);
  } catch (e) {
    fail(2, [{ code: "invalid-json", path: "", message: `The input is not valid JSON: ${(e as Error).message}` }]);
  }
}

function main(): void {
  const { file, circle, surface, map } = parseArgs(process.argv.slice(2));
  const doc = readInput(file);
  if (surface) {
    const r = analyzeSurface(doc, surface);
    finish(r, r.ok ? 0 : 2);
    return;
  }
  if (circle) {
    const r = analyzeCircle(doc, circle);
    finish(r, r.ok ? 0 : 2);
    return;
  }
  // runSurfaceSearch is the grid search, followed by the surfaces search when analysis.search asks for it.
  const r = hasProbabilisticSettings(doc) ? runProbabilistic(doc) : runSurfaceSearch(doc);
  if (!r.ok) {
    finish(r, 2);
    return;
  }
  const { fsMap, ...rest } = r;
  const out = map ? r : rest;
  void fsMap;
  finish(out, 0);
}

try {
  main();
} catch (e) {
  if (e instanceof CliFailure) finish({ ok: false, errors: e.errors }, e.status);
  else
    finish(
      {
        ok: false,
        errors: [
          { code: "internal-error", path: "", message: `The engine failed unexpectedly: ${(e as Error).message}` },
        ],
      },
      1,
    );
}
