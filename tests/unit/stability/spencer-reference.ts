/**
 * A slow, plain Spencer solver for the tests (docs/engine.md §11): thin uniform slices, Spencer's own
 * form of the equations (Spencer 1967): the resultant Q of each slice's two side forces, parallel at
 * angle θ, passes through the base midpoint, and
 *   Q = [(c'·l + (W·cos α − u·l)·tan φ')/F − W·sin α] / [cos(α + θ)·(1 + tan φ'·tan(α + θ)/F)],
 * force equilibrium ΣQ = 0, moment equilibrium ΣQ·(x·sin θ − y·cos θ) = 0. F_f(θ) and F_m(θ) by
 * bisection in F, θ by bisection on F_m − F_f. Nothing here is shared with the engine.
 */

export interface ReferenceSection {
  ground: (x: number) => number;
  /** Slip surface elevation between xa and xb (the mass slides toward +x). */
  base: (x: number) => number;
  xa: number;
  xb: number;
  gamma: number;
  c: number;
  phiDeg: number;
  /** Water surface elevation (below the ground everywhere), or null when dry. */
  water: ((x: number) => number) | null;
  gammaW: number;
}

interface Slice {
  x: number;
  y: number;
  W: number;
  sin: number;
  cos: number;
  l: number;
  u: number;
}

function slicesOf(s: ReferenceSection, n: number): Slice[] {
  const out: Slice[] = [];
  const b = (s.xb - s.xa) / n;
  for (let i = 0; i < n; i++) {
    const x0 = s.xa + i * b;
    const x = x0 + b / 2;
    const y = s.base(x);
    const dy = s.base(x0 + b) - s.base(x0);
    const a = Math.atan2(-dy, b);
    const W = s.gamma * Math.max(0, s.ground(x) - y) * b;
    const u = s.water ? s.gammaW * Math.max(0, s.water(x) - y) : 0;
    out.push({ x, y, W, sin: Math.sin(a), cos: Math.cos(a), l: Math.hypot(b, dy), u });
  }
  return out;
}

function sums(sl: Slice[], s: ReferenceSection, F: number, theta: number): [number, number] {
  const t = Math.tan((s.phiDeg * Math.PI) / 180);
  let force = 0;
  let moment = 0;
  for (const q of sl) {
    const ac = Math.cos(theta) * q.cos - Math.sin(theta) * q.sin;
    const as = Math.sin(theta) * q.cos + Math.cos(theta) * q.sin;
    const den = ac + (t * as) / F;
    // A slice whose denominator is not positive has no admissible Q at this F and θ (cf. Bishop's mα).
    if (!(den > 0)) return [NaN, NaN];
    const Q = ((s.c * q.l + (q.W * q.cos - q.u * q.l) * t) / F - q.W * q.sin) / den;
    force += Q;
    moment += Q * (q.x * Math.sin(theta) - q.y * Math.cos(theta));
  }
  return [force, moment];
}

function rootF(sl: Slice[], s: ReferenceSection, theta: number, k: 0 | 1): number {
  let lo = 0.2;
  let flo = sums(sl, s, lo, theta)[k];
  for (let hi = 0.25; hi < 30; hi *= 1.1) {
    const fhi = sums(sl, s, hi, theta)[k];
    if (Number.isFinite(flo) && Number.isFinite(fhi) && flo * fhi <= 0) {
      let a = lo;
      let b = hi;
      let fa = flo;
      for (let i = 0; i < 100; i++) {
        const m = (a + b) / 2;
        const fm = sums(sl, s, m, theta)[k];
        if (fa * fm <= 0) b = m;
        else {
          a = m;
          fa = fm;
        }
      }
      return (a + b) / 2;
    }
    lo = hi;
    flo = fhi;
  }
  return NaN;
}

/** Spencer's factor of safety with n thin slices (NaN when θ cannot be bracketed in −45°…45°). */
export function referenceSpencer(s: ReferenceSection, n = 2000): number {
  const sl = slicesOf(s, n);
  const g = (th: number) => rootF(sl, s, th, 1) - rootF(sl, s, th, 0);
  const step = Math.PI / 90;
  let a = -Math.PI / 4;
  let ga = g(a);
  for (let b = a + step; b <= Math.PI / 4 + 1e-9; b += step) {
    const gb = g(b);
    if (Number.isFinite(ga) && Number.isFinite(gb) && ga * gb <= 0) {
      let lo = a;
      let hi = b;
      let glo = ga;
      for (let i = 0; i < 50; i++) {
        const m = (lo + hi) / 2;
        const gm = g(m);
        if (glo * gm <= 0) hi = m;
        else {
          lo = m;
          glo = gm;
        }
      }
      return rootF(sl, s, (lo + hi) / 2, 1);
    }
    a = b;
    ga = gb;
  }
  return NaN;
}
