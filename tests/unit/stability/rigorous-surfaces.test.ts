/**
 * Slip surfaces given as polylines (docs/engine.md §12, docs/engine-io.md "Methods and slip surfaces
 * of any shape"): closed forms and hand calculations, and every refusal with its reason.
 * - A single plane: force equilibrium of the rigid block gives F = (c'·L + (W·cos α − U)·tan φ')/(W·sin α)
 *   whatever the interslice forces (fact of the trade; e.g. Duncan & Wright 2005 ch. 6, from memory).
 * - A three-wedge surface along a weak layer: the classical wedge method (horizontal forces between
 *   the blocks, force equilibrium only) worked by hand in the comments below; it is the engine's force
 *   equation at λ = 0 (Fredlund & Krahn 1977), which does not depend on how a straight base is sliced.
 * - A circle given as a fine polyline gives the circle's own factor (the moment point of a polyline
 *   does not matter once both equilibria hold: Fredlund, Zhang & Lam 1992, Can. Geotech. J. 29).
 */
import { describe, expect, test } from "vitest";
import { type SectionDocument } from "@/lib/stability";
import { factorAt } from "@/lib/stability/methods/gle";
import { prepareSection } from "@/lib/stability/prepare";
import { analyzeSurface } from "@/lib/stability/surfaces/analyze-surface";
import { createSurfaceEvaluator, evaluateSurface, surfaceToGle } from "@/lib/stability/surfaces/evaluate-surface";
import type { SurfaceSuccess } from "@/lib/stability/rigorous-types";
import { validateSection } from "@/lib/stability/validate";
import { circle, expectRelative } from "./helpers";

const RIGOROUS = ["bishop", "fellenius", "spencer", "morgenstern-price"] as const;

function surface(doc: unknown, pts: [number, number][]): SurfaceSuccess {
  const r = analyzeSurface(doc, pts);
  if (!r.ok) throw new Error(`invalid document: ${JSON.stringify(r.errors)}`);
  return r;
}

/** An invented cut: 2H:1V face 15 m high, one soil. */
function cut(extra: Partial<SectionDocument> = {}): SectionDocument {
  return {
    version: 1,
    materials: [{ id: "soil", model: "mohr-coulomb", gamma: 19, c: 10, phi: 25 }],
    regions: [
      {
        material: "soil",
        points: [
          [0, 20],
          [30, 20],
          [60, 5],
          [100, 5],
          [100, 0],
          [0, 0],
        ],
      },
    ],
    analysis: { methods: [...RIGOROUS], slices: 40 },
    ...extra,
  };
}

describe("a single plane", () => {
  // Plane from (20, 20) on the crest to the toe (60, 5): α = atan(15/40), L = √(40² + 15²);
  // the block is the triangle (20, 20), (30, 20), (60, 5): area ½·|10·(−15) − 0·40| = 75 m², W = 19·75.
  const alpha = Math.atan(15 / 40);
  const L = Math.hypot(40, 15);
  const W = 19 * 75;
  test.each(["half-sine", "constant"] as const)(
    "dry, M–P %s and Spencer: F = (c'L + W cos α tan φ')/(W sin α)",
    (f) => {
      const doc = cut();
      doc.analysis = { ...doc.analysis, interslice: f };
      const r = surface(doc, [
        [20, 20],
        [60, 5],
      ]);
      const expected = (10 * L + W * Math.cos(alpha) * Math.tan((25 * Math.PI) / 180)) / (W * Math.sin(alpha));
      expectRelative(r.fs.spencer, expected, 1e-7);
      expectRelative(r.fs["morgenstern-price"], expected, 1e-7);
      expect(r.fs.bishop).toBeNull();
      expect(r.reasons.bishop?.reason).toBe("circular-only");
      expect(r.reasons.fellenius?.reason).toBe("circular-only");
      expect(r.direction).toBe("right");
    },
  );

  test("ru = 0.3: the pore force U = ru·W/cos α comes off the normal force", () => {
    const r = surface(cut({ water: { ru: 0.3 } }), [
      [20, 20],
      [60, 5],
    ]);
    const U = (0.3 * W) / Math.cos(alpha);
    const expected = (10 * L + (W * Math.cos(alpha) - U) * Math.tan((25 * Math.PI) / 180)) / (W * Math.sin(alpha));
    expectRelative(r.fs.spencer, expected, 1e-7);
    expectRelative(r.fs["morgenstern-price"], expected, 1e-7);
  });
});

/**
 * Hand calculation (wedge method, horizontal side forces). Ground (0, 10)–(20, 10)–(40, 0)–(70, 0);
 * fill above y = −2 (γ 19, c' 5, φ' 30°), weak clay −2 to −3 (γ 18, c' 2, φ' 8°), strong base below.
 * Surface (6, 10) → (19, −3) → (41, −3) → (50, 0): an active wedge at 45°, the weak layer's base,
 * a passive wedge rising at atan(1/3) = 18.43°. Blocks by base (weights from the polygons' areas):
 *   A  x 6–18   fill  α +45°      L 16.971  W 19·72 = 1368
 *   B  x 18–19  weak  α +45°      L 1.414   W 19·11.5 + 18·0.5 = 237
 *   C  x 19–41  weak  α 0         L 22      W 3322 (fill above −2, 1 m of weak clay)
 *   D  x 41–44  weak  α −18.43°   L 3.162   W 141
 *   E  x 44–50  fill  α −18.43°   L 6.325   W 114
 * Each block: N = (W − c'L·sin α/F)/(cos α + sin α·tan φ'/F), S = (c'L + N·tan φ')/F, and the side
 * forces balance when Σ(N·sin α − S·cos α) = 0. By bisection on F: F = 1.24405 (N at the solution
 * 1274.8, 299.1, 3322.0, 156.2, 152.2 kN/m).
 */
describe("a three-wedge surface along a weak layer", () => {
  const doc: SectionDocument = {
    version: 1,
    materials: [
      { id: "fill", model: "mohr-coulomb", gamma: 19, c: 5, phi: 30 },
      { id: "weak", model: "mohr-coulomb", gamma: 18, c: 2, phi: 8 },
      { id: "base", model: "mohr-coulomb", gamma: 20, c: 50, phi: 35 },
    ],
    regions: [
      {
        material: "fill",
        points: [
          [0, 10],
          [20, 10],
          [40, 0],
          [70, 0],
          [70, -2],
          [0, -2],
        ],
      },
      {
        material: "weak",
        points: [
          [0, -2],
          [70, -2],
          [70, -3],
          [0, -3],
        ],
      },
      {
        material: "base",
        points: [
          [0, -3],
          [70, -3],
          [70, -12],
          [0, -12],
        ],
      },
    ],
    analysis: { methods: ["spencer", "morgenstern-price"], slices: 30 },
  };
  const pts: [number, number][] = [
    [6, 10],
    [19, -3],
    [41, -3],
    [50, 0],
  ];

  test("the force equation at λ = 0 gives the hand calculation's 1.24405", () => {
    const v = validateSection(doc);
    if (!v.ok) throw new Error("invalid");
    const P = prepareSection(v.section);
    const E = createSurfaceEvaluator();
    const f = evaluateSurface(P, E, [6, 19, 41, 50], [10, -3, -3, 0], "spencer", false);
    expect(f).toBeGreaterThan(0);
    surfaceToGle(E.B, E.G, 1);
    expectRelative(factorAt(E.G, 0, 0), 1.24405, 5e-5);
  });

  test("Spencer and M–P solve it, with λ and their interslice forces; the base is weak clay", () => {
    const r = surface(doc, pts);
    expect(r.fs.spencer).toBeGreaterThan(1.24405 * 0.95);
    expect(r.fs.spencer).toBeLessThan(1.24405 * 1.3);
    expect(r.lambda.spencer).not.toBeNull();
    expect(r.slices.filter((s) => s.material === "weak").length).toBeGreaterThan(5);
    expect(r.rigorous.spencer?.boundaries.length).toBe(r.slices.length + 1);
  });
});

describe("a circle given as a fine polyline", () => {
  test("gives the circle's Spencer factor within 0.1 %", () => {
    const doc = cut();
    const c = circle(doc, 45, 35, 31);
    const xc = 45;
    const yc = 35;
    const R = 31;
    const g = (x: number) => (x <= 30 ? 20 : x <= 60 ? 20 - (x - 30) / 2 : 5);
    const arc = (x: number) => yc - Math.sqrt(R * R - (x - xc) * (x - xc));
    const bis = (a: number, b: number) => {
      for (let i = 0; i < 200; i++) {
        const m = (a + b) / 2;
        if ((g(a) - arc(a)) * (g(m) - arc(m)) <= 0) b = m;
        else a = m;
      }
      return (a + b) / 2;
    };
    const xa = bis(xc - R + 1e-9, xc);
    const xb = bis(xc, xc + R - 1e-9);
    const pts: [number, number][] = [];
    for (let i = 0; i <= 300; i++) {
      const x = xa + ((xb - xa) * i) / 300;
      pts.push([x, i === 0 || i === 300 ? g(x) : arc(x)]);
    }
    const r = surface(doc, pts);
    expectRelative(r.fs.spencer, c.fs.spencer ?? NaN, 1e-3);
    expectRelative(r.fs["morgenstern-price"], c.fs["morgenstern-price"] ?? NaN, 1e-3);
  });
});

describe("a surface that cannot slide is refused with a reason, a sentence and no number", () => {
  const rockDoc = (): SectionDocument => ({
    ...cut(),
    materials: [
      { id: "soil", model: "mohr-coulomb", gamma: 19, c: 10, phi: 25 },
      { id: "rock", model: "impenetrable" },
    ],
    regions: [
      {
        material: "soil",
        points: [
          [0, 20],
          [30, 20],
          [60, 5],
          [100, 5],
          [100, 3],
          [0, 3],
        ],
      },
      {
        material: "rock",
        points: [
          [0, 3],
          [100, 3],
          [100, 0],
          [0, 0],
        ],
      },
    ],
  });
  test.each<[string, () => SectionDocument, [number, number][], string]>([
    [
      "an end above the ground",
      () => cut(),
      [
        [20, 23],
        [60, 5],
      ],
      "end-not-on-ground",
    ],
    [
      "an end below the ground",
      () => cut(),
      [
        [20, 20],
        [45, 8],
        [70, 3],
      ],
      "end-not-on-ground",
    ],
    [
      "crossing itself",
      () => cut(),
      [
        [20, 20],
        [50, 4],
        [40, 4],
        [45, 12],
        [62, 5],
      ],
      "crosses-itself",
    ],
    [
      "folding back",
      () => cut(),
      [
        [20, 20],
        [40, 8],
        [35, 6],
        [65, 5],
      ],
      "folds-back",
    ],
    [
      "a vertical step",
      () => cut(),
      [
        [20, 20],
        [40, 8],
        [40, 6],
        [65, 5],
      ],
      "folds-back",
    ],
    [
      "a reverse bend",
      () => cut(),
      [
        [20, 20],
        [35, 8],
        [45, 7.5],
        [50, 3],
        [70, 5],
      ],
      "reverse-bend",
    ],
    [
      "leaving the ground between its ends",
      () => cut(),
      [
        [10, 20],
        [25, 22],
        [40, 10],
        [62, 5],
      ],
      "above-ground",
    ],
    [
      "entering impenetrable material",
      rockDoc,
      [
        [20, 20],
        [40, 1],
        [70, 5],
      ],
      "impenetrable",
    ],
    [
      "running past the section",
      () => cut(),
      [
        [20, 20],
        [60, 2],
        [110, 5],
      ],
      "out-of-section",
    ],
  ])("%s", (_name, make, pts, reason) => {
    const r = surface(make(), pts);
    expect(r.reason).toBe(reason);
    expect(r.reasonText?.length ?? 0).toBeGreaterThan(20);
    // A polyline is no arc and no circle: the refusal speaks of the slip surface.
    expect(r.reasonText).not.toMatch(/\b(arc|circle)\b/);
    for (const m of RIGOROUS) expect(r.fs[m]).toBeNull();
    expect(r.slices).toEqual([]);
  });

  test("a bad document is reported as such (ok: false with its errors)", () => {
    const r = analyzeSurface({ version: 1, regions: [] }, [
      [0, 0],
      [1, 1],
    ]);
    expect(r.ok).toBe(false);
  });
});
