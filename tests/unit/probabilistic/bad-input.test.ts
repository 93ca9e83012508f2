/**
 * Bad input (issue 17 item 6; docs/engine-io.md, errors): every problem comes back with a code, a
 * path into the document and a message saying what to change; nothing is computed.
 */
import { spawnSync } from "node:child_process";
import path from "node:path";
import { describe, expect, test } from "vitest";
import { runProbabilistic } from "@/lib/stability/probabilistic";
import { loadDoc, withSettings, type Doc } from "./helpers";

const base = loadDoc("linear-dry-slope.json");

function errorsOf(doc: unknown) {
  const r = runProbabilistic(doc);
  if (r.ok) throw new Error("expected errors");
  return r.errors;
}

function edit(f: (d: Doc) => void): Doc {
  const d = JSON.parse(JSON.stringify(base)) as Doc;
  f(d);
  return d;
}

describe("runProbabilistic rejects", () => {
  test("a φ′ standard deviation that puts many samples below 0°, at the sd's path", () => {
    const e = errorsOf(edit((d) => (d.materials[0].vary = { phi: { dist: "normal", sd: 10 } })));
    expect(e).toHaveLength(1);
    expect(e[0]).toMatchObject({ code: "samples-out-of-range", path: "materials[0].vary.phi.sd" });
    // φ′ = 5°, sd 10°: Φ(−0.5) = 30.9 % of samples below 0°.
    expect(e[0].message).toContain("30.9 %");
  });

  test("the same spread is accepted once truncated at 0° or made lognormal", () => {
    for (const phi of [
      { dist: "normal", sd: 10, min: 0 },
      { dist: "lognormal", sd: 2 },
    ]) {
      const d = edit((x) => {
        x.materials[0].vary = { phi };
        x.analysis.probabilistic.samples = 50;
      });
      expect(runProbabilistic(d).ok).toBe(true);
    }
  });

  test.each([
    ["critical-surface", 100_001],
    ["full-search", 2_001],
    ["critical-surface", 5],
  ])("mode %s with %i samples, at analysis.probabilistic.samples", (mode, samples) => {
    const e = errorsOf(withSettings(base, { mode, samples }));
    expect(e.map((x) => x.path)).toEqual(["analysis.probabilistic.samples"]);
    expect(e[0].message).toContain(mode);
  });

  test("unknown keys, wrong kinds and missing settings, each at its path", () => {
    const e = errorsOf(
      edit((d) => {
        d.materials[0].vary = { c: { dist: "uniform", sd: 1 }, cohesion: { dist: "normal", sd: 1 } };
        d.analysis.probabilistic = { samples: 100, seed: -1, sampling: "grid" };
      }),
    );
    const paths = e.map((x) => x.path).sort();
    expect(paths).toEqual(
      [
        "analysis.probabilistic.sampling",
        "analysis.probabilistic.seed",
        "materials[0].vary",
        "materials[0].vary.c.dist",
      ].sort(),
    );
  });

  test("a missing analysis.probabilistic", () => {
    const e = errorsOf(edit((d) => delete (d.analysis as Record<string, unknown>).probabilistic));
    expect(e).toEqual([expect.objectContaining({ code: "probabilistic-missing", path: "analysis.probabilistic" })]);
  });

  test("values that do not exist, a lone correlation, a level without drawdown, a lognormal of a zero mean", () => {
    const e = errorsOf(
      edit((d) => {
        d.materials[0].c = 0;
        d.materials[0].vary = { su: { dist: "normal", sd: 1 }, c: { dist: "lognormal", sd: 1 }, correlation: 0.5 };
        d.analysis.probabilistic.level = { dist: "normal", sd: 0.5 };
      }),
    );
    expect(e.map((x) => [x.code, x.path])).toEqual([
      ["lognormal-needs-positive-mean", "materials[0].vary.c.dist"],
      ["vary-without-value", "materials[0].vary.su"],
      ["correlation-needs-c-and-phi", "materials[0].vary.correlation"],
      ["level-needs-drawdown", "analysis.probabilistic.level"],
    ]);
  });

  test("section errors come back together with the probabilistic ones", () => {
    const e = errorsOf(
      edit((d) => {
        d.materials[0].gamma = -3;
        d.analysis.probabilistic.samples = 1e6;
      }),
    );
    expect(e.map((x) => x.path)).toContain("materials[0].gamma");
  });

  test("the command line exits 2 with the error list", () => {
    const d = edit((x) => (x.materials[0].vary = { phi: { dist: "normal", sd: 10 } }));
    const out = spawnSync("npx", ["tsx", "scripts/analyze.ts", "-"], {
      cwd: path.resolve(__dirname, "../../.."),
      input: JSON.stringify(d),
      encoding: "utf8",
      timeout: 60_000,
    });
    expect(out.status).toBe(2);
    const r = JSON.parse(out.stdout) as { ok: boolean; errors: { path: string }[] };
    expect(r.ok).toBe(false);
    expect(r.errors[0].path).toBe("materials[0].vary.phi.sd");
  }, 60_000);
});
