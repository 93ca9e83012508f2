/**
 * A hand calculation of one small circle with four slices, computed here independently
 * with the textbook formulas (Fellenius 1936; Bishop 1955) and compared with the engine.
 * Section: homogeneous slope, face from (30, 25) to (50, 35), c' = 3 kPa, φ' = 19.6°,
 * γ = 20 kN/m³. The circle cuts only the face, so the engine's four slices are equal and the
 * soil column of each lies under the straight face.
 */
import { describe, expect, test } from "vitest";
import { circle, clone, expectRelative, loadFixture } from "./helpers";

// Chord on the face from x = 34 to 46; centre 8 m from the chord's midpoint along its normal.
const s5 = Math.sqrt(5);
const xc = 40 - 8 / s5;
const yc = 30 + 16 / s5;
const R = Math.sqrt(109);
const gamma = 20;
const c = 3;
const tp = Math.tan((19.6 * Math.PI) / 180);

/** ∫√(R² − d²) dd, the area primitive of the circle. */
const G = (d: number) => 0.5 * (d * Math.sqrt(R * R - d * d) + R * R * Math.asin(d / R));

/**
 * Hand calculation (docs/engine.md §3): slices of width 3 m, the exact area between the face
 * and the arc, base length R·Δθ, base angle at the midpoint, sliding toward −x (the face falls
 * to the left). ru applies to the slice's overburden: u·b = ru·W.
 */
function hand(ru: number) {
  const rows = [35.5, 38.5, 41.5, 44.5].map((xm) => {
    const b = 3;
    const [xl, xr] = [xm - b / 2, xm + b / 2];
    const yg = 25 + 0.5 * (xm - 30);
    const ym = yc - Math.sqrt(R * R - (xm - xc) ** 2);
    const arcIntegral = yc * b - (G(xr - xc) - G(xl - xc));
    const W = gamma * (b * yg - arcIntegral);
    const sinA = (xm - xc) / R; // mirrored: positive where the base falls toward −x
    const cosA = (yc - ym) / R;
    const l = R * (Math.asin((xr - xc) / R) - Math.asin((xl - xc) / R));
    const u = (ru * W) / b;
    return { b, W, sinA, cosA, l, bb: l * cosA, u };
  });
  const D = rows.reduce((s, r) => s + r.W * r.sinA, 0);
  const ordinary = rows.reduce((s, r) => s + c * r.l + Math.max(0, r.W * r.cosA - r.u * r.l) * tp, 0) / D;
  let F = ordinary;
  for (let i = 0; i < 200; i++) {
    F = rows.reduce((s, r) => s + (c * r.bb + (r.W - r.u * r.bb) * tp) / (r.cosA + (r.sinA * tp) / F), 0) / D;
  }
  return { ordinary, bishop: F, rows };
}

describe("analyzeCircle(small circle, 4 slices) equals a hand calculation", () => {
  test.each([0, 0.3])("ru = %s", (ru) => {
    const doc = clone(loadFixture("hand-calculation.json"));
    if (ru > 0) doc.water = { ru };
    const r = circle(doc, xc, yc, R);
    const h = hand(ru);
    expect(r.slices).toHaveLength(4);
    r.slices.forEach((s, i) => {
      expect(s.xRight - s.xLeft).toBeCloseTo(h.rows[i].b, 9);
      expectRelative(s.weight, h.rows[i].W, 1e-9);
      expectRelative(s.baseLength, h.rows[i].l, 1e-9);
    });
    expectRelative(r.fs.fellenius, h.ordinary, 1e-9);
    expectRelative(r.fs.bishop, h.bishop, 1e-6);
    expect(r.direction).toBe("left");
  });
});
