/**
 * What the request hardening of issue 12 adds to an ordinary section save, measured piece by piece:
 * the capped JSON read (against the plain request.json() it replaced), the size limits of the document,
 * and the session-version lookup every signed-in request now makes. Prints figures only; the last line is
 * `save_overhead_ms=N`, the sum of the medians, to hold against the 300 ms a save may lose at most.
 */
import { readFileSync } from "node:fs";
import path from "node:path";
import { MAX_JSON_BYTES, MAX_JSON_LABEL, readCappedText, requireJsonContentType } from "../lib/api/request-guards";
import { sectionLimitErrors } from "../lib/validations/section-limits";
import knex from "knex";
import { fetchSessionState } from "../db/queries/users";
import { knexConfig } from "../db/config";
import { seedDemo } from "../db/seeds/demo";

const file = path.join(__dirname, "..", "tests", "fixtures", "sections", "three-material-embankment.json");
const doc = JSON.parse(readFileSync(file, "utf8"));
// The largest document the limits let through: 5,000 points over 5 regions.
const largest = {
  ...doc,
  regions: Array.from({ length: 5 }, (_, r) => ({
    material: doc.regions[0].material,
    points: Array.from({ length: 1000 }, (_, i) => [r * 100 + i * 0.1, Math.sin(i / 50) * 5]),
  })),
};

const median = (xs: number[]) => [...xs].sort((a, b) => a - b)[Math.floor(xs.length / 2)];

async function timeMs(runs: number, fn: () => Promise<unknown> | unknown): Promise<number> {
  for (let i = 0; i < 3; i++) await fn(); // warm-up
  const times: number[] = [];
  for (let i = 0; i < runs; i++) {
    const t0 = performance.now();
    await fn();
    times.push(performance.now() - t0);
  }
  return median(times);
}

const request = (body: string) =>
  new Request("http://127.0.0.1/api/x", { method: "PUT", headers: { "content-type": "application/json" }, body });

async function main() {
  for (const [name, document] of [
    ["demo-size section", doc],
    ["largest accepted section", largest],
  ] as const) {
    const body = JSON.stringify({ baseVersion: 1, document });
    const plain = await timeMs(50, () => request(body).json());
    const capped = await timeMs(50, async () => {
      const r = request(body);
      requireJsonContentType(r);
      return JSON.parse(await readCappedText(r, MAX_JSON_BYTES, MAX_JSON_LABEL));
    });
    const limits = await timeMs(50, () => sectionLimitErrors(document));
    console.log(`${name}: body ${(body.length / 1024).toFixed(1)} KiB`);
    console.log(`  request.json()            ${plain.toFixed(3)} ms`);
    console.log(`  capped read + JSON.parse  ${capped.toFixed(3)} ms`);
    console.log(`  size limits               ${limits.toFixed(3)} ms`);
  }
  const body = JSON.stringify({ baseVersion: 1, document: largest });
  const capped = await timeMs(30, async () => JSON.parse(await readCappedText(request(body), MAX_JSON_BYTES, "")));
  const plain = await timeMs(30, () => request(body).json());
  const limits = await timeMs(30, () => sectionLimitErrors(largest));
  // A database of the benchmark's own on the shared server, dropped at the end.
  const name = `scarpline_bench_${process.pid}`;
  const server = knex({ ...knexConfig(), connection: { ...(knexConfig().connection as object), database: undefined } });
  await server.raw(`CREATE DATABASE \`${name}\` CHARACTER SET utf8mb4 COLLATE utf8mb4_unicode_ci`);
  const db = knex(knexConfig(name));
  let session = NaN;
  try {
    await db.migrate.latest();
    await seedDemo(db);
    const user = await db("users").first("id");
    session = await timeMs(50, () => fetchSessionState(user.id, db));
  } finally {
    await db.destroy();
    await server.raw(`DROP DATABASE IF EXISTS \`${name}\``);
    await server.destroy();
  }
  console.log(`session version lookup      ${session.toFixed(3)} ms`);
  const overhead = Math.max(0, capped - plain) + limits + session;
  console.log(`save_overhead_ms=${overhead.toFixed(2)}`);
}

main().catch((err) => {
  console.error(err);
  process.exit(1);
});
