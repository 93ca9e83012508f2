import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { niceStep, niceTicks } from "@/lib/runs/nice-ticks";

describe("niceTicks (Heckbert 1990, 'Nice numbers for graph labels')", () => {
  it("uses 1, 2 or 5 × 10^k steps", () => {
    expect(niceStep(0.3)).toBe(0.2);
    expect(niceStep(7.5)).toBe(10);
    expect(niceStep(42)).toBe(50);
    expect(niceTicks(0.8, 2.3, 5)).toEqual([0.8, 1, 1.2, 1.4, 1.6, 1.8, 2, 2.2]);
    expect(niceTicks(0, 100, 4)).toEqual([0, 20, 40, 60, 80, 100]);
  });

  it("keeps every tick inside the range, equally spaced, without float noise", () => {
    fc.assert(
      fc.property(
        fc.double({ min: -1e4, max: 1e4, noNaN: true }),
        fc.double({ min: 1e-3, max: 1e4, noNaN: true }),
        fc.integer({ min: 2, max: 12 }),
        (lo, span, n) => {
          const t = niceTicks(lo, lo + span, n);
          expect(t.length).toBeGreaterThan(0);
          const step = niceStep(span / n);
          for (const v of t) {
            expect(v).toBeGreaterThanOrEqual(lo - step * 1e-6);
            expect(v).toBeLessThanOrEqual(lo + span + step * 1e-6);
            expect(String(v).length).toBeLessThan(20);
          }
          for (let i = 1; i < t.length; i++) expect(t[i] - t[i - 1]).toBeCloseTo(step, 6);
        },
      ),
      { numRuns: 300 },
    );
  });
});
