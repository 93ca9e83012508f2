import { describe, expect, test } from "vitest";
import fc from "fast-check";
import { evaluatePolynomial, fitLine, fitPolynomial } from "@/lib/lab";

/** Hand calculation: slope and intercept from the textbook sums (Montgomery & Runger, ch. 11). */
function sumsFit(xs: number[], ys: number[]) {
  const n = xs.length;
  const mx = xs.reduce((s, v) => s + v, 0) / n;
  const my = ys.reduce((s, v) => s + v, 0) / n;
  const sxx = xs.reduce((s, x) => s + (x - mx) ** 2, 0);
  const sxy = xs.reduce((s, x, i) => s + (x - mx) * (ys[i] - my), 0);
  const syy = ys.reduce((s, y) => s + (y - my) ** 2, 0);
  const b = sxy / sxx;
  const sse = syy - b * sxy;
  return { a: my - b * mx, b, r2: 1 - sse / syy, s: Math.sqrt(sse / (n - 2)), seB: Math.sqrt(sse / (n - 2) / sxx) };
}

describe("fitLine", () => {
  test("Anscombe's quartet, set I: y = 3.00 + 0.500x, R² = 0.67 (Anscombe 1973, The American Statistician; from memory)", () => {
    const xs = [10, 8, 13, 9, 11, 14, 6, 4, 12, 7, 5];
    const ys = [8.04, 6.95, 7.58, 8.81, 8.33, 9.96, 7.24, 4.26, 10.84, 4.82, 5.68];
    const fit = fitLine(xs, ys);
    expect(fit.intercept).toBeCloseTo(3.0, 2);
    expect(fit.slope).toBeCloseTo(0.5, 3);
    expect(fit.rSquared).toBeCloseTo(0.67, 2);
    expect(fit.n).toBe(11);
  });

  test("matches the sums formulas for slope, intercept, R² and standard errors (hand calculation)", () => {
    const xs = [50, 100, 200, 300];
    const ys = [36, 80, 154, 235];
    const fit = fitLine(xs, ys);
    const hand = sumsFit(xs, ys);
    expect(fit.slope).toBeCloseTo(hand.b, 12);
    expect(fit.intercept).toBeCloseTo(hand.a, 10);
    expect(fit.rSquared).toBeCloseTo(hand.r2, 12);
    expect(fit.standardError).toBeCloseTo(hand.s, 10);
    expect(fit.slopeStandardError).toBeCloseTo(hand.seB, 12);
  });

  test("through the origin: b = Σxy/Σx² (hand calculation); R² is about the mean of y", () => {
    const xs = [1, 2, 3];
    const ys = [2.1, 3.9, 6.2];
    const fit = fitLine(xs, ys, { throughOrigin: true });
    expect(fit.intercept).toBe(0);
    expect(fit.slope).toBeCloseTo((2.1 + 7.8 + 18.6) / 14, 12);
    const sse = ys.reduce((s, y, i) => s + (y - fit.slope * xs[i]) ** 2, 0);
    const my = (2.1 + 3.9 + 6.2) / 3;
    expect(fit.rSquared).toBeCloseTo(1 - sse / ys.reduce((s, y) => s + (y - my) ** 2, 0), 12);
    expect(fit.interceptStandardError).toBeNull();
  });

  test("two points: exact line, no standard error (n − 2 = 0); bad input throws with the point", () => {
    const fit = fitLine([1, 3], [2, 6]);
    expect([fit.intercept, fit.slope, fit.rSquared, fit.standardError]).toEqual([
      expect.closeTo(0, 12),
      expect.closeTo(2, 12),
      1,
      null,
    ]);
    expect(() => fitLine([1, 1], [2, 3])).toThrow(/do not determine/);
    expect(() => fitLine([1, Number.NaN], [2, 3])).toThrow(/point 2/);
    expect(() => fitLine([1], [2])).toThrow(/at least 2/);
  });

  test("property: points on an exact line a + b·x give back a and b with R² = 1", () => {
    fc.assert(
      fc.property(
        fc.double({ min: -1000, max: 1000, noNaN: true }),
        // R² = 1 − SSres/SStot means nothing on a flat line (SStot → 0, all round-off), so the slope
        // stays away from zero.
        fc.oneof(fc.double({ min: 0.01, max: 50, noNaN: true }), fc.double({ min: -50, max: -0.01, noNaN: true })),
        fc.uniqueArray(fc.integer({ min: -500, max: 500 }), { minLength: 3, maxLength: 12 }),
        (a, b, xs) => {
          const fit = fitLine(
            xs,
            xs.map((x) => a + b * x),
          );
          expect(fit.intercept).toBeCloseTo(a, 6);
          expect(fit.slope).toBeCloseTo(b, 8);
          expect(fit.rSquared).toBeCloseTo(1, 9);
        },
      ),
    );
  });
});

describe("fitPolynomial", () => {
  test("recovers an exact quadratic and cubic (hand calculation)", () => {
    const xs = [8, 10, 12, 14, 16, 18];
    const quad = fitPolynomial(
      xs,
      xs.map((w) => 1.9 - 0.002 * (w - 14) ** 2),
      2,
    );
    expect(quad.coefficients[0]).toBeCloseTo(1.9 - 0.002 * 196, 10);
    expect(quad.coefficients[1]).toBeCloseTo(0.056, 10);
    expect(quad.coefficients[2]).toBeCloseTo(-0.002, 12);
    const cubic = fitPolynomial(
      xs,
      xs.map((x) => 1 - x + 0.5 * x * x + 0.01 * x ** 3),
      3,
    );
    expect(evaluatePolynomial(cubic.coefficients, 11)).toBeCloseTo(1 - 11 + 60.5 + 13.31, 8);
    expect(() => fitPolynomial(xs, xs, 4)).toThrow(/degree/);
  });
});
