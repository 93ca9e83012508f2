import { describe, expect, test } from "vitest";
import fc from "fast-check";
import { DEFAULT_SWEEP, jobId, runSweepJob, SWEEP_CASES, type SweepJob } from "@/lib/design";
import type { Material } from "@/lib/stability";
import { MATERIALS, params } from "./helpers";

// A flatter face carries less driving weight on the same strength, so its critical FS must not
// drop; the sweep's modest grid may miss the true minimum by about one grid step, which each
// point reports as its resolution (the rise from the lowest centre to its neighbours).
describe("property: a flatter face never lowers the critical FS of the same case beyond the grid's resolution", () => {
  test("random fill strength, face, case and pair of ratios", () => {
    const ratio = fc.integer({ min: 0, max: 8 }).map((i) => 2 + i * 0.25);
    fc.assert(
      fc.property(
        fc
          .record({
            c: fc.double({ min: 2, max: 20, noNaN: true }),
            phi: fc.double({ min: 20, max: 34, noNaN: true }),
            caseIndex: fc.integer({ min: 0, max: SWEEP_CASES.length - 1 }),
            a: ratio,
            b: ratio,
          })
          .filter((r) => r.a !== r.b),
        ({ c, phi, caseIndex, a, b }) => {
          const steep = Math.min(a, b);
          const flat = Math.max(a, b);
          const materials: Material[] = MATERIALS.map((m) =>
            m.id === "fill" && m.model === "mohr-coulomb" ? { ...m, c, phi } : m,
          );
          const sc = SWEEP_CASES[caseIndex];
          const job = (n: number): SweepJob => {
            const u = sc.face === "upstream" ? n : 3;
            const d = sc.face === "downstream" ? n : 2.5;
            return {
              id: jobId(sc.key, u, d, "sweep"),
              face: sc.face,
              caseKey: sc.key,
              upstreamRatio: u,
              downstreamRatio: d,
              phase: "sweep",
            };
          };
          const p1 = runSweepJob(params(), materials, job(steep), DEFAULT_SWEEP);
          const p2 = runSweepJob(params(), materials, job(flat), DEFAULT_SWEEP);
          expect(p1.error).toBeNull();
          expect(p2.error).toBeNull();
          const tolerance = Math.max(p1.resolution ?? 0, p2.resolution ?? 0);
          expect(p2.fsBishop!).toBeGreaterThanOrEqual(p1.fsBishop! - tolerance);
        },
      ),
      { numRuns: 40, seed: 20240611 },
    );
  }, 120_000);
});
