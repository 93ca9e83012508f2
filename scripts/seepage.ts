/**
 * Command-line seepage run (docs/seepage.md; the contract in docs/engine-io.md §2):
 *   npx tsx scripts/seepage.ts section.json          steady seepage, prints the solution JSON
 *   cat section.json | npx tsx scripts/seepage.ts -  read standard input
 * Options: --mesh adds the mesh (node coordinates, triangles) and the head at every node.
 * Standard output carries only JSON, written whole. Exit 0 with "ok": true; exit 2 with
 * "ok": false and every error with its path on bad input; exit 1 on an internal failure.
 */
import { readFileSync } from "node:fs";
import { runSeepage } from "../lib/seepage";

interface CliError {
  code: string;
  path: string;
  message: string;
}

const USAGE = "usage: seepage.ts <section.json | -> [--mesh]";

function write(value: unknown): Promise<void> {
  // Large outputs piped to another program must arrive whole before the process exits.
  return new Promise((resolve) => process.stdout.write(`${JSON.stringify(value, null, 2)}\n`, () => resolve()));
}

async function fail(status: number, errors: CliError[]): Promise<never> {
  await write({ ok: false, errors });
  process.exit(status);
}

async function main(): Promise<void> {
  const args = process.argv.slice(2);
  let file: string | undefined;
  let withMesh = false;
  for (const a of args) {
    if (a === "--mesh") withMesh = true;
    else if (a.startsWith("--"))
      await fail(2, [{ code: "bad-argument", path: a, message: `Unknown option ${a}. ${USAGE}` }]);
    else if (file === undefined) file = a;
    else
      await fail(2, [
        { code: "bad-argument", path: a, message: `Only one input file is read (got "${file}" and "${a}"). ${USAGE}` },
      ]);
  }
  if (file === undefined) return fail(2, [{ code: "bad-argument", path: "", message: `No input given. ${USAGE}` }]);
  let text = "";
  try {
    text = readFileSync(file === "-" ? 0 : file, "utf8");
  } catch (e) {
    const where = file === "-" ? "standard input" : file;
    await fail(2, [{ code: "unreadable-input", path: "", message: `Cannot read ${where}: ${(e as Error).message}` }]);
  }
  let doc: unknown;
  try {
    doc = JSON.parse(text);
  } catch (e) {
    await fail(2, [
      { code: "invalid-json", path: "", message: `The input is not valid JSON: ${(e as Error).message}` },
    ]);
  }
  const run = runSeepage(doc);
  if (!run.ok) return fail(2, run.errors);
  if (!withMesh) return write(run.solution);
  const { mesh, head } = run.model.field;
  await write({
    ...run.solution,
    meshData: {
      x: Array.from(mesh.x),
      y: Array.from(mesh.y),
      triangles: Array.from(mesh.tri),
      material: Array.from(run.model.field.material),
      head: Array.from(head, (h) => (Number.isFinite(h) ? h : null)),
    },
  });
}

main().then(
  () => process.exit(0),
  (e: unknown) =>
    fail(1, [{ code: "internal-error", path: "", message: `The solver failed unexpectedly: ${(e as Error).message}` }]),
);
