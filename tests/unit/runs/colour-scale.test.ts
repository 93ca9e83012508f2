import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { CIVIDIS, VIRIDIS, rgbToHex, sampleScale, scaleHex } from "@/lib/runs/view/colour-scale";
import { cieLightness, labelInkFor } from "@/lib/runs/view/cie-lightness";

describe("cieLightness (CIE 15:2004 L* from IEC 61966-2-1 sRGB)", () => {
  it("gives the published CIELAB L* of reference sRGB colours", () => {
    // Reference L* (D65) of sRGB primaries and mid grey, as tabulated from the CIE formulas.
    expect(cieLightness([1, 1, 1])).toBeCloseTo(100, 6);
    expect(cieLightness([0, 0, 0])).toBeCloseTo(0, 6);
    expect(cieLightness([128 / 255, 128 / 255, 128 / 255])).toBeCloseTo(53.585, 2);
    expect(Math.abs(cieLightness([1, 0, 0]) - 53.2408)).toBeLessThan(0.05);
    expect(Math.abs(cieLightness([0, 1, 0]) - 87.7347)).toBeLessThan(0.05);
    expect(Math.abs(cieLightness([0, 0, 1]) - 32.3026)).toBeLessThan(0.05);
  });

  it("labelInkFor picks white on the dark end and ink on the light end", () => {
    expect(labelInkFor(sampleScale(CIVIDIS, 0))).toBe("#ffffff");
    expect(labelInkFor(sampleScale(CIVIDIS, 1))).toBe("#1f1d1a");
  });
});

describe("sampleScale", () => {
  it("hits the published end colours of cividis (Nuñez et al. 2018) and viridis (matplotlib)", () => {
    expect(sampleScale(CIVIDIS, 0)).toEqual([0, 0.135112, 0.304751]);
    expect(sampleScale(CIVIDIS, 1)).toEqual([0.995737, 0.909344, 0.217772]);
    expect(scaleHex(VIRIDIS, 0)).toBe("#440154");
    expect(scaleHex(VIRIDIS, 1)).toBe("#fde725");
    // matplotlib's cividis entry 128 sits at t = 128/255.
    const mid = sampleScale(CIVIDIS, 128 / 255);
    expect(mid[0]).toBeCloseTo(0.488697, 6);
  });

  it("clamps t outside [0, 1] and treats NaN as the low end", () => {
    expect(sampleScale(CIVIDIS, -3)).toEqual(sampleScale(CIVIDIS, 0));
    expect(sampleScale(CIVIDIS, 7)).toEqual(sampleScale(CIVIDIS, 1));
    expect(sampleScale(CIVIDIS, Number.NaN)).toEqual(sampleScale(CIVIDIS, 0));
  });

  for (const scale of [CIVIDIS, VIRIDIS]) {
    it(`${scale.name}: CIE L* rises strictly along the scale (a perceptually ordered sequential map)`, () => {
      fc.assert(
        fc.property(fc.double({ min: 0, max: 1, noNaN: true }), fc.double({ min: 0, max: 1, noNaN: true }), (a, b) => {
          fc.pre(Math.abs(a - b) > 1e-6);
          const [lo, hi] = a < b ? [a, b] : [b, a];
          return cieLightness(sampleScale(scale, lo)) < cieLightness(sampleScale(scale, hi));
        }),
        { numRuns: 2000 },
      );
    });

    it(`${scale.name}: equal steps in t give nearly equal steps in L* (uniformity)`, () => {
      const L = Array.from({ length: 21 }, (_, i) => cieLightness(sampleScale(scale, i / 20)));
      const steps = L.slice(1).map((v, i) => v - L[i]);
      // The published maps span about 14 → 91 in L*; no 5 % step may be more than 1.5× another.
      expect(L[0]).toBeLessThan(20);
      expect(L[20]).toBeGreaterThan(85);
      expect(Math.max(...steps) / Math.min(...steps)).toBeLessThan(1.5);
    });
  }
});

describe("rgbToHex", () => {
  it("formats channels as two hex digits, clamping out-of-range values", () => {
    expect(rgbToHex([1, 0.5, 0])).toBe("#ff8000");
    expect(rgbToHex([2, -1, 0.2])).toBe("#ff0033");
  });
});
