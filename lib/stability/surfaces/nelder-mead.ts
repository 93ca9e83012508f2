/**
 * The Nelder–Mead simplex method (Nelder & Mead 1965, Computer Journal 7(4)), with the usual
 * coefficients (reflection 1, expansion 2, contraction ½, shrink ½): a derivative-free minimiser for
 * the surfaces search, where an inadmissible point is +Infinity and simply never chosen.
 */

export interface NelderMeadOptions {
  /** Initial step per coordinate (the simplex's edges). */
  steps: ArrayLike<number>;
  /** Most evaluations of f. */
  maxEvaluations: number;
  /** Stop when the simplex's values span less than this (absolute). */
  tolerance: number;
  /** Called after each iteration with the best value; return false to stop. */
  onIteration?: (best: number) => boolean | void;
}

export interface NelderMeadResult {
  x: number[];
  value: number;
  evaluations: number;
}

/** Minimises f from x0. */
export function nelderMead(f: (x: number[]) => number, x0: ArrayLike<number>, o: NelderMeadOptions): NelderMeadResult {
  const n = x0.length;
  let evaluations = 0;
  const val = (x: number[]): number => {
    evaluations++;
    const v = f(x);
    return Number.isNaN(v) ? Infinity : v;
  };
  const pts: number[][] = [Array.from(x0)];
  for (let i = 0; i < n; i++) {
    const p = Array.from(x0);
    p[i] += o.steps[i];
    pts.push(p);
  }
  const vals = pts.map(val);
  const order = pts.map((_, i) => i);
  while (evaluations < o.maxEvaluations) {
    order.sort((a, b) => vals[a] - vals[b]);
    const best = order[0];
    const worst = order[n];
    const second = order[n - 1];
    if (o.onIteration && o.onIteration(vals[best]) === false) break;
    if (Number.isFinite(vals[worst]) && vals[worst] - vals[best] <= o.tolerance) break;
    const centroid = new Array<number>(n).fill(0);
    for (let k = 0; k < n; k++) {
      const p = pts[order[k]];
      for (let i = 0; i < n; i++) centroid[i] += p[i] / n;
    }
    const along = (t: number) => centroid.map((c, i) => c + t * (pts[worst][i] - c));
    const xr = along(-1);
    const fr = val(xr);
    if (fr < vals[best]) {
      const xe = along(-2);
      const fe = val(xe);
      if (fe < fr) replace(worst, xe, fe);
      else replace(worst, xr, fr);
    } else if (fr < vals[second]) replace(worst, xr, fr);
    else {
      const xc = fr < vals[worst] ? along(-0.5) : along(0.5);
      const fc = val(xc);
      if (fc < Math.min(fr, vals[worst])) replace(worst, xc, fc);
      else {
        for (let k = 1; k <= n; k++) {
          const j = order[k];
          pts[j] = pts[j].map((v, i) => pts[best][i] + 0.5 * (v - pts[best][i]));
          vals[j] = val(pts[j]);
        }
      }
    }
  }
  let b = 0;
  for (let k = 1; k <= n; k++) if (vals[k] < vals[b]) b = k;
  return { x: pts[b], value: vals[b], evaluations };

  function replace(j: number, x: number[], v: number): void {
    pts[j] = x;
    vals[j] = v;
  }
}
