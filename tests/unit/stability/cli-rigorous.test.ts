/**
 * The command line's rigorous methods and slip surfaces (docs/engine-io.md "Methods and slip surfaces
 * of any shape"): `--circle` reports every method asked for, `--surface` one polyline (Bishop and the
 * ordinary method null with `circular-only`), bad points exit 2 naming the argument, and a surfaces
 * search prints `surface` per rigorous result. Reference values: Fredlund & Krahn (1977) case 1
 * (docs/references.md, published table via a secondary listing); the plane's closed form
 * (rigid-block force equilibrium, practice).
 */
import { spawnSync } from "node:child_process";
import { writeFileSync, mkdtempSync } from "node:fs";
import os from "node:os";
import path from "node:path";
import { describe, expect, test } from "vitest";
import { FIXTURES, clone, loadFixture } from "./helpers";

const ROOT = path.resolve(__dirname, "../../..");

interface Out {
  ok: boolean;
  fs: Record<string, number | null>;
  lambda: Record<string, number | null>;
  reasons: Record<string, { reason: string }>;
  reason?: string;
  results: Record<string, { fs: number; surface?: [number, number][]; lambda?: number }>;
  errors: { code: string; path: string; message: string }[];
}

function run(args: string[]) {
  const r = spawnSync("npx", ["tsx", "scripts/analyze.ts", ...args], { cwd: ROOT, encoding: "utf8", timeout: 120_000 });
  return { status: r.status, json: JSON.parse(r.stdout) as Out };
}

const fk = path.join(FIXTURES, "fredlund-krahn-1977.json");

describe("scripts/analyze.ts with rigorous methods", () => {
  test("--circle prints all four methods and λ for Fredlund & Krahn's circle", () => {
    const r = run([fk, "--circle", "120,90,80"]);
    expect(r.status).toBe(0);
    expect(Math.abs((r.json.fs.spencer ?? 0) / 2.073 - 1)).toBeLessThan(0.01);
    expect(Math.abs((r.json.fs["morgenstern-price"] ?? 0) / 2.076 - 1)).toBeLessThan(0.01);
    expect(Math.abs((r.json.fs.bishop ?? 0) / 2.08 - 1)).toBeLessThan(0.01);
    expect(r.json.lambda.spencer).toBeTypeOf("number");
  }, 120_000);

  test("--surface on a plane: Spencer = the rigid block's F; Bishop and the ordinary method circular-only", () => {
    // The plane (40, 60) → (140, 20) under the face (60, 60)–(140, 20): α = atan(40/100), L = √(100² + 40²);
    // the block is the triangle (40, 60), (60, 60), (140, 20): area ½·|20·(−40)| = 400, W = 20·400 = 8000.
    const r = run([fk, "--surface", "40,60 140,20"]);
    expect(r.status).toBe(0);
    const a = Math.atan(40 / 100);
    const W = 8000;
    const F = (100 * Math.hypot(100, 40) + W * Math.cos(a) * Math.tan((20 * Math.PI) / 180)) / (W * Math.sin(a));
    expect(Math.abs((r.json.fs.spencer ?? 0) / F - 1)).toBeLessThan(1e-7);
    expect(r.json.fs.bishop).toBeNull();
    expect(r.json.reasons.bishop.reason).toBe("circular-only");
  }, 120_000);

  test("a point that is not two numbers exits 2 naming --surface", () => {
    const r = run([fk, "--surface", "40,60 abc 140,20"]);
    expect(r.status).toBe(2);
    expect(r.json.ok).toBe(false);
    expect(r.json.errors[0].path).toBe("--surface");
    expect(r.json.errors[0].message).toContain("point 2");
  }, 120_000);

  test("a surface whose end is off the ground prints the reason and no number, exit 0", () => {
    const r = run([fk, "--surface", "40,65 140,20"]);
    expect(r.status).toBe(0);
    expect(r.json.reason).toBe("end-not-on-ground");
    expect(r.json.fs.spencer).toBeNull();
  }, 120_000);

  test('analysis.search "surfaces" prints a surface and λ for each rigorous result', () => {
    const doc = clone(loadFixture("weak-layer-outline.json"));
    doc.analysis = { ...doc.analysis, methods: ["bishop", "spencer"], search: "surfaces" };
    const file = path.join(mkdtempSync(path.join(os.tmpdir(), "scarpline-")), "weak.json");
    writeFileSync(file, JSON.stringify(doc));
    const r = run([file]);
    expect(r.status).toBe(0);
    expect(r.json.results.spencer.surface?.length).toBeGreaterThan(2);
    expect(r.json.results.spencer.lambda).toBeTypeOf("number");
    expect(r.json.results.bishop.surface).toBeUndefined();
    expect(r.json.results.spencer.fs).toBeLessThan(r.json.results.bishop.fs);
  }, 120_000);
});
