import { tickStep } from "d3-array";
import fc from "fast-check";
import { describe, expect, it } from "vitest";
import {
  axisTicks,
  decimalsFor,
  formatTick,
  linearScale,
  niceDomain,
  niceLengthBelow,
  niceStepAtLeast,
  niceTicks,
} from "@/lib/scales";

const isNice = (v: number) => {
  const m = v / 10 ** Math.floor(Math.log10(v) + 1e-12);
  return [1, 2, 5].some((n) => Math.abs(m - n) < 1e-9);
};

// 1, 2 or 5 × 10^k steps are the "nice numbers" of chart axes: Heckbert, "Nice numbers for graph labels",
// Graphics Gems (1990); the exact steps below are worked by hand from that rule.
describe("ticks of the plots and legends (about `count` ticks)", () => {
  it("uses 1, 2 or 5 × 10^k steps", () => {
    expect(tickStep(0, 300, 5)).toBe(50);
    expect(tickStep(0, 1, 5)).toBe(0.2);
    expect(tickStep(0, 1.5, 5)).toBe(0.2);
    expect(niceTicks(0.8, 2.3, 5)).toEqual([0.8, 1, 1.2, 1.4, 1.6, 1.8, 2, 2.2]);
    expect(niceTicks(0, 100, 4)).toEqual([0, 20, 40, 60, 80, 100]);
    expect(niceTicks(0, 300, 6)).toEqual([0, 50, 100, 150, 200, 250, 300]);
    expect(niceTicks(1.5, 1.7, 4)).toEqual([1.5, 1.55, 1.6, 1.65, 1.7]);
  });

  it("reads a reversed range in ascending order and a single value as one tick", () => {
    expect(niceTicks(100, 0, 4)).toEqual([0, 20, 40, 60, 80, 100]);
    expect(niceTicks(2, 2)).toEqual([2]);
    expect(niceTicks(Number.NaN, 2)).toEqual([]);
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
          const step = tickStep(lo, lo + span, n);
          expect(isNice(step)).toBe(true);
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

describe("plot scales", () => {
  it("linearScale(domain, range) maps ends to ends, also for an upward pixel axis", () => {
    const sy = linearScale([0, 200], [240, 10]);
    expect(sy(0)).toBe(240);
    expect(sy(200)).toBe(10);
    expect(sy(100)).toBe(125);
    expect(linearScale([5, 5], [0, 100])(5)).toBe(50);
  });

  it("niceDomain(values) holds every value, reaches zero when asked, and widens a single value", () => {
    expect(niceDomain([50, 310], { includeZero: true })).toEqual([0, 350]);
    const d = niceDomain([1.56, 1.66], { count: 4 });
    expect(d[0]).toBeLessThanOrEqual(1.56);
    expect(d[1]).toBeGreaterThanOrEqual(1.66);
    const single = niceDomain([35]);
    expect(single[0]).toBeLessThan(35);
    expect(single[1]).toBeGreaterThan(35);
    expect(niceDomain([])).toEqual([0, 1]);
  });

  it("formatTick(value) without a step drops float noise", () => {
    expect(formatTick(0.1 + 0.2)).toBe("0.3");
    expect(formatTick(1500)).toBe("1500");
  });
});

describe("pixel-spaced ticks of the canvases", () => {
  it("niceStepAtLeast(raw) picks the next 1-2-5 step", () => {
    expect(niceStepAtLeast(0.3)).toBe(0.5);
    expect(niceStepAtLeast(1)).toBe(1);
    expect(niceStepAtLeast(1.2)).toBe(2);
    expect(niceStepAtLeast(3)).toBe(5);
    expect(niceStepAtLeast(6)).toBe(10);
    expect(niceStepAtLeast(0.1 + 0.2)).toBe(0.5);
    expect(() => niceStepAtLeast(0)).toThrow(/positive/);
  });

  it("niceStepAtLeast(raw) is a 1-2-5 value no smaller than raw and under 2.5 raw", () => {
    fc.assert(
      fc.property(fc.double({ min: 1e-4, max: 1e6, noNaN: true }), (raw) => {
        const s = niceStepAtLeast(raw);
        expect(isNice(s)).toBe(true);
        expect(s).toBeGreaterThanOrEqual(raw * (1 - 1e-9));
        expect(s).toBeLessThanOrEqual(raw * 2.5 * (1 + 1e-9));
      }),
    );
  });

  it("niceLengthBelow(max) is a 1-2-5 length not above max", () => {
    expect(niceLengthBelow(37)).toBe(20);
    expect(niceLengthBelow(5)).toBe(5);
    expect(niceLengthBelow(0.9)).toBe(0.5);
  });

  it("axisTicks(min, max) covers the range on multiples of the step", () => {
    const { step, values } = axisTicks(-3, 47, 10, 60);
    expect(step).toBe(10);
    expect(values).toEqual([0, 10, 20, 30, 40]);
    const fine = axisTicks(0, 1, 400, 60);
    expect(fine.step).toBe(0.2);
    expect(fine.values).toEqual([0, 0.2, 0.4, 0.6, 0.8, 1]);
  });

  it("formatTick(value, step) shows only the decimals the step needs", () => {
    expect(decimalsFor(0.25)).toBe(2);
    expect(formatTick(12.5, 0.5)).toBe("12.5");
    expect(formatTick(-0.00001, 1)).toBe("0");
    expect(formatTick(40, 10)).toBe("40");
  });
});
