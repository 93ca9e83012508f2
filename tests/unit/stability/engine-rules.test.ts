/**
 * The engine's rules for separate slip pieces, exact arc ends, drawdown water and the
 * smaller corner cases (docs/engine.md §3, §4, §7; docs/engine-io.md "Rules"), each on a short
 * worked section. The values were computed by this engine and confirmed two ways: the slow
 * reference implementation in ./reference (thin uniform slices, no strip table) agrees within
 * its slice resolution, and for the arc-end example the converged value is the limit of ever
 * more slices. They are derived values (docs/references.md "Derived"), not published ones.
 */
import { describe, expect, test } from "vitest";
import { analyzeCircle, runGridSearch, type SectionDocument } from "@/lib/stability";
import { circle, clone, expectRelative, loadFixture, search } from "./helpers";

const trench = loadFixture("trench-two-pieces.json");
const cut = loadFixture("cut-steep-arc-end.json");
const drawdown = loadFixture("drawdown-line-above-face.json");

describe("every slip piece slides its own way (docs/engine.md §3)", () => {
  test("the trench circle (50, 20, 18): the left-sliding piece governs, Bishop 0.628", () => {
    const r = circle(trench, 50, 20, 18);
    expect(r.masses).toBe(2);
    expect(r.direction).toBe("left");
    expectRelative(r.fs.bishop, 0.628, 1e-3);
    // Each piece alone, forced its own way, gives the same lowest factor.
    const left = circle({ ...trench, analysis: { ...trench.analysis, direction: "left" } }, 50, 20, 18);
    expectRelative(left.fs.bishop, r.fs.bishop!, 1e-12);
  });

  test("a grid search over the trench finds about 0.432", () => {
    const r = search(trench);
    expectRelative(r.results.bishop!.fs, 0.432, 2e-3);
  });

  test("a level-ended piece under kh is tried both ways and the lower FS is kept", () => {
    // A mound on level ground: the circle's two ends are on the level ground, so neither is lower.
    const mound: SectionDocument = {
      version: 1,
      materials: [
        { id: "fill", model: "mohr-coulomb", gamma: 19, c: 10, phi: 28 },
        { id: "clay", model: "mohr-coulomb", gamma: 18, c: 5, phi: 18 },
      ],
      regions: [
        {
          material: "fill",
          points: [
            [30, 10],
            [36, 16],
            [50, 10],
          ],
        },
        {
          material: "clay",
          points: [
            [0, -10],
            [100, -10],
            [100, 10],
            [50, 10],
            [30, 10],
            [0, 10],
          ],
        },
      ],
      loads: { kh: 0.15 },
      analysis: { slices: 50, direction: "auto" },
    };
    for (const xc of [39.5, 40, 40.5]) {
      const auto = circle(mound, xc, 22, 16);
      const left = circle({ ...mound, analysis: { direction: "left" } }, xc, 22, 16);
      const right = circle({ ...mound, analysis: { direction: "right" } }, xc, 22, 16);
      expect(left.fs.bishop).not.toBeNull();
      expect(right.fs.bishop).not.toBeNull();
      expect(auto.fs.bishop).toBe(Math.min(left.fs.bishop!, right.fs.bishop!));
      expect(auto.fs.fellenius).toBe(Math.min(left.fs.fellenius!, right.fs.fellenius!));
    }
    // At xc = 40 the two ways differ by more than half: the wrong one would be unconservative.
    const l40 = circle({ ...mound, analysis: { direction: "left" } }, 40, 22, 16).fs.bishop!;
    const r40 = circle({ ...mound, analysis: { direction: "right" } }, 40, 22, 16).fs.bishop!;
    expect(l40 / r40).toBeGreaterThan(2);
  });
});

describe("exact arc ends (docs/engine.md §3)", () => {
  test("circle (22, 10.02, 8): 50 slices within 0.5 % of the converged 1.9692", () => {
    const r = circle(cut, 22, 10.02, 8);
    expectRelative(r.fs.bishop, 1.9692, 0.005);
    const fine = circle({ ...cut, analysis: { slices: 500 } }, 22, 10.02, 8);
    expectRelative(fine.fs.bishop, 1.9692, 1e-4);
    // The end slice's base is the arc itself: R·Δθ, longer than its chord.
    const first = r.slices[0];
    const chord = Math.hypot(first.xRight - first.xLeft, 0);
    expect(first.baseLength).toBeGreaterThan(chord);
  });
});

describe("rapid drawdown water (docs/engine.md §7)", () => {
  test("no free water is left above the lowered pool on the face: circle (30, 22, 20) gives Bishop 1.232", () => {
    const r = circle(drawdown, 30, 22, 20);
    // 50 slices land 0.07 % under the converged 1.2322 (100 and 500 slices agree to 1e-5).
    expectRelative(r.fs.bishop, 1.232, 1e-3);
    const fine = circle({ ...drawdown, analysis: { ...drawdown.analysis, slices: 200 } }, 30, 22, 20);
    expectRelative(fine.fs.bishop, 1.2322, 1e-4);
    for (const s of r.slices) expect(s.pondedLoad).toBe(0);
  });

  test("beyond the crest the drawn line and its tailwater stand", () => {
    // A tailwater pond on the far side of the crest: its load is the same before and after drawdown.
    const d = clone(drawdown);
    d.regions[0].points = [
      [0, -10],
      [80, -10],
      [80, 2],
      [60, 2],
      [50, 12],
      [44, 12],
      [20, 0],
      [0, 0],
    ];
    d.water!.phreatic = [
      [0, 3],
      [26, 3],
      [44, 7],
      [60, 4],
      [80, 4],
    ];
    const steady = clone(d);
    steady.analysis = { case: "steady" };
    const a = circle(d, 60, 20, 19);
    const b = circle(steady, 60, 20, 19);
    const ponded = (rows: typeof a.slices) => rows.reduce((s, r) => s + r.pondedLoad, 0);
    expect(ponded(a.slices)).toBeGreaterThan(0);
    expectRelative(ponded(a.slices), ponded(b.slices), 1e-12);
  });
});

describe("smaller corner cases (docs/engine.md §3, §4, §10)", () => {
  test("zero strength everywhere gives FS 0 for both methods", () => {
    const d = clone(cut);
    d.materials = [{ id: "s", model: "mohr-coulomb", gamma: 19, c: 0, phi: 0 }];
    const r = circle(d, 22, 14, 12);
    expect(r.fs.bishop).toBe(0);
    expect(r.fs.fellenius).toBe(0);
    for (const s of r.slices) expect(s.mAlpha).not.toBeNull();
  });

  test("a face 1e-6 m off vertical is accepted and gives the vertical face's FS", () => {
    const face = (dx: number): SectionDocument => ({
      version: 1,
      materials: [{ id: "s", model: "mohr-coulomb", gamma: 19, c: 10, phi: 30 }],
      regions: [
        {
          material: "s",
          points: [
            [0, -10],
            [80, -10],
            [80, 10],
            [30 + dx, 10],
            [30, 0],
            [0, 0],
          ],
        },
      ],
    });
    const a = circle(face(1e-6), 30, 14, 15);
    const b = circle(face(0), 30, 14, 15);
    expectRelative(a.fs.bishop, b.fs.bishop!, 1e-3);
  });

  test("a layer thinner than 1 mm is refused with a message that says so", () => {
    const d = clone(cut);
    d.materials.push({ id: "film", model: "mohr-coulomb", gamma: 19, c: 1, phi: 10 });
    d.regions = [
      {
        material: "s",
        points: [
          [0, -10],
          [80, -10],
          [80, -2],
          [0, -2],
        ],
      },
      {
        material: "film",
        points: [
          [0, -2],
          [80, -2],
          [80, -1.9995],
          [0, -1.9995],
        ],
      },
      {
        material: "s",
        points: [
          [0, -1.9995],
          [80, -1.9995],
          [80, 10],
          [0, 10],
        ],
      },
    ];
    const r = analyzeCircle(d, { xc: 30, yc: 14, r: 15 });
    expect(r.ok).toBe(false);
    if (r.ok) return;
    const e = r.errors.find((x) => x.code === "region-too-thin");
    expect(e?.path).toBe("regions[1].points");
    expect(e?.message).toMatch(/thinner than 1 mm/);
  });

  test("an impenetrable block inside the slip mass is carried with its γ, or refused naming it", () => {
    const d = clone(cut);
    d.materials = [
      { id: "s", model: "mohr-coulomb", gamma: 19, c: 10, phi: 25 },
      { id: "boulder", model: "impenetrable" },
    ];
    d.regions.push({
      material: "boulder",
      points: [
        [34, 10],
        [38, 10],
        [38, 12],
        [34, 12],
      ],
    });
    const refused = circle(d, 25, 26, 22);
    expect(refused.fs.bishop).toBeNull();
    expect(refused.reason).toBe("impenetrable-without-weight");
    expect(refused.reasonText).toMatch(/'boulder'/);
    const heavy = clone(d);
    heavy.materials[1] = { id: "boulder", model: "impenetrable", gamma: 24 };
    const carried = circle(heavy, 25, 26, 22);
    // The block's weight is the extra weight over the same circle without it: 4 m × 2 m × 24.
    const without = circle(cut, 25, 26, 22);
    const total = (rows: typeof carried.slices) => rows.reduce((s, r) => s + r.weight, 0);
    expect(total(carried.slices) - total(without.slices)).toBeCloseTo(4 * 2 * 24, 6);
    const search = runGridSearch({
      ...d,
      analysis: {
        grid: { x1: 20, y1: 20, x2: 30, y2: 30, nx: 3, ny: 3 },
        radii: { tangentY1: -2, tangentY2: 2, n: 3 },
      },
    });
    if (!search.ok) throw new Error("search failed");
    expect(search.warnings.find((w) => w.code === "impenetrable-without-weight")?.message).toMatch(/'boulder'/);
  });

  test("a near-symmetric circle on level ground has no driving moment (not FS 10⁸)", () => {
    const d = clone(cut);
    d.regions = [
      {
        material: "s",
        points: [
          [0, -10],
          [80, -10],
          [80, 10],
          [0, 10],
        ],
      },
    ];
    for (const xc of [40, 40.3, 41.7]) {
      const r = circle(d, xc, 18, 12);
      expect(r.fs.bishop).toBeNull();
      expect(r.reason).toBe("no-driving-moment");
    }
  });
});
