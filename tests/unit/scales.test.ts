import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { axisTicks, decimalsFor, formatTick, niceLengthBelow, niceStep } from "@/lib/editor/axis-ticks";

const isNice = (v: number) => {
  const m = v / 10 ** Math.floor(Math.log10(v) + 1e-12);
  return [1, 2, 5].some((n) => Math.abs(m - n) < 1e-9);
};

describe("axis ticks", () => {
  it("niceStep(raw) picks the next 1-2-5 step", () => {
    expect(niceStep(0.3)).toBe(0.5);
    expect(niceStep(1)).toBe(1);
    expect(niceStep(1.2)).toBe(2);
    expect(niceStep(3)).toBe(5);
    expect(niceStep(6)).toBe(10);
    expect(niceStep(0.1 + 0.2)).toBe(0.5);
    expect(() => niceStep(0)).toThrow(/positive/);
  });

  it("niceStep(raw) is a 1-2-5 value no smaller than raw and under 2.5 raw", () => {
    fc.assert(
      fc.property(fc.double({ min: 1e-4, max: 1e6, noNaN: true }), (raw) => {
        const s = niceStep(raw);
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
