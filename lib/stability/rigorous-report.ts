/**
 * Turns a solved set of slices (methods/gle.ts) into the public RigorousFs shape: interslice forces
 * per boundary and the line of thrust in document coordinates, base forces per slice, and the
 * warnings a reviewer needs with their place (docs/engine.md §11 "Acceptability").
 */
import { METHOD_LABEL } from "./method-labels";
import { fmt, fmtPoint } from "./issues";
import type { GleSlices } from "./methods/gle";
import type { IntersliceFunction, RigorousMethod } from "./schema";
import type { IntersliceForce, RigorousFs, RigorousSlice, RigorousWarning, XY } from "./rigorous-types";
import { M_ALPHA_WARN } from "./search-warnings";
import { OK, M_ALPHA } from "./status";

const LABEL = METHOD_LABEL;

/** Reasons a rigorous method gives no factor, as names and plain text. */
export function rigorousReason(status: number): { reason: string; reasonText: string } {
  if (status === M_ALPHA)
    return {
      reason: "m-alpha-not-positive",
      reasonText:
        "mα = cos α + sin α·tan φ'/F is zero (below 0.01) or negative on a slice at the solution, so its base " +
        "force is unbounded: the exit is too steep.",
    };
  return {
    reason: "not-converged",
    reasonText:
      "No F and λ were found that satisfy both force and moment equilibrium (Newton's method and a scan " +
      "of λ from −1.5 to 2 both failed); check the surface's shape near its ends.",
  };
}

/** Geometry the report needs in document coordinates. */
export interface ReportGeometry {
  /** Direction of sliding: +1 toward +x, −1 toward −x. */
  dir: number;
  /** Elevation of the slip surface and of the ground at x (m). */
  baseAt: (x: number) => number;
  topAt: (x: number) => number;
}

/**
 * The public solution of `method` from G, which must hold the slices and the forces at the solution
 * (G.status OK), or the failure (fs null with the reason) otherwise.
 */
export function rigorousReport(
  G: GleSlices,
  method: RigorousMethod,
  interslice: IntersliceFunction,
  geo: ReportGeometry,
): RigorousFs {
  const used: IntersliceFunction = method === "spencer" ? "constant" : interslice;
  const base = { method, interslice: used, iterations: G.iterations };
  if (G.status !== OK || !Number.isFinite(G.fs)) {
    return {
      ...base,
      fs: null,
      lambda: null,
      ...rigorousReason(G.status),
      minMAlpha: Number.isFinite(G.minMa) ? G.minMa : null,
      boundaries: [],
      thrustLine: [],
      slices: [],
      warnings: [],
    };
  }
  const n = G.n;
  const thrustY = new Float64Array(n + 1);
  thrustLine(G, thrustY);
  const F = G.fs;
  const dir = geo.dir >= 0 ? 1 : -1;
  const boundaries: IntersliceForce[] = [];
  for (let j = 0; j <= n; j++) {
    const x = dir * (j < n ? G.xl[j] : G.xr[n - 1]);
    const ty = thrustY[j];
    boundaries.push({
      x,
      yBase: geo.baseAt(x),
      yTop: geo.topAt(x),
      normal: G.E[j],
      shear: G.X[j],
      thrustY: Number.isFinite(ty) ? ty : null,
    });
  }
  const slices: RigorousSlice[] = [];
  for (let j = 0; j < n; j++) {
    const N = G.N[j];
    const l = G.len[j];
    const Np = N - G.u[j] * l;
    slices.push({
      xLeft: dir > 0 ? G.xl[j] : -G.xr[j],
      xRight: dir > 0 ? G.xr[j] : -G.xl[j],
      baseY: G.ym[j],
      alpha: (Math.atan2(G.sinA[j], G.cosA[j]) * 180) / Math.PI,
      normal: Np,
      shear: F > 0 ? (G.c[j] * l + Np * G.tp[j]) / F : 0,
      mAlpha: G.cosA[j] + (F > 0 ? (G.sinA[j] * G.tp[j]) / F : 0),
    });
  }
  const warnings = placeWarnings(G, method, boundaries, slices);
  if (dir < 0) {
    boundaries.reverse();
    slices.reverse();
  }
  const line: XY[] = [];
  for (const b of boundaries) if (b.thrustY !== null) line.push([b.x, b.thrustY]);
  return {
    ...base,
    fs: F,
    lambda: G.lambda,
    minMAlpha: G.minMa,
    boundaries,
    thrustLine: line,
    slices,
    warnings,
  };
}

/** Thrust line outside the mass, tension between slices, low mα and negative base normals, each placed. */
function placeWarnings(
  G: GleSlices,
  method: RigorousMethod,
  boundaries: IntersliceForce[],
  slices: RigorousSlice[],
): RigorousWarning[] {
  const out: RigorousWarning[] = [];
  const who = LABEL[method];
  let maxE = 0;
  for (const b of boundaries) maxE = Math.max(maxE, Math.abs(b.normal));
  let outside = 0;
  let worst: IntersliceForce | null = null;
  let worstBy = 0;
  let tension = 0;
  let mostTension: IntersliceForce | null = null;
  for (const b of boundaries) {
    if (b.thrustY !== null) {
      const by = Math.max(b.yBase - b.thrustY, b.thrustY - b.yTop);
      if (by > 1e-6) {
        outside++;
        if (by > worstBy) {
          worstBy = by;
          worst = b;
        }
      }
    }
    if (b.normal < -1e-6 * maxE - 1e-9) {
      tension++;
      if (!mostTension || b.normal < mostTension.normal) mostTension = b;
    }
  }
  if (worst && worst.thrustY !== null) {
    out.push({
      code: "thrust-outside",
      message:
        `${who}: the line of thrust leaves the sliding mass at ${outside} slice boundar${outside > 1 ? "ies" : "y"}, ` +
        `farthest (${fmt(worstBy)} m) at ${fmtPoint(worst.x, worst.thrustY)}; the solution is doubtful there ` +
        "(often a steep entry or exit; consider a tension crack or a flatter end).",
      at: [worst.x, worst.thrustY],
    });
  }
  if (mostTension) {
    out.push({
      code: "tension",
      message:
        `${who}: the interslice normal force is negative (tension, ${fmt(mostTension.normal)} kN/m at the worst) ` +
        `at ${tension} boundar${tension > 1 ? "ies" : "y"}, worst at x = ${fmt(mostTension.x)} m; ` +
        "soil carries no tension: consider a tension crack near the crest.",
      at: [mostTension.x, mostTension.yTop],
    });
  }
  const at = G.minMaAt;
  if (at >= 0 && G.minMa < M_ALPHA_WARN) {
    const s = slices[at];
    const x = (s.xLeft + s.xRight) / 2;
    out.push({
      code: "m-alpha-low",
      message:
        `${who}: mα falls to ${G.minMa.toFixed(3)} (below ${M_ALPHA_WARN}) at x = ${fmt(x)} m, base angle ` +
        `${s.alpha.toFixed(1)}°: the exit is steep and the base normal force there is unreliable.`,
      at: [x, s.baseY],
    });
  }
  let neg = 0;
  let first: RigorousSlice | null = null;
  for (const s of slices)
    if (s.normal < 0) {
      neg++;
      if (!first) first = s;
    }
  if (first) {
    const x = (first.xLeft + first.xRight) / 2;
    out.push({
      code: "negative-normal",
      message: `${who}: the effective base normal force is negative on ${neg} slice(s), the first at x = ${fmt(x)} m.`,
      at: [x, first.baseY],
    });
  }
  return out;
}

/**
 * Elevation of the line of thrust at each interior boundary (NaN where |E| is too small to
 * place it), from the moment balance of each slice about its base midpoint:
 *   (y_{i+1} − ym)·E_{i+1} = (y_i − ym)·E_i − (b/2)·(X_i + X_{i+1}) + (yH − ym)·H,
 * carried as Z = y·E so that a boundary with E ≈ 0 passes its moment on unchanged.
 * Fills `out` (length n + 1; both ends NaN).
 */
function thrustLine(G: GleSlices, out: Float64Array): void {
  const n = G.n;
  let scale = 0;
  for (let i = 0; i <= n; i++) scale = Math.max(scale, Math.abs(G.E[i]));
  const small = 1e-6 * scale + 1e-9;
  out[0] = NaN;
  let Z = 0;
  for (let i = 0; i < n; i++) {
    const b = G.xr[i] - G.xl[i];
    const ym = G.ym[i];
    const E1 = G.E[i + 1];
    Z += ym * (E1 - G.E[i]) - (b / 2) * (G.X[i] + G.X[i + 1]) + (G.yH[i] - ym) * G.H[i];
    out[i + 1] = i + 1 < n && Math.abs(E1) > small ? Z / E1 : NaN;
  }
  out[n] = NaN;
}
