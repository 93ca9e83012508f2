/**
 * The seepage command line (docs/seepage.md §8): JSON only on stdout, written whole even when
 * piped; exit 0 with "ok": true; exit 2 with every error and its path; `-` reads stdin.
 */
import { spawnSync } from "node:child_process";
import { readFileSync } from "node:fs";
import path from "node:path";
import { describe, expect, test } from "vitest";

const ROOT = path.resolve(__dirname, "../../..");

/** The parts of the output these tests read. */
interface Json {
  ok: boolean;
  q: number;
  qIn: number;
  qOut: number;
  qTotal: number;
  phreatic: [number, number][];
  probes: { x: number; y: number; head: number; pressure: number }[];
  exitGradients: { i: number }[];
  mesh: { nodes: number };
  cautions: string[];
  meshData: { x: number[]; head: (number | null)[]; triangles: number[] };
  errors: { code: string; path: string }[];
}
const ZONED = path.join(__dirname, "zoned-dam.json");

function run(args: string[], input?: string) {
  const r = spawnSync("npx", ["tsx", "scripts/seepage.ts", ...args], {
    cwd: ROOT,
    input,
    encoding: "utf8",
    timeout: 60_000,
    maxBuffer: 64 * 1024 * 1024,
  });
  return { status: r.status, json: JSON.parse(r.stdout) as Json, stdout: r.stdout };
}

describe("scripts/seepage.ts", () => {
  test("the zoned dam: q with qIn = qOut (1 %), a phreatic line across the section, probes, exit gradients", () => {
    const r = run([ZONED]);
    expect(r.status).toBe(0);
    const s = r.json;
    expect(s.ok).toBe(true);
    expect(Math.abs(s.qIn / s.qOut - 1)).toBeLessThan(0.01);
    expect(s.q).toBeGreaterThan(0);
    expect(Math.abs(s.qTotal / (s.q * 250) - 1)).toBeLessThan(1e-5);
    expect(s.phreatic[0]).toEqual([0, 21]);
    expect(s.phreatic[s.phreatic.length - 1][0]).toBe(120);
    // The core takes most of the head: its probe (58, 10) is well below the pool, the upstream shell's is not.
    const [core, upstream] = s.probes;
    expect(core.head).toBeLessThan(19);
    expect(upstream.head).toBeGreaterThan(20);
    expect(upstream.pressure).toBeCloseTo(9.81 * (upstream.head - 3), 3);
    expect(s.exitGradients.length).toBeGreaterThan(0);
    for (const g of s.exitGradients) expect(g.i).toBeGreaterThan(0);
    expect(s.mesh.nodes).toBeGreaterThan(100);
    expect(s.cautions.length).toBeGreaterThan(0);
  }, 60_000);

  test("stdin with --mesh gives the mesh and a head per node, and the output is whole when piped", () => {
    const text = readFileSync(ZONED, "utf8");
    const r = run(["-", "--mesh"], text);
    expect(r.status).toBe(0);
    const m = r.json.meshData;
    expect(m.triangles.length % 3).toBe(0);
    expect(m.x.length).toBe(m.head.length);
    expect(r.stdout.endsWith("}\n")).toBe(true);
  }, 60_000);

  test("bad input exits 2 with every error and its path", () => {
    const doc = JSON.parse(readFileSync(ZONED, "utf8"));
    delete doc.materials[1].k;
    doc.seepage.pools[0].level = -3;
    doc.seepage.drains = [
      [
        [100, 6],
        [130, 6],
      ],
    ];
    const r = run(["-"], JSON.stringify(doc));
    expect(r.status).toBe(2);
    expect(r.json.ok).toBe(false);
    expect(r.json.errors.map((e: { path: string }) => e.path).sort()).toEqual([
      "materials[1].k",
      "seepage.drains[0][1]",
    ]);
  }, 60_000);

  test("text that is not JSON and an unknown option exit 2 with a JSON error", () => {
    expect(run(["-"], "{ nope").json.errors[0].code).toBe("invalid-json");
    const r = run([ZONED, "--fast"]);
    expect(r.status).toBe(2);
    expect(r.json.errors[0].path).toBe("--fast");
  }, 60_000);
});
