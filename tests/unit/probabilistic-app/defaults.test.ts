/**
 * Defaults of the probabilistic panel (lib/probabilistic/defaults.ts, lab-scatter.ts, cov-table.ts).
 * Sources of the checks:
 * - The covariance of least-squares coefficients is σ²(XᵀX)⁻¹ (Montgomery & Runger, Applied
 *   Statistics and Probability for Engineers, ch. 11-12); it is computed here independently with
 *   ml-matrix and compared with the scatter the panel derives from the fit's standard errors.
 * - φ′ = atan b, so dφ′/db = 1/(1 + b²) (calculus; the delta method, common practice).
 * - The COV ranges are Duncan (2000) Table 1 (from memory) and Cherubini (1997) for c′, as quoted in
 *   the 2001 discussion of Duncan (2000); the default is the middle of each range (our choice).
 */
import { describe, expect, it } from "vitest";
import { Matrix, inverse } from "ml-matrix";
import { checkAndDeriveLabTest } from "@/lib/materials/lab-derive";
import { labSetScatter } from "@/lib/probabilistic/lab-scatter";
import { materialDefaults, strengthKeys } from "@/lib/probabilistic/defaults";
import { typicalCov, TYPICAL_COV } from "@/lib/probabilistic/cov-table";
import type { LabTestRecord } from "@/lib/materials/lab-kinds";

/** The demo fill's invented shear box results (db/seeds/demo-materials.ts). */
const SHEAR_BOX = [
  [50, 35.1],
  [100, 57.9],
  [200, 108.4],
  [300, 155.6],
];

function derived(kind: "direct-shear", data: unknown): LabTestRecord {
  const out = checkAndDeriveLabTest(kind, data);
  if (!out.ok) throw new Error(JSON.stringify(out.problems));
  return out.record;
}

const shearBox = derived("direct-shear", {
  tests: SHEAR_BOX.map(([n, s], i) => ({ specimen: `DS-${i + 1}`, normalStress: n, shearStress: s })),
});

describe("strength scatter from a lab set's fit", () => {
  it("equals σ²(XᵀX)⁻¹ carried to c′ and φ′ by the delta method", () => {
    const X = new Matrix(SHEAR_BOX.map(([x]) => [1, x]));
    const y = Matrix.columnVector(SHEAR_BOX.map(([, t]) => t));
    const xtxInv = inverse(X.transpose().mmul(X));
    const beta = xtxInv.mmul(X.transpose()).mmul(y);
    const resid = y.clone().sub(X.mmul(beta));
    const s2 = resid.transpose().mmul(resid).get(0, 0) / (SHEAR_BOX.length - 2);
    const cov = xtxInv.mul(s2);
    const b = beta.get(1, 0);
    const dphi = 180 / Math.PI / (1 + b * b);
    const sdC = Math.sqrt(cov.get(0, 0));
    const sdPhi = Math.sqrt(cov.get(1, 1)) * dphi;
    const rho = (cov.get(0, 1) * dphi) / (sdC * sdPhi);

    const s = labSetScatter(shearBox)!;
    expect(s.n).toBe(4);
    expect(s.cSd).toBeCloseTo(sdC, 6);
    expect(s.phiSd).toBeCloseTo(sdPhi, 6);
    expect(s.correlation).toBeCloseTo(rho, 6);
    // A fitted intercept and slope are negatively correlated when every x is positive (common practice).
    expect(s.correlation!).toBeLessThan(0);
  });

  it("gives no scatter for a set that yields no strength line", () => {
    // The demo fill's invented compaction points (db/seeds/demo-materials.ts).
    const compaction = checkAndDeriveLabTest("compaction", {
      specificGravity: 2.7,
      acceptancePercent: 95,
      points: [11, 14, 17, 20, 23].map((w, i) => ({
        specimen: `P-${i + 1}`,
        moistureContent: w,
        dryDensity: [1.56, 1.63, 1.66, 1.63, 1.55][i],
      })),
    });
    if (!outcomeOk(compaction)) throw new Error(JSON.stringify(compaction.problems));
    expect(labSetScatter(compaction.record)).toBeNull();
  });
});

function outcomeOk<T extends { ok: boolean }>(o: T): o is T & { ok: true } {
  return o.ok;
}

describe("defaults per material", () => {
  const fill = { id: "fill", name: "Fill", model: "mohr-coulomb", gamma: 19, c: 10, phi: 26, su: 60 };

  it("uses the lab set's fitted scatter for c′ and φ′ and says which set", () => {
    const set = { id: 7, name: "Shear box A", record: shearBox };
    const d = materialDefaults(fill, "steady", { c: set, phi: set });
    const s = labSetScatter(shearBox)!;
    expect(d.vary.phi).toEqual({ dist: "normal", sd: Number(s.phiSd.toFixed(3)) });
    expect(d.vary.c).toEqual({ dist: "lognormal", sd: Number(s.cSd!.toFixed(3)) });
    expect(d.vary.correlation).toBe(Number(s.correlation!.toFixed(2)));
    expect(d.basis.phi).toContain("Shear box A");
    // γ has no lab scatter here: the typical COV, the middle of Duncan's 3–7 %.
    expect(d.vary.gamma).toEqual({ dist: "normal", sd: Number((19 * 0.05).toFixed(3)) });
    expect(d.basis.gamma).toContain("Duncan (2000)");
  });

  it("falls back to the middle of the published COV ranges without a lab set", () => {
    const d = materialDefaults(fill, "steady", {});
    expect(typicalCov("phi")).toBeCloseTo((0.02 + 0.13) / 2, 12);
    expect(d.vary.phi!.sd).toBeCloseTo(26 * typicalCov("phi"), 3);
    expect(d.vary.c!.sd).toBeCloseTo(10 * typicalCov("c"), 3);
    expect(d.vary.c!.dist).toBe(TYPICAL_COV.c.dist);
    expect(d.vary.correlation).toBeUndefined();
    expect(d.basis.c).toContain("Cherubini");
  });

  it("varies su, not c′ and φ′, where the load case uses su (end of construction)", () => {
    expect(strengthKeys(fill, "undrained")).toEqual(["su", "gamma"]);
    const d = materialDefaults(fill, "undrained", {});
    expect(d.vary.su).toEqual({ dist: "lognormal", sd: Number((60 * typicalCov("su")).toFixed(3)) });
    expect(d.vary.phi).toBeUndefined();
  });

  it("leaves a cohesionless material's c′ alone and an impenetrable one entirely", () => {
    const sand = materialDefaults({ id: "drain", model: "mohr-coulomb", gamma: 20, c: 0, phi: 36 }, "steady", {});
    expect(sand.vary.c).toBeUndefined();
    expect(sand.vary.phi).toBeDefined();
    expect(materialDefaults({ id: "rock", model: "impenetrable" }, "steady", {}).keys).toEqual([]);
  });
});
