/**
 * Test reference: the engine file as it stood before the speed work (commit a03b372), unchanged
 * apart from its imports (see ./evaluate-circle.ts).
 *
 * The ordinary method of slices (Fellenius 1936), moment equilibrium about the centre,
 * docs/engine.md §4: F = Σ(c'·l + N'·tan φ') / D with N' not below zero.
 * - classical form (default): N' = V·cos α − H·sin α − u·l, H every horizontal force on
 *   the slice (ponded-water thrust, seismic) positive in the sliding direction;
 * - effective-weight form: N' = (V − u·b)·cos α − kh·W·sin α (water thrust enters D only).
 * The effective-weight form over-predicts on flat slopes with high pore pressure
 * (docs/engine.md §4); Bishop's simplified method governs.
 */
import type { Scratch } from "@/lib/stability/scratch";

/**
 * Ordinary-method factor of safety of the slices in S (driving term D > 0, kN).
 * Sets S.negO to the number of slices whose N' was raised to zero.
 */
export function ordinaryFactor(S: Scratch, D: number, effectiveWeight: boolean): number {
  let res = 0;
  let neg = 0;
  const n = S.n;
  for (let i = 0; i < n; i++) {
    const tp = S.tanPhi[i];
    const l = S.len[i];
    if (tp === 0) {
      res += S.c[i] * l;
      continue;
    }
    const Np = effectiveWeight
      ? (S.V[i] - S.u[i] * S.bb[i]) * S.cosA[i] - S.Hs[i] * S.sinA[i]
      : S.V[i] * S.cosA[i] - S.Hn[i] * S.sinA[i] - S.u[i] * l;
    if (Np > 0) res += S.c[i] * l + Np * tp;
    else {
      res += S.c[i] * l;
      neg++;
    }
  }
  S.negO = neg;
  return res / D;
}
