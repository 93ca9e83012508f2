/**
 * The second-stage strength of a staged rapid drawdown (docs/engine.md §7(b)) as pure functions.
 * Sources: Duncan, Wright & Wong (1990) and Duncan, Wright & Brandon (2014), ch. 9, for the
 * three-stage interpolation; USACE EM 1110-2-1902 (2003), Appendix G, for the two-stage
 * composite envelope. Numbers: docs/references.md "Rapid drawdown", derived (the textbook's own
 * table was not read).
 */
import fc from "fast-check";
import { describe, expect, test } from "vitest";
import {
  consolidationRatio,
  failureRatio,
  kc1Intercept,
  kc1Slope,
  threeStageDetail,
  threeStageStrength,
  twoStageStrength,
} from "@/lib/stability/drawdown/staged-strength";

const RAD = Math.PI / 180;

describe("threeStageDetail(): docs/references.md derived infinite-slope example (Duncan, Wright & Wong 1990; Duncan, Wright & Brandon 2014 ch. 9)", () => {
  // 3H:1V slope under 100 ft of water, γ = 125 pcf, γw = 62.4 pcf, c' = 0, φ' = 40°,
  // Kc = 1 envelope d = 2000 psf, ψ = 20°. Stage 1 on the submerged infinite slope:
  // σ'fc = γ'·z·cos²β and τfc = σ'fc·tan β (FS1 = tan φ'/tan β). Units: psf, ft.
  const gamma = 125;
  const gammaW = 62.4;
  const beta = Math.atan(1 / 3);
  const phi = 40 * RAD;
  const d = 2000;
  const tanPsi = Math.tan(20 * RAD);
  function atDepth(z: number) {
    const sig = (gamma - gammaW) * z * Math.cos(beta) ** 2;
    return threeStageDetail(sig, sig * Math.tan(beta), 0, phi, d, tanPsi);
  }

  test("K1 = 2.030 and Kf = 4.599 at any depth", () => {
    for (const z of [1, 5, 20, 80]) {
      const r = atDepth(z);
      expect(r.kc).toBeCloseTo(2.03, 3);
      expect(r.kf).toBeCloseTo(4.599, 3);
    }
  });

  test("at z = 5 ft: τff(Kc = 1) = 2102 psf and τff(Kc = Kf) = 236 psf", () => {
    const r = atDepth(5);
    expect(Math.abs(r.tauK1 - 2102)).toBeLessThan(1);
    expect(Math.abs(r.tauKf - 236)).toBeLessThan(1);
  });

  test("the Kc = Kf envelope lies below the Kc = 1 one, so it governs: FS2 = (γ'/γ)·tan φ'/tan β = 1.261", () => {
    const z = 5;
    const r = atDepth(z);
    expect(r.tau2).toBe(r.tauKf);
    // Undrained strength over the shear stress after drawdown, γ·z·sin β·cos β.
    const fs2 = r.tau2 / (gamma * z * Math.sin(beta) * Math.cos(beta));
    expect(Math.abs(fs2 - 1.261)).toBeLessThan(5e-4);
  });

  test("the stage-1 stresses of the example give FS1 = tan φ'/tan β = 2.517 (drained, submerged)", () => {
    const sig = (gamma - gammaW) * 5 * Math.cos(beta) ** 2;
    expect(Math.abs((sig * Math.tan(phi)) / (sig * Math.tan(beta)) - 2.517)).toBeLessThan(5e-4);
  });
});

describe("threeStageStrength(): properties of the interpolation (docs/engine.md §7(b))", () => {
  // Stresses in kPa rounded to 1e-6 kPa: subnormal doubles are no soil state.
  const kpa = (max: number) => fc.double({ min: 0, max, noNaN: true }).map((v) => Math.round(v * 1e6) / 1e6);
  const state = fc.record({
    sig: kpa(800),
    mob: fc.double({ min: 0, max: 1.2, noNaN: true }),
    c: kpa(50),
    phi: fc.double({ min: 0, max: 45, noNaN: true }),
    cR: kpa(80),
    phiR: fc.double({ min: 0, max: 35, noNaN: true }),
  });

  test("with d, ψ = c', φ' the strength τ2 equals τKf (docs/engine.md §7 validation)", () => {
    fc.assert(
      fc.property(state, ({ sig, mob, c, phi }) => {
        const p = phi * RAD;
        const tauKf = c + sig * Math.tan(p);
        const t2 = threeStageStrength(sig, mob * tauKf, c, Math.sin(p), Math.cos(p), Math.tan(p), c, Math.tan(p));
        expect(Math.abs(t2 - tauKf)).toBeLessThanOrEqual(1e-9 * Math.max(1, tauKf));
      }),
      { numRuns: 300 },
    );
  });

  test("τ2 lies between the lower envelope and τKf; Kc = 1 gives the lower, Kc ≥ Kf gives τKf", () => {
    fc.assert(
      fc.property(state, ({ sig, mob, c, phi, cR, phiR }) => {
        const p = phi * RAD;
        const [s, co, t] = [Math.sin(p), Math.cos(p), Math.tan(p)];
        const d = kc1Intercept(cR, phiR * RAD, p);
        const tanPsi = kc1Slope(phiR * RAD, p);
        const tauKf = c + sig * t;
        const low = Math.min(d + sig * tanPsi, tauKf);
        const t2 = threeStageStrength(sig, mob * tauKf, c, s, co, t, d, tanPsi);
        const tol = 1e-9 * Math.max(1, tauKf, low);
        expect(t2).toBeGreaterThanOrEqual(low - tol);
        expect(t2).toBeLessThanOrEqual(tauKf + tol);
        expect(Math.abs(threeStageStrength(sig, 0, c, s, co, t, d, tanPsi) - low)).toBeLessThanOrEqual(tol);
        if (failureRatio(sig, c, s, co) > 1) {
          // τfc at the effective envelope means Kc = Kf (consolidated to failure).
          const kf = failureRatio(sig, c, s, co);
          const kc = consolidationRatio(sig, tauKf, s, co);
          if (kf < 1e6) expect(Math.abs(kc - kf)).toBeLessThanOrEqual(1e-6 * kf);
          expect(Math.abs(threeStageStrength(sig, tauKf, c, s, co, t, d, tanPsi) - tauKf)).toBeLessThanOrEqual(
            1e-6 * Math.max(1, tauKf),
          );
        }
      }),
      { numRuns: 300 },
    );
  });

  test("kc1Intercept/kc1Slope: the Kc = 1 strength is the R-envelope Mohr circle's shear stress on the effective failure plane", () => {
    // Geometry (Duncan, Wright & Brandon 2014 ch. 9): isotropic consolidation at σ'3c = σ'fc;
    // the failure circle has σ3 = σ'3c and touches the R line; the failure plane is the one
    // at 45° + φ'/2 from the major principal plane, where τ = radius·cos φ'.
    fc.assert(
      fc.property(state, ({ sig, phi, cR, phiR }) => {
        const p = phi * RAD;
        const pr = phiR * RAD;
        // Radius from tangency, solved numerically by bisection on the distance to the R line.
        let lo = 0;
        let hi = 1e5;
        for (let i = 0; i < 200; i++) {
          const rad = (lo + hi) / 2;
          const centre = sig + rad;
          const dist = (cR + centre * Math.tan(pr)) * Math.cos(pr);
          if (dist > rad) lo = rad;
          else hi = rad;
        }
        const tauGeom = ((lo + hi) / 2) * Math.cos(p);
        const tauFormula = kc1Intercept(cR, pr, p) + sig * kc1Slope(pr, p);
        expect(Math.abs(tauFormula - tauGeom)).toBeLessThanOrEqual(1e-6 * Math.max(1, tauGeom));
      }),
      { numRuns: 200 },
    );
  });
});

describe("twoStageStrength(): USACE (1970) composite envelope (EM 1110-2-1902, 2003, App. G)", () => {
  test("is the lower bound of the R and the effective (S) envelopes at σ'fc", () => {
    // c' = 10, φ' = 30°; cR = 20, φR = 15°: the envelopes cross where 10 + 0.5774σ = 20 + 0.2679σ, σ ≈ 32.3.
    const t = Math.tan(30 * RAD);
    const tR = Math.tan(15 * RAD);
    expect(twoStageStrength(10, 10, t, 20, tR)).toBeCloseTo(10 + 10 * t, 12);
    expect(twoStageStrength(100, 10, t, 20, tR)).toBeCloseTo(20 + 100 * tR, 12);
  });
});
