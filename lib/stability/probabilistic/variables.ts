/**
 * The random variables of a probabilistic run, read from each material's `vary` and from
 * analysis.probabilistic.level (docs/probabilistic.md "Inputs"). Each variable knows its mean
 * (the section's own value), its distribution, truncation and the range outside which a sample
 * means nothing (c′ < 0, φ′ ∉ [0°, 60°), su ≤ 0, γ ∉ (5, 30] kN/m³, a lowered pool above the
 * pool it falls from). A distribution that puts more than MAX_OUTSIDE of its samples there is an
 * error; rarer samples are moved onto the limit and counted.
 */
import { issue, type Issue } from "../issues";
import type { SectionDocument } from "../schema";
import { normalCdf, normalQuantile } from "./normal";
import type { Distribution, ProbabilisticSettings, Vary } from "./schema";

/** Share of samples outside the meaningful range above which the input is rejected. */
export const MAX_OUTSIDE = 0.01;

export type VariableKey = "c" | "phi" | "su" | "gamma" | "level";

export interface RandomVariable {
  /** Path of the distribution in the document, e.g. `materials[0].vary.phi`. */
  path: string;
  /** Readable name, e.g. `fill φ′ (°)`. */
  label: string;
  /** Material index, or −1 for the pool level. */
  material: number;
  key: VariableKey;
  mean: number;
  sd: number;
  dist: "normal" | "lognormal";
  /** Parameters of the underlying normal: the value itself, or its logarithm for a lognormal. */
  mu: number;
  sigma: number;
  /** Truncation as probabilities of the untruncated distribution (0 and 1 when not truncated). */
  pLo: number;
  pHi: number;
  /** Truncation limits as given. */
  min?: number;
  max?: number;
  /** Meaningful range; `highOpen` when the high limit itself is not allowed (φ′ < 60°). */
  low: number;
  high: number;
  highOpen: boolean;
}

const UNITS: Record<VariableKey, string> = {
  c: "c′ (kPa)",
  phi: "φ′ (°)",
  su: "su (kPa)",
  gamma: "γ (kN/m³)",
  level: "",
};
const RANGES: Record<Exclude<VariableKey, "level">, [number, number, boolean]> = {
  c: [0, 1e5, false],
  phi: [0, 60, true],
  su: [1e-3, 1e5, false],
  gamma: [5.001, 30, false],
};

/** Cumulative probability of the untruncated distribution at value x. */
export function untruncatedCdf(v: Pick<RandomVariable, "dist" | "mu" | "sigma">, x: number): number {
  if (v.dist === "lognormal") return x <= 0 ? 0 : normalCdf((Math.log(x) - v.mu) / v.sigma);
  return normalCdf((x - v.mu) / v.sigma);
}

/** Value at standard normal deviate z, within the truncation. */
export function valueAt(v: RandomVariable, z: number): number {
  let zz = z;
  if (v.pLo > 0 || v.pHi < 1) zz = normalQuantile(v.pLo + normalCdf(z) * (v.pHi - v.pLo));
  const x = v.mu + v.sigma * zz;
  return v.dist === "lognormal" ? Math.exp(x) : x;
}

/** Pulls a sampled value back inside the meaningful range; reports whether it had to. */
export function clampToRange(v: RandomVariable, x: number): { x: number; moved: boolean } {
  if (x < v.low) return { x: v.low, moved: true };
  if (v.highOpen ? x >= v.high : x > v.high) return { x: v.highOpen ? v.high - 1e-9 : v.high, moved: true };
  return { x, moved: false };
}

function build(
  path: string,
  label: string,
  material: number,
  key: VariableKey,
  mean: number,
  d: Distribution,
  range: [number, number, boolean],
  errors: Issue[],
): RandomVariable | null {
  if (d.sd === 0) return null;
  if (d.min !== undefined && d.max !== undefined && !(d.min < d.max)) {
    errors.push(issue("truncation-order", path, `${path}: min (${d.min}) must be below max (${d.max}).`));
    return null;
  }
  if ((d.min !== undefined && mean < d.min) || (d.max !== undefined && mean > d.max)) {
    errors.push(issue("mean-outside-truncation", path, `${path}: the mean ${mean} of ${label} lies outside min…max.`));
    return null;
  }
  let mu = mean;
  let sigma = d.sd;
  if (d.dist === "lognormal") {
    if (!(mean > 0)) {
      errors.push(
        issue("lognormal-needs-positive-mean", `${path}.dist`, `${path}: a lognormal ${label} needs a mean above 0.`),
      );
      return null;
    }
    const s2 = Math.log(1 + (d.sd / mean) ** 2);
    sigma = Math.sqrt(s2);
    mu = Math.log(mean) - s2 / 2;
  }
  const shape = { dist: d.dist, mu, sigma };
  const pLo = d.min === undefined ? 0 : untruncatedCdf(shape, d.min);
  const pHi = d.max === undefined ? 1 : untruncatedCdf(shape, d.max);
  if (!(pHi - pLo > 1e-9)) {
    errors.push(issue("truncation-empty", path, `${path}: min…max leaves no probability to sample ${label} from.`));
    return null;
  }
  const [low, high, highOpen] = range;
  const outside = truncatedCdf(shape, low, pLo, pHi) + 1 - truncatedCdf(shape, high, pLo, pHi);
  if (outside > MAX_OUTSIDE) {
    errors.push(
      issue(
        "samples-out-of-range",
        `${path}.sd`,
        `${path}: with sd = ${d.sd}, ${(outside * 100).toFixed(1)} % of the samples of ${label} would fall outside ` +
          `${low} … ${high}, where they mean nothing. ` +
          "Lower sd, use a lognormal distribution, or truncate with min/max.",
      ),
    );
    return null;
  }
  const trunc = { ...(d.min !== undefined ? { min: d.min } : {}), ...(d.max !== undefined ? { max: d.max } : {}) };
  return {
    path,
    label,
    material,
    key,
    mean,
    sd: d.sd,
    dist: d.dist,
    mu,
    sigma,
    pLo,
    pHi,
    ...trunc,
    low,
    high,
    highOpen,
  };
}

/** Cumulative probability at x of the truncated distribution. */
function truncatedCdf(shape: Pick<RandomVariable, "dist" | "mu" | "sigma">, x: number, pLo: number, pHi: number) {
  const p = untruncatedCdf(shape, x);
  return Math.min(1, Math.max(0, (p - pLo) / (pHi - pLo)));
}

/** A c′–φ′ correlation of one material, as indices into the variable list. */
export interface Correlation {
  a: number;
  b: number;
  rho: number;
}

/**
 * Reads every varied quantity of a validated section.
 * @param vary each material's `vary` (same order as section.materials), undefined where absent
 */
export function buildVariables(
  section: SectionDocument,
  vary: ReadonlyArray<Vary | undefined>,
  settings: ProbabilisticSettings,
  errors: Issue[],
): { variables: RandomVariable[]; correlations: Correlation[] } {
  const variables: RandomVariable[] = [];
  const correlations: Correlation[] = [];
  section.materials.forEach((m, i) => {
    const v = vary[i];
    if (!v) return;
    const base = `materials[${i}].vary`;
    const keys: Exclude<VariableKey, "level">[] = ["c", "phi", "su", "gamma"];
    const index: Partial<Record<VariableKey, number>> = {};
    for (const key of keys) {
      const d = v[key];
      if (!d) continue;
      const own = (m as Record<string, unknown>)[key];
      if (typeof own !== "number") {
        errors.push(
          issue(
            "vary-without-value",
            `${base}.${key}`,
            `${base}.${key}: material '${m.id}' (${m.model}) has no ${key} to vary; give it one or remove this entry.`,
          ),
        );
        continue;
      }
      const made = build(`${base}.${key}`, `'${m.id}' ${UNITS[key]}`, i, key, own, d, RANGES[key], errors);
      if (made) {
        index[key] = variables.length;
        variables.push(made);
      }
    }
    if (v.correlation !== undefined && v.correlation !== 0) {
      if (index.c === undefined || index.phi === undefined) {
        errors.push(
          issue(
            "correlation-needs-c-and-phi",
            `${base}.correlation`,
            `${base}.correlation: a c′–φ′ correlation needs both c and phi varied (with sd > 0) on '${m.id}'.`,
          ),
        );
      } else correlations.push({ a: index.c, b: index.phi, rho: v.correlation });
    }
  });
  const level = settings.level;
  if (level) {
    const path = "analysis.probabilistic.level";
    const dd = section.analysis?.drawdown;
    if (section.analysis?.case !== "drawdown" || !dd) {
      errors.push(
        issue(
          "level-needs-drawdown",
          path,
          `${path}: the level varied is the lowered pool of a drawdown (analysis.drawdown.to); ` +
            'set analysis.case to "drawdown" with analysis.drawdown, or remove level.',
        ),
      );
    } else {
      const made = build(path, "lowered pool level (m)", -1, "level", dd.to, level, [-1e6, dd.from, false], errors);
      if (made) variables.push(made);
    }
  }
  return { variables, correlations };
}
