/**
 * The lowered pool of a drawdown as a random variable (docs/probabilistic.md "Inputs"), on the
 * staged drawdown embankment of the engine's own tests (tests/fixtures/sections). Facts of the
 * trade used: after a drawdown a lower pool leaves the upstream slope less stable, so FS at
 * to − σ is below FS at to + σ; the level cannot exceed the pool it falls from.
 */
import { describe, expect, test } from "vitest";
import { runGridSearch } from "@/lib/stability";
import { loadFixture } from "../stability/helpers";
import { run } from "./helpers";

describe("analysis.probabilistic.level varies analysis.drawdown.to", () => {
  for (const method of ["effective", "staged"] as const) {
    test(`${method} drawdown: the mean level reproduces the deterministic FS; a lower pool lowers FS`, () => {
      const doc = loadFixture("drawdown-staged-embankment.json") as unknown as Record<string, unknown> & {
        analysis: Record<string, unknown> & { drawdown: Record<string, unknown> };
      };
      doc.analysis.drawdown.method = method;
      doc.analysis.grid = { x1: 15, y1: 25, x2: 45, y2: 45, nx: 6, ny: 5 };
      doc.analysis.probabilistic = {
        samples: 60,
        seed: 2,
        sampling: "latin-hypercube",
        level: { dist: "normal", sd: 1.5, max: 20 },
      };
      const r = run(doc);
      const det = runGridSearch(doc);
      if (!det.ok) throw new Error("search failed");
      for (const m of ["bishop", "fellenius"] as const) {
        const p = r.probabilistic[m];
        expect(p?.valid).toBe(60);
        expect(p?.fosm.fs).toBe(det.results[m]?.fs);
        const c = p?.fosm.contributions[0];
        expect(c?.path).toBe("analysis.probabilistic.level");
        expect(c?.fsMinus as number).toBeLessThan(c?.fsPlus as number);
      }
    });
  }
});
