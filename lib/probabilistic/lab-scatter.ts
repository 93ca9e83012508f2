/**
 * The scatter of a lab set's fitted strength: the standard deviations of c′ and φ′ (or su) as the
 * least-squares fit gives them, and the correlation between c′ and φ′ that the fit itself implies.
 *
 * For the line y = a + b·x fitted by ordinary least squares, the standard errors of a and b are the
 * fit's own (lib/lab/least-squares.ts) and their correlation is −x̄ / √(Σx²/n) (Montgomery &
 * Runger, Applied Statistics and Probability for Engineers, ch. 11). c′ and φ′ are functions of
 * (a, b): c′ = a and φ′ = atan b for a direct shear envelope, lib/lab's toMohrCoulomb for a
 * triaxial one. The covariance is carried through by the first-order (delta) method with a
 * numerical Jacobian. These are the uncertainties of the fitted mean strength, which is what the
 * probabilistic run varies; the spread of single specimens is wider.
 */
import { toMohrCoulomb } from "@/lib/lab";
import type { LabTestRecord } from "@/lib/materials/lab-kinds";

export interface StrengthScatter {
  /** Standard deviation of c′ (kPa); null when the fit was forced through the origin (c′ = 0 exactly). */
  cSd: number | null;
  /** Standard deviation of φ′ (degrees). */
  phiSd: number;
  /** Correlation of c′ and φ′ from the fit; null with c′ held at 0. */
  correlation: number | null;
  /** Tests or specimens fitted. */
  n: number;
}

interface LineFit {
  intercept: number;
  slope: number;
  interceptStandardError: number | null;
  slopeStandardError: number | null;
  n: number;
  throughOrigin: boolean;
}

const DEG = 180 / Math.PI;

/** The scatter of (c′, φ′) = f(a, b) for a fitted line over the x values `xs`; null when the fit has no errors. */
export function lineScatter(
  fit: LineFit,
  xs: readonly number[],
  f: (a: number, b: number) => { c: number; phi: number },
): StrengthScatter | null {
  const sb = fit.slopeStandardError;
  if (sb === null || !(sb >= 0)) return null;
  const sa = fit.throughOrigin ? 0 : fit.interceptStandardError;
  if (sa === null) return null;
  const n = xs.length;
  const meanX = xs.reduce((s, x) => s + x, 0) / n;
  const rms = Math.sqrt(xs.reduce((s, x) => s + x * x, 0) / n);
  const rhoAb = fit.throughOrigin || rms === 0 ? 0 : -meanX / rms;
  const cov = [
    [sa * sa, rhoAb * sa * sb],
    [rhoAb * sa * sb, sb * sb],
  ];
  // Central differences, with steps scaled to each coefficient's own size.
  const ha = Math.max(1e-6, Math.abs(fit.intercept) * 1e-6);
  const hb = Math.max(1e-9, Math.abs(fit.slope) * 1e-6);
  const d = (g: (p: { c: number; phi: number }) => number) => [
    (g(f(fit.intercept + ha, fit.slope)) - g(f(fit.intercept - ha, fit.slope))) / (2 * ha),
    (g(f(fit.intercept, fit.slope + hb)) - g(f(fit.intercept, fit.slope - hb))) / (2 * hb),
  ];
  const jc = d((p) => p.c);
  const jp = d((p) => p.phi);
  const quad = (u: number[], v: number[]) =>
    u[0] * (cov[0][0] * v[0] + cov[0][1] * v[1]) + u[1] * (cov[1][0] * v[0] + cov[1][1] * v[1]);
  const varC = quad(jc, jc);
  const varP = quad(jp, jp);
  const phiSd = Math.sqrt(Math.max(0, varP));
  if (fit.throughOrigin) return { cSd: null, phiSd, correlation: null, n: fit.n };
  const cSd = Math.sqrt(Math.max(0, varC));
  const correlation = cSd > 0 && phiSd > 0 ? quad(jc, jp) / (cSd * phiSd) : 0;
  return { cSd, phiSd, correlation: Math.max(-0.99, Math.min(0.99, correlation)), n: fit.n };
}

/** The strength scatter a stored lab set gives, or null for a set that gives none (or too few tests). */
export function labSetScatter(record: LabTestRecord): StrengthScatter | null {
  if (record.kind === "direct-shear") {
    const r = record.result;
    return lineScatter(
      r.fit,
      r.points.map((p) => p.x),
      (a, b) => ({ c: a, phi: Math.atan(b) * DEG }),
    );
  }
  if (record.kind === "triaxial-cu") {
    const r = record.result;
    const space = record.data.space;
    return lineScatter(
      r.fit,
      r.points.map((p) => p.x),
      (a, b) => {
        const m = toMohrCoulomb(space, a, b);
        return { c: m.cohesion, phi: m.frictionAngle };
      },
    );
  }
  return null;
}

/** The standard deviation of a constant su from an undrained set (sample sd of the tests), or null. */
export function labSetSuSd(record: LabTestRecord): number | null {
  if (record.kind !== "undrained" || record.result.model !== "constant") return null;
  return record.result.standardDeviation;
}
