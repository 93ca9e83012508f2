import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { fsAxis } from "@/lib/design/fs-axis";

describe("fsAxis: the sweep chart's FS ticks sit at their labelled values", () => {
  it("labels a 0.05 step with two decimals, so 1.05 reads 1.05 (it read 1.1 before)", () => {
    const axis = fsAxis([1.02, 1.1, 1.2, 1.3]);
    expect(axis.ticks).toContain(1.05);
    expect(axis.decimals).toBe(2);
    expect(axis.ticks.map((t) => t.toFixed(axis.decimals))).toContain("1.05");
  });

  it("every label parses back to its tick, the range covers every value and ends on ticks", () => {
    fc.assert(
      fc.property(fc.array(fc.double({ min: 0.3, max: 4, noNaN: true }), { minLength: 1, maxLength: 12 }), (values) => {
        const axis = fsAxis(values);
        for (const t of axis.ticks) expect(Number(t.toFixed(axis.decimals))).toBe(t);
        expect(axis.domain[0]).toBeLessThanOrEqual(Math.min(...values));
        expect(axis.domain[1]).toBeGreaterThanOrEqual(Math.max(...values));
        expect(axis.ticks[0]).toBe(axis.domain[0]);
        expect(axis.ticks.at(-1)).toBe(axis.domain[1]);
      }),
      { numRuns: 300 },
    );
  });
});
