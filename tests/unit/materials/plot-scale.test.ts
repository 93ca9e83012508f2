import { describe, expect, test } from "vitest";
import { formatTick, linearScale, niceDomain, niceStep, niceTicks } from "@/lib/materials/plot-scale";

describe("plot scales", () => {
  test("linearScale(domain, range) maps ends to ends, also for an upward pixel axis", () => {
    const sy = linearScale([0, 200], [240, 10]);
    expect(sy(0)).toBe(240);
    expect(sy(200)).toBe(10);
    expect(sy(100)).toBe(125);
    expect(linearScale([5, 5], [0, 100])(5)).toBe(50);
  });

  test("niceStep(span, count) picks 1, 2 or 5 × 10^k", () => {
    expect(niceStep(300, 5)).toBe(50);
    expect(niceStep(1, 5)).toBe(0.2);
    expect(niceStep(0.12, 4)).toBeCloseTo(0.02, 12);
    expect(niceStep(0.2, 4)).toBeCloseTo(0.05, 12);
    expect(niceStep(0, 5)).toBe(1);
  });

  test("niceTicks(min, max) lands on multiples of the step without float noise", () => {
    expect(niceTicks(0, 300, 6)).toEqual([0, 50, 100, 150, 200, 250, 300]);
    expect(niceTicks(1.5, 1.7, 4)).toEqual([1.5, 1.55, 1.6, 1.65, 1.7]);
    expect(niceTicks(3, 1)).toEqual([]);
    expect(niceTicks(2, 2)).toEqual([2]);
  });

  test("niceDomain(values) holds every value, reaches zero when asked, and widens a single value", () => {
    expect(niceDomain([50, 310], { includeZero: true })).toEqual([0, 350]);
    const d = niceDomain([1.56, 1.66], { count: 4 });
    expect(d[0]).toBeLessThanOrEqual(1.56);
    expect(d[1]).toBeGreaterThanOrEqual(1.66);
    const single = niceDomain([35]);
    expect(single[0]).toBeLessThan(35);
    expect(single[1]).toBeGreaterThan(35);
    expect(niceDomain([])).toEqual([0, 1]);
  });

  test("formatTick(value) drops float noise", () => {
    expect(formatTick(0.1 + 0.2)).toBe("0.3");
    expect(formatTick(1500)).toBe("1500");
  });
});
