/**
 * fast-check generators of random but valid sections for comparing the engine with the
 * reference implementation: a slope facing either way (6 ground vertices, no vertical faces)
 * over 2–3 layers that follow it at random depths, a foundation, a phreatic line that may stand above the ground
 * (ponded water) or ru, a surcharge strip, kh, and Mohr–Coulomb or undrained materials.
 */
import fc from "fast-check";
import type { Material, SectionDocument } from "@/lib/stability";

const X_MAX = 100;

const material = (id: string) =>
  fc.oneof(
    {
      weight: 4,
      arbitrary: fc
        .record({
          c: fc.double({ min: 0, max: 25, noNaN: true }),
          phi: fc.double({ min: 12, max: 38, noNaN: true }),
          g: fc.double({ min: 16, max: 21, noNaN: true }),
          extra: fc.double({ min: 0.5, max: 2, noNaN: true }),
        })
        .map(({ c, phi, g, extra }): Material => ({
          id,
          model: "mohr-coulomb",
          gamma: g,
          gammaSat: g + extra,
          c,
          phi,
        })),
    },
    {
      weight: 1,
      arbitrary: fc
        .record({ su: fc.double({ min: 15, max: 80, noNaN: true }), g: fc.double({ min: 16, max: 20, noNaN: true }) })
        .map(({ su, g }): Material => ({ id, model: "undrained", gamma: g, su })),
    },
  );

/** A random section, with a hint of where circles should go (the ground's x range and top). */
export const randomSection = fc
  .record({
    slope: fc.record({
      h: fc.double({ min: 6, max: 18, noNaN: true }),
      crest: fc.double({ min: 25, max: 40, noNaN: true }),
      ratio: fc.double({ min: 1, max: 3, noNaN: true }),
      bumps: fc.tuple(fc.double({ min: -1, max: 1, noNaN: true }), fc.double({ min: -1, max: 1, noNaN: true })),
      mirror: fc.boolean(),
    }),
    depths: fc.array(fc.array(fc.double({ min: 1, max: 6, noNaN: true }), { minLength: 6, maxLength: 6 }), {
      minLength: 1,
      maxLength: 2,
    }),
    mats: fc.tuple(material("a"), material("b"), material("c")),
    water: fc.oneof(
      fc.constant(null),
      fc.array(fc.double({ min: -4, max: 22, noNaN: true }), { minLength: 3, maxLength: 4 }),
      fc.double({ min: 0, max: 0.4, noNaN: true }),
    ),
    surcharge: fc.option(
      fc.record({
        x: fc.double({ min: 5, max: 85, noNaN: true }),
        w: fc.double({ min: 2, max: 10, noNaN: true }),
        q: fc.double({ min: 0, max: 40, noNaN: true }),
      }),
    ),
    kh: fc.oneof(fc.constant(0), fc.double({ min: 0, max: 0.2, noNaN: true })),
  })
  .map(({ slope, depths, mats, water, surcharge, kh }) => {
    // A slope of height h at ratio H:V from the crest edge, with a bump on the crest and on the toe side.
    const toe = slope.crest + slope.h * slope.ratio;
    let pts: [number, number][] = [
      [0, slope.h],
      [slope.crest / 2, slope.h + slope.bumps[0]],
      [slope.crest, slope.h],
      [toe, 0],
      [(toe + X_MAX) / 2, slope.bumps[1]],
      [X_MAX, 0],
    ];
    if (slope.mirror) pts = pts.map(([x, y]) => [X_MAX - x, y] as [number, number]).reverse();
    const n = pts.length;
    const xs = pts.map((p) => p[0]);
    const heights = pts.map((p) => p[1]);
    const ground: [number, number][] = pts;
    const groundAt = (x: number) => {
      for (let i = 0; i + 1 < n; i++)
        if (x <= xs[i + 1]) return heights[i] + ((heights[i + 1] - heights[i]) * (x - xs[i])) / (xs[i + 1] - xs[i]);
      return heights[n - 1];
    };
    // Layer interfaces follow the ground at random depths, sampled at the ground's x.
    const lines: [number, number][][] = [ground];
    let prev = ground;
    for (const d of depths) {
      const next = prev.map(([x, y], i) => [x, y - d[i]] as [number, number]);
      lines.push(next);
      prev = next;
    }
    const base = Math.min(...prev.map((p) => p[1])) - 8;
    const regions = lines.map((top, j) => {
      const bottom: [number, number][] =
        j + 1 < lines.length
          ? [...lines[j + 1]].reverse()
          : [
              [X_MAX, base],
              [0, base],
            ];
      return { material: ["a", "b", "c"][j], points: [...top, ...bottom] };
    });
    const doc: SectionDocument = { version: 1, materials: [...mats], regions };
    if (Array.isArray(water)) {
      const k = water.length;
      doc.water = { phreatic: water.map((y, i) => [(X_MAX * i) / (k - 1), y] as [number, number]) };
    } else if (typeof water === "number") doc.water = { ru: water };
    if (surcharge || kh > 0) {
      doc.loads = { kh };
      if (surcharge) doc.loads.surcharges = [{ x1: surcharge.x, x2: surcharge.x + surcharge.w, q: surcharge.q }];
    }
    return { doc, groundAt, top: Math.max(...heights), base };
  });

/** A circle inside the section's width whose lowest point lies `depth` below the ground under its centre. */
export const circleIn = fc.record({
  xc: fc.double({ min: 25, max: 75, noNaN: true }),
  share: fc.double({ min: 0.2, max: 1, noNaN: true }),
  depth: fc.double({ min: 0.5, max: 6, noNaN: true }),
});

/** The circle (xc, yc, r) of a circleIn draw over a section. */
export function placeCircle(
  c: { xc: number; share: number; depth: number },
  groundAt: (x: number) => number,
): { xc: number; yc: number; r: number } {
  const rMax = Math.min(c.xc, X_MAX - c.xc) - 3;
  const r = 6 + (rMax - 6) * c.share;
  return { xc: c.xc, yc: groundAt(c.xc) - c.depth + r, r };
}
