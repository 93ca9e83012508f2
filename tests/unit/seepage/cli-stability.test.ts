/**
 * scripts/analyze.ts on a document whose water comes from seepage (docs/engine-io.md §2): the same
 * results as the orchestrator in-process, the seepage summary in the output, and bad input refused
 * with exit 2 and the path of each problem.
 */
import { spawnSync } from "node:child_process";
import { mkdtempSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import path from "node:path";
import { describe, expect, test } from "vitest";
import { searchOnWater } from "@/lib/seepage-stability";
import { homogeneousDam } from "./stability-sections";

const ROOT = path.resolve(__dirname, "../../..");
const DIR = mkdtempSync(path.join(tmpdir(), "scarpline-seepstab-"));

interface Json {
  ok: boolean;
  results: { bishop: { fs: number } | null };
  seepage: { q: number; meshSize: number; nodes: number };
  errors: { code: string; path: string; message: string }[];
}

function analyze(doc: unknown, name: string) {
  const file = path.join(DIR, `${name}.json`);
  writeFileSync(file, JSON.stringify(doc));
  const r = spawnSync("npx", ["tsx", "scripts/analyze.ts", file], {
    cwd: ROOT,
    encoding: "utf8",
    timeout: 120_000,
    maxBuffer: 64 * 1024 * 1024,
  });
  return { status: r.status, json: JSON.parse(r.stdout) as Json };
}

const seepage = {
  pools: [{ side: "left", level: 8 }],
  drains: [
    [
      [46, 0],
      [56, 0],
    ],
  ],
  meshSize: 1,
};

describe("scripts/analyze.ts with seepage water", () => {
  test("runs the seepage, then the search on its pore pressures, as the app does", () => {
    const doc = homogeneousDam({ water: { source: "seepage" }, seepage });
    const { status, json } = analyze(doc, "good");
    expect(status).toBe(0);
    expect(json.ok).toBe(true);
    // One orchestrator for the command line and the app: the same numbers, to the last digit.
    const inProcess = searchOnWater(doc);
    if (!inProcess.ok) throw new Error("in-process run failed");
    expect(json.results.bishop?.fs).toBe(inProcess.results.bishop?.fs);
    expect(json.seepage.q).toBeGreaterThan(0);
    expect(json.seepage.meshSize).toBe(1);
  }, 120_000);

  test("water from seepage without a seepage block: exit 2 naming `seepage`", () => {
    const { status, json } = analyze(homogeneousDam({ water: { source: "seepage" } }), "no-block");
    expect(status).toBe(2);
    expect(json.ok).toBe(false);
    expect(json.errors.map((e) => e.path)).toEqual(["seepage"]);
  }, 120_000);

  test("a pervious material without k: exit 2 naming `materials[0].k`", () => {
    const doc = homogeneousDam({ water: { source: "seepage" }, seepage });
    doc.materials = doc.materials.map((m) => (m.id === "fill" ? { ...m, k: undefined } : m));
    const { status, json } = analyze(doc, "no-k");
    expect(status).toBe(2);
    expect(json.errors.map((e) => e.path)).toContain("materials[0].k");
    expect(json.errors[0].message).toMatch(/fill/);
  }, 120_000);
});
