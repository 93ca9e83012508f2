/**
 * The Taylor-series (first-order second-moment) estimate as practitioners use it, after Duncan
 * (2000), "Factors of safety and reliability in geotechnical engineering", J. Geotech.
 * Geoenviron. Eng. 126(4): FS at the most likely values (here the means); each variable moved by
 * ± one standard deviation with the others held, ΔFᵢ = F⁺ − F⁻; σF = √Σ(ΔFᵢ/2)²; V = σF/F;
 * βLN = ln(F/√(1 + V²))/√(ln(1 + V²)) and pf = Φ(−βLN) for a lognormal FS. The structure follows
 * the paper; the formulas are written from memory. Two additions of ours: where ±σ would leave the
 * meaningful range the step is shortened and the slope rescaled to a full σ, and a c′–φ′
 * correlation ρ adds the first-order cross term 2ρ(ΔF_c/2)(ΔF_φ/2).
 */
import { finiteOrNull } from "../results";
import type { Evaluator } from "./evaluators";
import { normalCdf } from "./normal";
import { betaLognormalOf, betaNormalOf } from "./statistics";
import { clampToRange, type Correlation, type RandomVariable } from "./variables";

export interface FosmContribution {
  path: string;
  label: string;
  fsMinus: number | null;
  fsPlus: number | null;
  /** ΔF scaled to ± one standard deviation. */
  deltaFs: number | null;
  /** Share of the variance of FS from this variable alone (0–1). */
  share: number | null;
}

export interface FosmResult {
  fs: number | null;
  sdFs: number | null;
  cov: number | null;
  betaNormal: number | null;
  betaLognormal: number | null;
  /** pf from βLN (lognormal FS), as the method is usually applied. */
  pfLognormal: number | null;
  pfNormal: number | null;
  evaluations: number;
  contributions: FosmContribution[];
}

/**
 * Runs the Taylor-series estimate for every method at once.
 * @returns one result per method, in the order of `methods`
 */
export function taylorSeries(
  variables: ReadonlyArray<RandomVariable>,
  correlations: ReadonlyArray<Correlation>,
  methodCount: number,
  evaluate: Evaluator,
): FosmResult[] {
  const k = variables.length;
  const point = Float64Array.from(variables, (v) => v.mean);
  const mid = new Float64Array(methodCount);
  evaluate(point, 0, mid);
  const plus: Float64Array[] = [];
  const minus: Float64Array[] = [];
  const steps: number[] = [];
  for (let j = 0; j < k; j++) {
    const v = variables[j];
    const hi = clampToRange(v, v.mean + v.sd).x;
    const lo = clampToRange(v, v.mean - v.sd).x;
    steps.push(hi - lo);
    const p = new Float64Array(methodCount);
    const m = new Float64Array(methodCount);
    point[j] = hi;
    evaluate(point, 0, p);
    point[j] = lo;
    evaluate(point, 0, m);
    point[j] = v.mean;
    plus.push(p);
    minus.push(m);
  }
  const out: FosmResult[] = [];
  for (let i = 0; i < methodCount; i++) {
    const F = mid[i];
    const delta = variables.map((v, j) => (steps[j] > 0 ? ((plus[j][i] - minus[j][i]) * 2 * v.sd) / steps[j] : 0));
    let variance = 0;
    for (const d of delta) variance += (d / 2) ** 2;
    for (const { a, b, rho } of correlations) variance += 2 * rho * (delta[a] / 2) * (delta[b] / 2);
    const sd = Math.sqrt(Math.max(0, variance));
    const ok = Number.isFinite(F) && Number.isFinite(sd);
    const bN = ok && sd > 0 ? betaNormalOf(F, sd) : NaN;
    const bL = ok && sd > 0 && F > 0 ? betaLognormalOf(F, sd) : NaN;
    out.push({
      fs: finiteOrNull(F),
      sdFs: ok ? sd : null,
      cov: ok && F > 0 ? sd / F : null,
      betaNormal: finiteOrNull(bN),
      betaLognormal: finiteOrNull(bL),
      pfLognormal: Number.isFinite(bL) ? normalCdf(-bL) : null,
      pfNormal: Number.isFinite(bN) ? normalCdf(-bN) : null,
      evaluations: 2 * k + 1,
      contributions: variables.map((v, j) => ({
        path: v.path,
        label: v.label,
        fsMinus: finiteOrNull(minus[j][i]),
        fsPlus: finiteOrNull(plus[j][i]),
        deltaFs: finiteOrNull(delta[j]),
        share: ok && variance > 0 ? finiteOrNull((delta[j] / 2) ** 2 / variance) : null,
      })),
    });
  }
  return out;
}
