import { describe, expect, test } from "vitest";
import { generateEmbankment, phreaticForPool, embankmentGeometry, HAND_LINE_REQUEST } from "@/lib/design";
import { criticalGradientFromVoidRatio } from "@/lib/stability/seepage";
import { assertInDelta, MATERIALS, params } from "./helpers";

/*
 * Published worked example of the basic parabola, from memory: Craig's Soil Mechanics (R. F. Craig;
 * J. A. Knappett & R. F. Craig in later editions), chapter 2, the worked example of a homogeneous
 * anisotropic embankment dam on an impervious base with a horizontal filter: kx = 4.5 × 10⁻⁸ m/s,
 * kz = 1.6 × 10⁻⁸ m/s, so the section is scaled by √(kz/kx) ≈ 0.60 and k' = √(kx·kz) ≈ 2.7 × 10⁻⁸ m/s;
 * 18.00 m of water; the point 0.3·m upstream of where the pool meets the face lies 40 m from the
 * filter's end (24.00 m in the transformed section). The book finds x0 = 3.00 m (y0 = 2·x0 = 6.00 m)
 * and q = 2·k'·x0 ≈ 1.62 × 10⁻⁷ m³/s per metre. The book rounds the scale factor to 0.60 and k' to
 * 2.7 × 10⁻⁸; the exact values (0.596, 2.683 × 10⁻⁸) give y0 = 6.03 m and q = 1.618 × 10⁻⁷, inside 1 %.
 *
 * The embankment below reproduces that geometry: base (foundation top) at 10 m, pool at 28 m
 * (h = 18 m), upstream face 2:1 so m = 36 m and the entry point lies 0.3·36 = 10.8 m upstream of the
 * pool's edge; the drain's length is chosen so its upstream end is 40 m from that point.
 */
describe("generated seepage against Craig's worked example (from memory)", () => {
  // Toe at margin x0; pool edge x0 + 36; point A x0 + 25.2; crest x0 + 40 … x0 + 46; toe x0 + 86.
  const dam = params({
    foundationTop: 10,
    crestElevation: 30,
    crestWidth: 6,
    upstreamSlope: 2,
    downstreamSlope: 2,
    normalPool: 28,
    floodPool: 28,
    drawdownTo: 12,
    drainLength: 86 - 65.2,
    drainThickness: 0.5,
    fillPermeability: 4.5e-8,
    anisotropy: 1.6 / 4.5,
    crestLength: 100,
  });
  const out = generateEmbankment(dam, MATERIALS);
  const s = out.seepage.seepage;

  test("the construction applies and uses the book's head and distance", () => {
    expect(out.seepage.source).toBe("constructed");
    if (!s?.ok) throw new Error("expected a constructed line");
    assertInDelta(s.construction.h, 18, 1e-9);
    // The engine measures d in the transformed section: 40 m × √(1.6/4.5).
    assertInDelta(s.construction.d, 40 * Math.sqrt(1.6 / 4.5), 1e-9);
  });

  test("y0 = 2·x0 ≈ 6.00 m and q ≈ 1.62 × 10⁻⁷ m³/s per metre, within 1 %", () => {
    if (!s?.ok) throw new Error("expected a constructed line");
    expect(Math.abs(s.construction.y0 - 6.0) / 6.0).toBeLessThan(0.01);
    expect(Math.abs(s.flow.perMetre - 1.62e-7) / 1.62e-7).toBeLessThan(0.01);
    // Per the dam's length: q × 100 m.
    assertInDelta(s.flow.total!, s.flow.perMetre * 100, 1e-15);
  });

  test("the line in the document starts at the pool and ends on the base at the section's edge", () => {
    const line = out.document.water!.phreatic!;
    expect(line[0]).toEqual([0, 28]);
    expect(line[line.length - 1]).toEqual([out.geometry.xmax, 10]);
  });
});

describe("piping at the exit (critical gradient from Craig's definition)", () => {
  test("i_cr = (Gs − 1)/(1 + e) = 1.031 for Gs 2.65, e 0.60, and FS = i_cr/i_exit with i_exit = 1 at the drain", () => {
    // γsat = (Gs + e)·γw/(1 + e) gives the same i_cr through (γsat − γw)/γw.
    const gammaSat = ((2.65 + 0.6) * 9.81) / 1.6;
    const fill = { ...MATERIALS[0], gammaSat };
    const out = generateEmbankment(params(), [fill, ...MATERIALS.slice(1)]);
    const s = out.seepage.seepage;
    if (!s?.ok) throw new Error("expected a constructed line");
    assertInDelta(criticalGradientFromVoidRatio(2.65, 0.6), 1.031, 5e-4);
    assertInDelta(s.piping.criticalGradient, 1.031, 5e-4);
    assertInDelta(s.piping.exitGradient, 1, 1e-9);
    assertInDelta(s.piping.pipingFactor, s.piping.criticalGradient, 1e-12);
    expect(s.piping.adequate).toBe(false); // 1.03 < 3: the drain must meet filter criteria
  });
});

describe("outside the method's limits the app asks for a hand-drawn line", () => {
  test("a zoned dam gets no constructed line and a request to draw one", () => {
    const out = generateEmbankment(
      params({ zoning: { kind: "zoned", core: "fill", shell: "drain", coreTopWidth: 4, coreSlope: 0.5 } }),
      MATERIALS,
    );
    expect(out.seepage.source).toBe("none");
    expect(out.document.water).toBeUndefined();
    expect(out.seepage.limits[0].message).toContain(HAND_LINE_REQUEST);
  });

  test("a drain too short for the line makes it emerge on the face: E_SEEP_EMERGES, no guess", () => {
    const p = params({ downstreamSlope: 1.5, drainLength: 1.5 });
    const out = phreaticForPool(p, embankmentGeometry(p), "normal", 20);
    expect(out.source).toBe("none");
    expect(out.limits.map((l) => l.code)).toContain("E_SEEP_EMERGES");
    expect(out.limits.find((l) => l.code === "E_SEEP_EMERGES")!.message).toMatch(/draw the line/);
  });

  test("a hand-drawn line replaces the construction and spans the section", () => {
    const p = params({
      handLines: {
        normal: [
          [24, 16],
          [70, 12],
          [90, 6.2],
        ],
        flood: null,
      },
    });
    const out = generateEmbankment(p, MATERIALS);
    expect(out.seepage.source).toBe("hand-drawn");
    expect(out.document.water!.phreatic).toEqual([
      [0, 16],
      [24, 16],
      [70, 12],
      [90, 6.2],
      [120, 6.2],
    ]);
  });
});
