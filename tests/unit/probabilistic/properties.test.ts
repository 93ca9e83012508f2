/**
 * Properties (fast-check; issue 17 item 4): on a fixed circle every sample's FS rises with its
 * strengths, so with the same seed pf cannot rise when every strength mean does (FS increases
 * with c′ and tan φ′ in both methods: a fact of the trade); the same seed gives the same numbers;
 * "full-search" over a one-circle grid reproduces "critical-surface" on that circle to the bit.
 */
import fc from "fast-check";
import { describe, expect, test } from "vitest";
import { loadDoc, run, withSettings, type Doc } from "./helpers";

/** The linear slope with c′ and φ′ varied, searched over one circle only. */
function oneCircleDoc(scale: number, settings: Record<string, unknown>): Doc {
  const d = withSettings(loadDoc("linear-dry-slope.json"), settings);
  const m = d.materials[0];
  m.c = 28 * scale;
  m.phi = 5 * scale;
  m.vary = { c: { dist: "normal", sd: 3.6 }, phi: { dist: "normal", sd: 1.5 }, correlation: -0.3 };
  d.analysis.methods = ["bishop", "fellenius"];
  d.analysis.grid = { x1: 28, y1: 26, x2: 28, y2: 26, nx: 1, ny: 1 };
  d.analysis.radii = { tangentY1: 4, tangentY2: 4, n: 1 };
  return d;
}

const sampling = fc.constantFrom("monte-carlo", "latin-hypercube");

describe("probabilistic runs", () => {
  test("pf does not rise and mean FS does not fall as every strength mean rises (same seed)", () => {
    fc.assert(
      fc.property(
        fc.double({ min: 0.8, max: 1.6, noNaN: true }),
        fc.double({ min: 0, max: 0.5, noNaN: true }),
        fc.integer({ min: 0, max: 10_000 }),
        sampling,
        (k, dk, seed, s) => {
          const settings = { samples: 200, seed, sampling: s };
          const lo = run(oneCircleDoc(k, settings)).probabilistic;
          const hi = run(oneCircleDoc(k + dk, settings)).probabilistic;
          for (const m of ["bishop", "fellenius"] as const) {
            expect(hi[m]?.pf as number).toBeLessThanOrEqual(lo[m]?.pf as number);
            expect(hi[m]?.meanFs as number).toBeGreaterThanOrEqual((lo[m]?.meanFs as number) - 1e-12);
          }
        },
      ),
      { numRuns: 25 },
    );
  });

  test("the same seed gives the same numbers, whole result", () => {
    fc.assert(
      fc.property(fc.integer({ min: 0, max: 0xffffffff }), sampling, (seed, s) => {
        const d = oneCircleDoc(1, { samples: 300, seed, sampling: s });
        expect(run(d)).toEqual(run(JSON.parse(JSON.stringify(d))));
      }),
      { numRuns: 10 },
    );
  });

  test("full-search on a one-circle grid equals critical-surface on that circle, γ varied too", () => {
    const withGamma = (settings: Record<string, unknown>) => {
      const d = oneCircleDoc(1, settings);
      (d.materials[0].vary as Record<string, unknown>).gamma = { dist: "normal", sd: 1 };
      return d;
    };
    const crit = run(withGamma({ samples: 40, seed: 3 }));
    const full = run(withGamma({ samples: 40, seed: 3, mode: "full-search" }));
    for (const m of ["bishop", "fellenius"] as const) {
      const { fosm: f1, ...a } = crit.probabilistic[m] ?? { fosm: null };
      const { fosm: f2, ...b } = full.probabilistic[m] ?? { fosm: null };
      expect(b).toEqual(a);
      expect(f2).toEqual(f1);
    }
  });
});
