/**
 * The command-line tool (docs/engine-io.md): JSON only on stdout, exit 0 with "ok": true, exit 2
 * with the error list on bad input, `-` reads stdin, `--circle xc,yc,r` for one circle, and the
 * output written whole when piped. Reference values: ACADS (1989) problem 1(a)
 * (docs/references.md, memory, recomputed); the engine's worked examples (docs/engine.md §3, §7;
 * derived values, see engine-rules.test.ts).
 */
import { execFileSync, spawnSync } from "node:child_process";
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

  test.each([
    ["trench-two-pieces.json", "50,20,18", 0.628, 1e-3],
    ["cut-steep-arc-end.json", "22,10.02,8", 1.9692, 5e-3],
    ["drawdown-line-above-face.json", "30,22,20", 1.232, 1e-3],
  ])(
    "%s --circle %s gives Bishop %s",
    (file, spec, bishop, rel) => {
      const r = run([path.join(FIXTURES, file), "--circle", spec]);
      expect(r.status).toBe(0);
      expect(Math.abs(r.json.fs.bishop / bishop - 1)).toBeLessThan(rel);
    },
    60_000,
  );

  test("a grid search over the trench prints about 0.432", () => {
    const r = run([path.join(FIXTURES, "trench-two-pieces.json")]);
    expect(r.status).toBe(0);
    expect(Math.abs(r.json.results.bishop.fs / 0.432 - 1)).toBeLessThan(2e-3);
  }, 60_000);

  test("a 400-slice table (well over 64 KiB) comes through a pipe whole, exit status 0", () => {
    const doc = JSON.parse(readFileSync(path.join(FIXTURES, "cut-steep-arc-end.json"), "utf8"));
    doc.analysis = { slices: 400 };
    // Through a shell pipe, as a user would: the exit status is the tool's (pipefail).
    const out = execFileSync(
      "bash",
      ["-o", "pipefail", "-c", "npx tsx scripts/analyze.ts - --circle 22,10.02,8 | cat"],
      { cwd: ROOT, input: JSON.stringify(doc), encoding: "utf8", maxBuffer: 64 * 1024 * 1024, timeout: 60_000 },
    );
    expect(out.length).toBeGreaterThan(64 * 1024);
    const json = JSON.parse(out);
    expect(json.ok).toBe(true);
    expect(json.slices.length).toBeGreaterThanOrEqual(400);
  }, 60_000);
});
