import { describe, expect, test } from "vitest";
import fc from "fast-check";
import {
  computeFilterSeepage,
  criticalGradient,
  criticalGradientFromVoidRatio,
  flowNetDischarge,
  flowNetExitGradient,
  freeSurfaceGradientAt,
  kozenyY0,
  parabolaHeightAt,
  type SeepageInput,
} from "@/lib/stability/seepage";

// docs/references.md "Seepage and piping", derived example: dam 20 m high, crest 12 m wide, base 32 m,
// so both faces are 0.5H:1V (10 m of run each side); filter the last 6 m of the base; pool 19 m.
const referenceDam: SeepageInput = {
  baseElevation: 0,
  poolElevation: 19,
  upstreamFace: { toe: [0, 0], crest: [10, 20] },
  filterStartX: 26,
  downstreamFace: { crest: [22, 20], toe: [32, 0] },
  permeability: 3.5e-8,
  gammaSat: 20,
};

function okResult(input: SeepageInput) {
  const r = computeFilterSeepage(input);
  if (!r.ok) throw new Error(`expected ok, got ${JSON.stringify(r.limits)}`);
  return r;
}

function codes(input: SeepageInput): string[] {
  return computeFilterSeepage(input)
    .limits.filter((l) => l.severity === "error")
    .map((l) => l.code);
}

describe("computeFilterSeepage(referenceDam): docs/references.md derived example", () => {
  const r = okResult(referenceDam);

  test("m = 9.5 m, d = 19.35 m, y0 = 7.769 m (docs/references.md, derived)", () => {
    expect(r.construction.m).toBeCloseTo(9.5, 9);
    expect(r.construction.d).toBeCloseTo(19.35, 9);
    expect(r.construction.y0).toBeCloseTo(7.769, 3);
    // hand calculation: √(19² + 19.35²) − 19.35
    expect(r.construction.y0).toBeCloseTo(Math.sqrt(19 ** 2 + 19.35 ** 2) - 19.35, 9);
  });

  test("without the 0.3m shift d = 16.50 m gives y0 = 8.664 m (docs/references.md, derived)", () => {
    expect(kozenyY0(19, 16.5)).toBeCloseTo(8.664, 3);
  });

  test("q = k·y0 = 2.72e-7 m³/s per metre for k = 3.5e-8 m/s (docs/references.md, derived)", () => {
    expect(r.flow.perMetre).toBeCloseTo(2.72e-7, 9);
    expect(r.flow.total).toBeNull();
    const withLength = okResult({ ...referenceDam, crestLength: 150 });
    // hand calculation: q·L
    expect(withLength.flow.total).toBeCloseTo(150 * 3.5e-8 * r.construction.y0, 15);
  });

  test("the parabola passes through A = (xB − 0.3m, pool) exactly (Casagrande 1937; docs/engine.md §6)", () => {
    expect(r.construction.pointA).toEqual([6.65, 19]);
    expect(parabolaHeightAt(r.construction.parabola, 6.65)).toBeCloseTo(19, 10);
  });

  test("the basic parabola is y0 above the focus and has its vertex y0/2 downstream (Kozeny; docs/references.md)", () => {
    const { parabola, vertex, y0 } = r.construction;
    expect(parabolaHeightAt(parabola, 26)).toBeCloseTo(y0, 10);
    expect(vertex[0]).toBeCloseTo(26 + y0 / 2, 10);
    expect(vertex[1]).toBe(0);
  });

  test("the line starts at B, falls monotonically to the vertex, and joins the parabola at xB + 0.3m (docs/engine.md §6)", () => {
    const line = r.construction.phreatic;
    expect(line[0]).toEqual([9.5, 19]);
    expect(line[line.length - 1]).toEqual(r.construction.vertex);
    for (let i = 1; i < line.length; i++) {
      expect(line[i][0]).toBeGreaterThan(line[i - 1][0]);
      expect(line[i][1]).toBeLessThanOrEqual(line[i - 1][1]);
    }
    const [xJ, yJ] = r.construction.entryEnd;
    expect(xJ).toBeCloseTo(9.5 + 0.3 * 9.5, 10);
    expect(yJ).toBeCloseTo(parabolaHeightAt(r.construction.parabola, xJ), 10);
    // Every point past J lies on the parabola (to 1e-6 m: √ near the vertex magnifies rounding).
    line
      .filter(([x]) => x > xJ)
      .forEach(([x, y]) => expect(y).toBeCloseTo(parabolaHeightAt(r.construction.parabola, x), 6));
  });

  test("the entry leaves B normal to the 0.5H:1V face, i.e. with slope −0.5 (docs/engine.md §6; hand calculation)", () => {
    const [p0, p1, p2, p3] = r.construction.phreatic;
    // The entry is one cubic sampled at equal steps h, so the four-point difference
    // (−11·y0 + 18·y1 − 9·y2 + 2·y3)/(6h), exact for cubics, is its tangent at B.
    const h = p1[0] - p0[0];
    const tangent = (-11 * p0[1] + 18 * p1[1] - 9 * p2[1] + 2 * p3[1]) / (6 * h);
    expect(tangent).toBeCloseTo(-0.5, 9);
  });

  test("the section water line extends at pool level from the upstream toe and along the filter to the downstream toe", () => {
    const w = r.construction.waterLine;
    expect(w[0]).toEqual([0, 19]);
    expect(w[w.length - 1]).toEqual([32, 0]);
  });

  test("the exit gradient along the free surface is 1 where the line meets the filter vertically (hand calculation)", () => {
    expect(r.piping.exitGradientMethod).toBe("free-surface-at-filter");
    expect(r.piping.exitGradient).toBeCloseTo(1, 9);
    expect(r.piping.pipingFactor).toBeCloseTo((20 - 9.81) / 9.81, 9);
    expect(r.limits.map((l) => l.code)).toContain("W_SEEP_EXIT_INTO_FILTER");
  });

  test("above the focus the basic parabola slopes at 45°, so i = 1/√2 there (property of the parabola y² = y0² + 2y0·x')", () => {
    expect(freeSurfaceGradientAt(r.construction.parabola, 26)).toBeCloseTo(Math.SQRT1_2, 10);
  });
});

describe("computeFilterSeepage: docs/engine.md §10.8 and other checks", () => {
  // h = 10 m (pool 10 on base 0), 2H:1V face from (0,0): B = (20, 10), m = 20, A = 14; filter at 54 → d = 40.
  const engineCase: SeepageInput = {
    baseElevation: 0,
    poolElevation: 10,
    upstreamFace: { toe: [0, 0], slopeHV: 2, crestElevation: 12 },
    filterStartX: 54,
    downstreamFace: { crest: [36, 12], toe: [60, 0] },
    permeability: 1e-7,
    gammaSat: 20,
  };

  test("h = 10 m, d = 40 m gives y0 = 1.231 m (docs/engine.md §10.8)", () => {
    const r = okResult(engineCase);
    expect(r.construction.h).toBe(10);
    expect(r.construction.d).toBeCloseTo(40, 10);
    expect(r.construction.y0).toBeCloseTo(1.231, 3);
    expect(kozenyY0(10, 40)).toBeCloseTo(Math.sqrt(1700) - 40, 12); // hand calculation
  });

  test("a face given by toe and H:V slope equals the same face given by two points", () => {
    const a = okResult(engineCase);
    const b = okResult({ ...engineCase, upstreamFace: { toe: [0, 0], crest: [24, 12] } });
    expect(b.construction.y0).toBe(a.construction.y0);
    expect(b.construction.phreatic).toEqual(a.construction.phreatic);
  });

  test("i_cr = (Gs − 1)/(1 + e) = 1.031 for Gs 2.65, e 0.60, the same as (γsat − γw)/γw (docs/references.md; Craig, ch. 2)", () => {
    expect(criticalGradientFromVoidRatio(2.65, 0.6)).toBeCloseTo(1.031, 3);
    const gammaSat = ((2.65 + 0.6) * 9.81) / 1.6; // hand calculation: γsat = (Gs + e)γw/(1 + e)
    expect(criticalGradient(gammaSat, 9.81)).toBeCloseTo(1.03125, 10);
  });

  test("a flow net gives i = (H/Nd)/Δl and q = k·H·Nf/Nd (docs/engine.md §6; hand calculation)", () => {
    expect(flowNetExitGradient(10, 10, 2)).toBeCloseTo(0.5, 12);
    expect(flowNetDischarge(1e-6, 10, 4, 10)).toBeCloseTo(4e-6, 18);
    const r = okResult({ ...engineCase, gammaSat: 19.62, flowNet: { equipotentialDrops: 10, lastElementLength: 2 } });
    expect(r.piping.exitGradientMethod).toBe("flow-net");
    expect(r.piping.exitGradient).toBeCloseTo(0.5, 12); // H defaults to h = 10 m
    expect(r.piping.pipingFactor).toBeCloseTo(2, 10); // i_cr = (19.62 − 9.81)/9.81 = 1
    expect(r.piping.adequate).toBe(false); // default requirement 3 (common practice, docs/references.md)
    expect(() => flowNetExitGradient(10, 0, 2)).toThrow(/positive/);
  });

  test("anisotropy: k' = √(kx·kz) as in Craig's transformed-section example (from memory: kx 4.5e-8, kz 1.6e-8 → 2.7e-8 m/s)", () => {
    const r = okResult({ ...engineCase, permeability: 4.5e-8, anisotropyRatio: 1.6 / 4.5 });
    expect(r.flow.perMetre / r.construction.y0).toBeCloseTo(2.7e-8, 9);
    // hand calculation of d in the transformed section: x scaled by √(kz/kx)
    expect(r.construction.d).toBeCloseTo(40 * Math.sqrt(1.6 / 4.5), 9);
  });

  test("anisotropic result equals the isotropic one on the section with x scaled by √(kv/kh) (transformed section, Craig ch. 2)", () => {
    fc.assert(
      fc.property(fc.double({ min: 0.05, max: 1, noNaN: true }), (ratio) => {
        const s = Math.sqrt(ratio);
        const aniso = okResult({
          ...engineCase,
          anisotropyRatio: ratio,
          downstreamFace: { crest: [36, 12], toe: [200, 0] },
        });
        const scaled = okResult({
          ...engineCase,
          upstreamFace: { toe: [0, 0], crest: [24 * s, 12] },
          filterStartX: 54 * s,
          downstreamFace: { crest: [36 * s, 12], toe: [200 * s, 0] },
        });
        expect(aniso.construction.y0).toBeCloseTo(scaled.construction.y0, 9);
        aniso.construction.phreatic.forEach(([x, y], i) => {
          expect(x * s).toBeCloseTo(scaled.construction.phreatic[i][0], 7);
          expect(y).toBeCloseTo(scaled.construction.phreatic[i][1], 7);
        });
      }),
      { numRuns: 30 },
    );
  });
});

describe("computeFilterSeepage: limits of the method", () => {
  test("a filter too short for the line raises E_SEEP_EMERGES with the remedy (docs/engine.md §6)", () => {
    const r = computeFilterSeepage({ ...referenceDam, filterStartX: 31 });
    expect(r.ok).toBe(false);
    const emerges = r.limits.find((l) => l.code === "E_SEEP_EMERGES");
    expect(emerges?.message).toMatch(/lengthen the filter or draw the line/);
    expect(r.ok === false && r.construction).toBeTruthy(); // kept so the UI can show where
  });

  test("no filter, pool above the crest, pool at or below the base: refused, asking for a drawn line", () => {
    expect(codes({ ...referenceDam, filterStartX: null })).toEqual(["E_SEEP_NO_FILTER"]);
    expect(codes({ ...referenceDam, filterStartX: 32 })).toEqual(["E_SEEP_NO_FILTER"]);
    expect(codes({ ...referenceDam, poolElevation: 21 })).toEqual(["E_SEEP_POOL_ABOVE_CREST"]);
    expect(codes({ ...referenceDam, poolElevation: 0 })).toEqual(["E_SEEP_POOL_BELOW_BASE"]);
    expect(codes({ ...referenceDam, poolElevation: -3 })).toEqual(["E_SEEP_POOL_BELOW_BASE"]);
    const r = computeFilterSeepage({ ...referenceDam, filterStartX: undefined });
    expect(r.limits[0].message).toMatch(/by hand/);
  });

  test("a bermed (non-plane) upstream face is refused; a plane one given as three collinear points is accepted", () => {
    expect(
      codes({
        ...referenceDam,
        upstreamFace: {
          points: [
            [0, 0],
            [4, 8],
            [7, 8],
            [10, 20],
          ],
        },
      }),
    ).toEqual(["E_SEEP_FACE_NOT_PLANE"]);
    const r = okResult({
      ...referenceDam,
      upstreamFace: {
        points: [
          [0, 0],
          [5, 10],
          [10, 20],
        ],
      },
    });
    expect(r.construction.y0).toBeCloseTo(okResult(referenceDam).construction.y0, 12);
  });

  test("a filter starting inside the entry zone, a face falling to the right, and bad numbers are refused", () => {
    expect(codes({ ...referenceDam, filterStartX: 12 })).toEqual(["E_SEEP_FILTER_UPSTREAM"]);
    expect(codes({ ...referenceDam, upstreamFace: { toe: [10, 20], crest: [0, 0] } })).toContain(
      "E_SEEP_FACE_DIRECTION",
    );
    expect(codes({ ...referenceDam, permeability: 0 })).toEqual(["E_SEEP_INPUT"]);
    expect(codes({ ...referenceDam, gammaSat: 9 })).toEqual(["E_SEEP_INPUT"]);
    expect(codes({ ...referenceDam, poolElevation: Number.NaN })).toEqual(["E_SEEP_INPUT"]);
    expect(codes({ ...referenceDam, upstreamFace: { toe: [0, 2], crest: [10, 20] } })).toEqual(["E_SEEP_FACE_TOE"]);
  });

  test("property: any accepted case has a finite, monotone line through A, and no NaN or Infinity anywhere", () => {
    fc.assert(
      fc.property(
        fc.double({ min: 1.5, max: 4, noNaN: true }), // upstream H:V
        fc.double({ min: 0.3, max: 0.98, noNaN: true }), // pool as a fraction of the height
        fc.double({ min: 0.05, max: 0.6, noNaN: true }), // filter length as a fraction of the base
        fc.double({ min: 0.1, max: 4, noNaN: true }), // kv/kh
        (nU, poolFraction, filterFraction, ratio) => {
          const H = 15;
          const crestRight = nU * H + 8;
          const toeX = crestRight + 2.5 * H;
          const input: SeepageInput = {
            baseElevation: 100,
            poolElevation: 100 + poolFraction * H,
            upstreamFace: { toe: [0, 100], slopeHV: nU, crestElevation: 100 + H },
            filterStartX: toeX - filterFraction * toeX,
            downstreamFace: { crest: [crestRight, 100 + H], toe: [toeX, 100] },
            permeability: 1e-7,
            anisotropyRatio: ratio,
            gammaSat: 20,
          };
          const r = computeFilterSeepage(input);
          const text = JSON.stringify(r, (_k, v) => (typeof v === "number" && !Number.isFinite(v) ? "NOT-FINITE" : v));
          expect(text).not.toContain("NOT-FINITE");
          if (!r.ok) return;
          const { phreatic, parabola, pointA } = r.construction;
          expect(parabolaHeightAt(parabola, pointA[0])).toBeCloseTo(pointA[1], 8);
          for (let i = 1; i < phreatic.length; i++) {
            expect(phreatic[i][0]).toBeGreaterThan(phreatic[i - 1][0]);
            expect(phreatic[i][1]).toBeLessThanOrEqual(phreatic[i - 1][1] + 1e-12);
          }
        },
      ),
      { numRuns: 200 },
    );
  });
});
