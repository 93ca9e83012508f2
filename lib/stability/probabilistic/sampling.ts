/**
 * Draws the sample matrix: n samples × k variables, row by row (docs/probabilistic.md
 * "Sampling"). Monte Carlo takes independent uniforms; Latin hypercube splits each variable's
 * probability range into n equal strata and takes one uniform point in each, the strata shuffled
 * per variable (McKay, Beckman & Conover 1979). Uniforms become standard normal deviates through
 * Φ⁻¹; a c′–φ′ correlation ρ mixes the pair as z_φ ← ρ·z_c + √(1 − ρ²)·z_φ (Cholesky factor of
 * the 2 × 2 correlation matrix), which keeps each marginal standard normal. The draw order is
 * fixed, so a seed gives the same matrix on every machine.
 */
import { normalQuantile } from "./normal";
import { createStream } from "./random";
import type { Sampling } from "./schema";
import { clampToRange, valueAt, type Correlation, type RandomVariable } from "./variables";

export interface SampleMatrix {
  n: number;
  k: number;
  /** values[i·k + j]: sample i of variable j, in the variable's own unit. */
  values: Float64Array;
  /** How many values of each variable fell outside its meaningful range and were put on the limit. */
  moved: number[];
}

/** Standard normal deviates, n × k, before correlation. */
function deviates(n: number, k: number, sampling: Sampling, seed: number): Float64Array {
  const rng = createStream(seed);
  const z = new Float64Array(n * k);
  if (sampling === "monte-carlo") {
    for (let i = 0; i < n; i++) for (let j = 0; j < k; j++) z[i * k + j] = normalQuantile(rng.next());
    return z;
  }
  const perm = new Int32Array(n);
  for (let j = 0; j < k; j++) {
    for (let i = 0; i < n; i++) perm[i] = i;
    for (let i = n - 1; i > 0; i--) {
      const r = Math.floor(rng.next() * (i + 1));
      const t = perm[i];
      perm[i] = perm[r];
      perm[r] = t;
    }
    for (let i = 0; i < n; i++) z[i * k + j] = normalQuantile((perm[i] + rng.next()) / n);
  }
  return z;
}

/** Draws n samples of the variables with the given sampling scheme and seed. */
export function drawSamples(
  variables: ReadonlyArray<RandomVariable>,
  correlations: ReadonlyArray<Correlation>,
  n: number,
  sampling: Sampling,
  seed: number,
): SampleMatrix {
  const k = variables.length;
  const z = deviates(n, k, sampling, seed);
  for (const { a, b, rho } of correlations) {
    const s = Math.sqrt(1 - rho * rho);
    for (let i = 0; i < n; i++) z[i * k + b] = rho * z[i * k + a] + s * z[i * k + b];
  }
  const moved = new Array<number>(k).fill(0);
  for (let i = 0; i < n; i++)
    for (let j = 0; j < k; j++) {
      const r = clampToRange(variables[j], valueAt(variables[j], z[i * k + j]));
      z[i * k + j] = r.x;
      if (r.moved) moved[j]++;
    }
  return { n, k, values: z, moved };
}
