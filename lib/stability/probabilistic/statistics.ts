/**
 * Summary of the factors of safety of a set of samples (docs/probabilistic.md "Results"):
 * mean and standard deviation, pf = share of samples with FS < 1 and its standard error
 * √(pf(1 − pf)/n) (binomial), the reliability index in its normal form β = (μ − 1)/σ and its
 * lognormal form β = ln(μ/√(1 + V²))/√(ln(1 + V²)), V = σ/μ (the closed form for a lognormal FS;
 * e.g. Duncan 2000, eq. for βLN), a histogram, the empirical CDF and pf against samples.
 */
import { finiteOrNull } from "../results";

export const HISTOGRAM_BINS = 40;
export const CDF_POINTS = 101;
export const CONVERGENCE_POINTS = 60;

export interface Histogram {
  /** Lower edge of the first bin and width of each bin. */
  min: number;
  binWidth: number;
  counts: number[];
}

export interface FsSummary {
  /** Samples drawn, and those with a valid FS (the rest are left out of every figure). */
  samples: number;
  valid: number;
  meanFs: number | null;
  sdFs: number | null;
  pf: number | null;
  pfStandardError: number | null;
  betaNormal: number | null;
  betaLognormal: number | null;
  minFs: number | null;
  maxFs: number | null;
  histogram: Histogram;
  /** Points [FS, P(FS ≤ that value)] of the empirical CDF. */
  cdf: [number, number][];
  /** Points [samples so far, pf so far], in sampling order. */
  convergence: [number, number][];
}

/** β for a normal FS: (μ − 1)/σ. */
export function betaNormalOf(mean: number, sd: number): number {
  return (mean - 1) / sd;
}

/** β for a lognormal FS of mean μ and standard deviation σ: ln(μ/√(1 + V²))/√(ln(1 + V²)). */
export function betaLognormalOf(mean: number, sd: number): number {
  const v2 = (sd / mean) ** 2;
  return Math.log(mean / Math.sqrt(1 + v2)) / Math.sqrt(Math.log(1 + v2));
}

/** Summarises the FS of each sample (NaN where the sample gave no valid FS), in sampling order. */
export function summarise(fs: Float64Array): FsSummary {
  const valid: number[] = [];
  const convergence: [number, number][] = [];
  const marks = convergenceMarks(fs.length);
  let failures = 0;
  let mark = 0;
  let sum = 0;
  for (let i = 0; i < fs.length; i++) {
    const f = fs[i];
    if (Number.isFinite(f)) {
      valid.push(f);
      sum += f;
      if (f < 1) failures++;
    }
    if (i + 1 === marks[mark]) {
      if (valid.length > 0) convergence.push([i + 1, failures / valid.length]);
      mark++;
    }
  }
  const n = valid.length;
  const empty: FsSummary = {
    samples: fs.length,
    valid: n,
    meanFs: null,
    sdFs: null,
    pf: null,
    pfStandardError: null,
    betaNormal: null,
    betaLognormal: null,
    minFs: null,
    maxFs: null,
    histogram: { min: 0, binWidth: 0, counts: [] },
    cdf: [],
    convergence,
  };
  if (n === 0) return empty;
  const mean = sum / n;
  let ss = 0;
  for (const f of valid) ss += (f - mean) ** 2;
  const sd = n > 1 ? Math.sqrt(ss / (n - 1)) : 0;
  const pf = failures / n;
  const sorted = Float64Array.from(valid).sort();
  return {
    ...empty,
    meanFs: mean,
    sdFs: sd,
    pf,
    pfStandardError: Math.sqrt((pf * (1 - pf)) / n),
    betaNormal: sd > 0 ? finiteOrNull(betaNormalOf(mean, sd)) : null,
    betaLognormal: sd > 0 && mean > 0 ? finiteOrNull(betaLognormalOf(mean, sd)) : null,
    minFs: sorted[0],
    maxFs: sorted[n - 1],
    histogram: histogram(sorted),
    cdf: cdfPoints(sorted),
  };
}

/** Sample counts at which pf is recorded: roughly even on a log scale, ending at n. */
function convergenceMarks(n: number): number[] {
  const out: number[] = [];
  for (let i = 1; i <= CONVERGENCE_POINTS; i++) {
    const m = Math.round(Math.exp((Math.log(n) * i) / CONVERGENCE_POINTS));
    if (m >= 1 && (out.length === 0 || m > out[out.length - 1])) out.push(m);
  }
  if (out[out.length - 1] !== n) out.push(n);
  return out;
}

function histogram(sorted: Float64Array): Histogram {
  const lo = sorted[0];
  const hi = sorted[sorted.length - 1];
  const bins = Math.max(1, Math.min(HISTOGRAM_BINS, Math.ceil(Math.sqrt(sorted.length))));
  const width = hi > lo ? (hi - lo) / bins : 0;
  const counts = new Array<number>(bins).fill(0);
  for (const f of sorted) counts[width > 0 ? Math.min(bins - 1, Math.floor((f - lo) / width)) : 0]++;
  return { min: lo, binWidth: width, counts };
}

function cdfPoints(sorted: Float64Array): [number, number][] {
  const n = sorted.length;
  const out: [number, number][] = [];
  const points = Math.min(CDF_POINTS, n);
  for (let i = 0; i < points; i++) {
    const idx = points === 1 ? n - 1 : Math.round((i * (n - 1)) / (points - 1));
    out.push([sorted[idx], (idx + 1) / n]);
  }
  return out;
}
