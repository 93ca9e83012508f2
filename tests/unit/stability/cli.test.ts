/**
 * The command-line tool (ENGINE-IO.md): JSON only on stdout, exit 0 with "ok": true, exit 2
 * with the error list on bad input, `-` reads stdin, `--circle xc,yc,r` for one circle.
 * Reference values: ACADS (1989) problem 1(a) (REFERENCES.md, memory, recomputed).
 */
import { spawnSync } from "node:child_process";
import { readFileSync } from "node:fs";
import path from "node:path";
import { describe, expect, test } from "vitest";
import { FIXTURES } from "./helpers";

// The fields these checks read from the command line's JSON (docs/engine-io.md); a missing one fails the test.
interface CliOutput {
  ok: boolean;
  results: { bishop: { fs: number } };
  circles: { tried: number };
  fs: { bishop: number; fellenius: number };
  slices: Record<string, unknown>[];
  errors: { code: string; path: string }[];
}

const ROOT = path.resolve(__dirname, "../../..");

function run(args: string[], input?: string) {
  const r = spawnSync("npx", ["tsx", "scripts/analyze.ts", ...args], {
    cwd: ROOT,
    input,
    encoding: "utf8",
    timeout: 60_000,
  });
  return { status: r.status, json: JSON.parse(r.stdout) as CliOutput, stdout: r.stdout };
}

describe("scripts/analyze.ts", () => {
  test("a grid search of ACADS 1(a) prints the Bishop minimum within 0.97–1.01 and exits 0", () => {
    const r = run([path.join(FIXTURES, "acads-1a.json")]);
    expect(r.status).toBe(0);
    expect(r.json.ok).toBe(true);
    expect(r.json.results.bishop.fs).toBeGreaterThanOrEqual(0.97);
    expect(r.json.results.bishop.fs).toBeLessThanOrEqual(1.01);
    expect(r.json.circles.tried).toBeGreaterThan(0);
  }, 60_000);

  test("--circle gives ACADS 1(a)'s forced circle (30, 55, R 30): Bishop 0.9925, ordinary 0.9570 ± 0.5 %, read from stdin", () => {
    const text = readFileSync(path.join(FIXTURES, "acads-1a.json"), "utf8");
    const r = run(["-", "--circle", "30,55,30"], text);
    expect(r.status).toBe(0);
    expect(Math.abs(r.json.fs.bishop / 0.9925 - 1)).toBeLessThan(0.005);
    expect(Math.abs(r.json.fs.fellenius / 0.957 - 1)).toBeLessThan(0.005);
    expect(r.json.slices.length).toBeGreaterThanOrEqual(50);
    expect(r.json.slices[0]).toHaveProperty("porePressure");
  }, 60_000);

  test("bad input exits 2 with every error listed", () => {
    const r = run([path.join(FIXTURES, "bad-many-errors.json")]);
    expect(r.status).toBe(2);
    expect(r.json.ok).toBe(false);
    expect(r.json.errors.map((e: { code: string }) => e.code).sort()).toEqual([
      "missing-unit-weight",
      "phi-out-of-range",
      "phreatic-not-spanning",
    ]);
    expect(r.json.errors[0].path).toBe("materials[0].gamma");
  }, 60_000);

  test("text that is not JSON exits 2 with a JSON error", () => {
    const r = run(["-"], "{ not json");
    expect(r.status).toBe(2);
    expect(r.json.errors[0].code).toBe("invalid-json");
  }, 60_000);
});
