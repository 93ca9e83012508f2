/**
 * Phreatic line through a homogeneous dam on an impervious base with a horizontal toe filter,
 * reservoir on the left (docs/engine.md §6): Kozeny's basic parabola with Casagrande's entry correction.
 *
 * References: Casagrande, A. (1937) "Seepage through dams", J. New England Water Works Assoc. 51(2);
 * Kozeny (1931) for the parabola; Craig's Soil Mechanics, ch. 2 (seepage through embankment dams,
 * transformed section for anisotropy). Units: m, m/s, kN/m³; x to the right, y up.
 */

import { checkNumbers, downstreamFacePoints, f2, HAND_DRAWN, TOL, upstreamFacePoints } from "./seepage-input";

export type Point = [number, number];

/** The upstream face: two points, a toe with an H:V slope and a crest elevation, or a polyline. */
export type UpstreamFace =
  { toe: Point; crest: Point } | { toe: Point; slopeHV: number; crestElevation: number } | { points: Point[] };

/** The downstream face from its crest corner down to its toe (x increasing). */
export type DownstreamFace = { crest: Point; toe: Point } | { points: Point[] };

export interface SeepageInput {
  /** Elevation of the impervious base (m); the filter lies on it. */
  baseElevation: number;
  poolElevation: number;
  upstreamFace: UpstreamFace;
  /** x of the upstream end of the horizontal toe filter (the parabola's focus); null = no filter. */
  filterStartX?: number | null;
  downstreamFace: DownstreamFace;
  /** Horizontal permeability kh (m/s). */
  permeability: number;
  /** kv/kh; default 1 (isotropic). */
  anisotropyRatio?: number;
  /** Saturated unit weight of the fill and unit weight of water (kN/m³); γw defaults to 9.81. */
  gammaSat: number;
  gammaW?: number;
  /** Crest length (m) for the total seepage. */
  crestLength?: number;
  /** Flow net drawn by the engineer: Nd equipotential drops, Δl (m) of the last element, H (default h). */
  flowNet?: { equipotentialDrops: number; lastElementLength: number; headLoss?: number };
  /** Required piping factor; default 3 (common practice for earth embankments, docs/references.md). */
  requiredPipingFactor?: number;
}

export interface SeepageLimit {
  code: string;
  severity: "error" | "warning";
  message: string;
}

/** The basic parabola in section coordinates: y = baseY + √(y0² + 2·y0·xScale·(focusX − x)). */
export interface BasicParabola {
  focusX: number;
  baseY: number;
  y0: number;
  /** √(kv/kh): the section's x is scaled by it for the construction (1 when isotropic). */
  xScale: number;
}

export interface SeepageConstruction {
  /** Head h = pool − base, projection m of the wetted face, d = xF − xA (transformed when anisotropic), y0 (m). */
  h: number;
  m: number;
  d: number;
  y0: number;
  pointA: Point;
  pointB: Point;
  /** Where the entry curve joins the parabola (x = xB + 0.3m). */
  entryEnd: Point;
  focus: Point;
  vertex: Point;
  parabola: BasicParabola;
  /** The phreatic line from B to the vertex on the filter, x increasing. */
  phreatic: Point[];
  /**
   * The same extended for a section document: pool level from the upstream toe, base level along the filter to the
   * downstream toe.
   */
  waterLine: Point[];
}

export interface SeepageFlow {
  /** q = √(kh·kv)·y0 (m³/s per metre run), and q times the crest length (m³/s) when given. */
  perMetre: number;
  total: number | null;
}

export interface PipingCheck {
  /** i_cr = (γsat − γw)/γw. */
  criticalGradient: number;
  exitGradient: number;
  exitGradientMethod: "free-surface-at-filter" | "flow-net";
  /** FS = i_cr/i_exit against the required value. */
  pipingFactor: number;
  required: number;
  adequate: boolean;
}

export type SeepageResult =
  | { ok: true; construction: SeepageConstruction; flow: SeepageFlow; piping: PipingCheck; limits: SeepageLimit[] }
  | { ok: false; limits: SeepageLimit[]; construction?: SeepageConstruction };

/** y0 = √(h² + d²) − d (Kozeny), with h the head above the focus and d its distance from A (m). */
export function kozenyY0(h: number, d: number): number {
  // Written as h²/(√(h²+d²) + d) to avoid cancellation when d ≫ h.
  return (h * h) / (Math.hypot(h, d) + d);
}

/** Critical hydraulic gradient i_cr = γ'/γw = (γsat − γw)/γw. */
export function criticalGradient(gammaSat: number, gammaW = 9.81): number {
  return (gammaSat - gammaW) / gammaW;
}

/** Critical gradient from specific gravity and void ratio: (Gs − 1)/(1 + e) (Craig, ch. 2). */
export function criticalGradientFromVoidRatio(specificGravity: number, voidRatio: number): number {
  return (specificGravity - 1) / (1 + voidRatio);
}

/** Height of the basic parabola (m) at x; base elevation beyond the vertex. */
export function parabolaHeightAt(p: BasicParabola, x: number): number {
  const r = p.y0 * p.y0 + 2 * p.y0 * p.xScale * (p.focusX - x);
  return p.baseY + Math.sqrt(Math.max(0, r));
}

/**
 * Hydraulic gradient along the free surface at x: on the top flow line the pressure is zero, so the
 * head is the elevation and i = |dy/ds|, the sine of the line's slope. It is 1 at the vertex, where
 * the line meets the filter vertically, and 1/√2 above the focus (isotropic).
 */
export function freeSurfaceGradientAt(p: BasicParabola, x: number): number {
  const eta = parabolaHeightAt(p, x) - p.baseY;
  if (eta <= 1e-12) return 1;
  const slope = (p.xScale * p.y0) / eta; // |dy/dx|
  return slope / Math.hypot(1, slope);
}

/** Exit gradient from a flow net: i = (H/Nd)/Δl (docs/engine.md §6). */
export function flowNetExitGradient(headLoss: number, equipotentialDrops: number, lastElementLength: number): number {
  if (!(headLoss > 0 && equipotentialDrops > 0 && lastElementLength > 0))
    throw new Error("flow net: H, Nd and Δl must be positive");
  return headLoss / equipotentialDrops / lastElementLength;
}

/** Seepage from a flow net: q = k·H·Nf/Nd (m³/s per metre). */
export function flowNetDischarge(
  k: number,
  headLoss: number,
  flowChannels: number,
  equipotentialDrops: number,
): number {
  if (!(k > 0 && headLoss > 0 && flowChannels > 0 && equipotentialDrops > 0))
    throw new Error("flow net: k, H, Nf and Nd must be positive");
  return (k * headLoss * flowChannels) / equipotentialDrops;
}

/**
 * Builds the phreatic line, seepage and piping check by docs/engine.md §6. Cases outside the method
 * (no filter, pool above the crest or below the base, a non-plane upstream face, a line that
 * crosses the downstream face) come back with `ok: false` and coded `limits`, never NaN.
 *
 * Exit gradient: without a flow net, the gradient along the free surface where it meets the filter
 * (1 at the vertex, an upper bound along the top flow line); with `flowNet`, (H/Nd)/Δl.
 */
export function computeFilterSeepage(input: SeepageInput): SeepageResult {
  const limits: SeepageLimit[] = [];
  const error = (code: string, message: string) => limits.push({ code, severity: "error", message });
  const warn = (code: string, message: string) => limits.push({ code, severity: "warning", message });

  checkNumbers(input, error);
  if (limits.length) return { ok: false, limits };
  const up = upstreamFacePoints(input.upstreamFace, error);
  const down = downstreamFacePoints(input.downstreamFace, error);
  if (!up || !down) return { ok: false, limits };

  const base = input.baseElevation;
  const pool = input.poolElevation;
  const [toe, crest] = up;
  if (Math.abs(toe[1] - base) > TOL)
    error(
      "E_SEEP_FACE_TOE",
      `The upstream face starts at y = ${f2(toe[1])} m, not on the base (y = ${f2(base)} m). ${HAND_DRAWN}`,
    );
  if (pool <= base)
    error(
      "E_SEEP_POOL_BELOW_BASE",
      `The pool (${f2(pool)} m) is not above the base (${f2(base)} m): there is no seepage to construct.`,
    );
  if (pool > crest[1] + TOL)
    error(
      "E_SEEP_POOL_ABOVE_CREST",
      `The pool (${f2(pool)} m) is above the crest (${f2(crest[1])} m): the dam overtops and the method does not apply. ${HAND_DRAWN}`,
    );
  const xF = input.filterStartX;
  const downToe = down[down.length - 1];
  if (xF === undefined || xF === null)
    error("E_SEEP_NO_FILTER", `No toe filter is given: the basic parabola needs one. ${HAND_DRAWN}`);
  else if (xF >= downToe[0] - TOL)
    error(
      "E_SEEP_NO_FILTER",
      `The filter starts at x = ${f2(xF)} m, at or beyond the downstream toe (x = ${f2(downToe[0])} m): there is no filter under the dam. ${HAND_DRAWN}`,
    );
  if (limits.length) return { ok: false, limits };
  if (Math.abs(pool - crest[1]) <= TOL) warn("W_SEEP_NO_FREEBOARD", "The pool is at the crest: no freeboard.");

  const h = pool - base;
  const s = Math.sqrt(input.anisotropyRatio ?? 1);
  const xB = toe[0] + ((crest[0] - toe[0]) * h) / (crest[1] - toe[1]);
  const m = xB - toe[0];
  const xJ = xB + 0.3 * m;
  if ((xF as number) <= xJ + TOL) {
    error(
      "E_SEEP_FILTER_UPSTREAM",
      `The filter starts at x = ${f2(xF as number)} m, upstream of the end of the entry zone (x = ${f2(xJ)} m): move it downstream. ${HAND_DRAWN}`,
    );
    return { ok: false, limits };
  }
  const construction = buildConstruction(base, pool, h, m, xB, xF as number, s, toe, downToe, warn);

  const crossing = findEmergence(construction.waterLine, down);
  if (crossing) {
    error(
      "E_SEEP_EMERGES",
      `The phreatic line crosses the downstream face near (${f2(crossing[0])}, ${f2(crossing[1])}): lengthen the filter or draw the line.`,
    );
    return { ok: false, limits, construction };
  }

  const k = input.permeability;
  const perMetre = k * s * construction.y0; // √(kh·kv) = kh·√(kv/kh)
  const flow: SeepageFlow = { perMetre, total: input.crestLength === undefined ? null : perMetre * input.crestLength };
  return { ok: true, construction, flow, piping: pipingCheck(input, construction, h, limits), limits };
}

function pipingCheck(input: SeepageInput, c: SeepageConstruction, h: number, limits: SeepageLimit[]): PipingCheck {
  const iCr = criticalGradient(input.gammaSat, input.gammaW ?? 9.81);
  const net = input.flowNet;
  const exitGradient = net
    ? flowNetExitGradient(net.headLoss ?? h, net.equipotentialDrops, net.lastElementLength)
    : freeSurfaceGradientAt(c.parabola, c.vertex[0]);
  const required = input.requiredPipingFactor ?? 3;
  if (!net)
    limits.push({
      code: "W_SEEP_EXIT_INTO_FILTER",
      severity: "warning",
      message:
        "The exit gradient is taken where the top flow line enters the filter (i = 1 there): that exit is safe only if the filter meets filter criteria. Give a flow net (Nd, Δl) for an unprotected exit.",
    });
  const pipingFactor = iCr / exitGradient;
  return {
    criticalGradient: iCr,
    exitGradient,
    exitGradientMethod: net ? "flow-net" : "free-surface-at-filter",
    pipingFactor,
    required,
    adequate: pipingFactor >= required,
  };
}

function buildConstruction(
  base: number,
  pool: number,
  h: number,
  m: number,
  xB: number,
  xF: number,
  s: number,
  upToe: Point,
  downToe: Point,
  warn: (code: string, message: string) => void,
): SeepageConstruction {
  // Construct in the transformed section (x scaled by s = √(kv/kh)), then map x back.
  const xA = xB - 0.3 * m;
  const d = s * (xF - xA);
  const y0 = kozenyY0(h, d);
  const parabola: BasicParabola = { focusX: xF, baseY: base, y0, xScale: s };
  const xJ = xB + 0.3 * m;
  const yJ = parabolaHeightAt(parabola, xJ);
  const vertexX = xF + y0 / (2 * s);

  const entry = m > 0 ? entryCurve(xB, pool, xJ, yJ, -(s * s * m) / h, -(s * y0) / (yJ - base), warn) : [];
  const phreatic: Point[] = [...entry];
  const n = 40;
  const etaJ = yJ - base;
  for (let k = m > 0 ? 1 : 0; k <= n; k++) {
    const eta = etaJ * (1 - k / n);
    // x(η) inverts the parabola; uniform η puts more points where the line bends near the vertex.
    phreatic.push([xF + (y0 * y0 - eta * eta) / (2 * y0 * s), base + eta]);
  }
  phreatic[phreatic.length - 1] = [vertexX, base];

  const waterLine: Point[] = [];
  if (upToe[0] < xB - TOL) waterLine.push([upToe[0], pool]);
  waterLine.push(...phreatic);
  if (downToe[0] > vertexX + TOL) waterLine.push([downToe[0], base]);

  return {
    h,
    m,
    d,
    y0,
    pointA: [xA, pool],
    pointB: [xB, pool],
    entryEnd: [xJ, yJ],
    focus: [xF, base],
    vertex: [vertexX, base],
    parabola,
    phreatic,
    waterLine,
  };
}

/**
 * Entry from B normal to the face, joined tangentially to the parabola at J: a cubic Hermite on
 * [xB, xJ] with Fritsch–Carlson limiting of the end slopes so the line keeps falling.
 */
function entryCurve(
  x0: number,
  y0: number,
  x1: number,
  y1: number,
  slope0: number,
  slope1: number,
  warn: (code: string, message: string) => void,
): Point[] {
  const width = x1 - x0;
  const secant = (y1 - y0) / width;
  let d0 = slope0;
  let d1 = slope1;
  const a = d0 / secant;
  const b = d1 / secant;
  if (a * a + b * b > 9) {
    const t = 3 / Math.hypot(a, b);
    d0 *= t;
    d1 *= t;
    warn(
      "W_SEEP_ENTRY_LIMITED",
      "The entry curve was flattened to keep the line falling; it leaves B less steeply than normal to the face.",
    );
  }
  const points: Point[] = [];
  const n = 16;
  for (let k = 0; k <= n; k++) {
    const t = k / n;
    const h00 = 2 * t ** 3 - 3 * t ** 2 + 1;
    const h10 = t ** 3 - 2 * t ** 2 + t;
    const h01 = -2 * t ** 3 + 3 * t ** 2;
    const h11 = t ** 3 - t ** 2;
    points.push([x0 + t * width, h00 * y0 + h10 * width * d0 + h01 * y1 + h11 * width * d1]);
  }
  points[n] = [x1, y1];
  return points;
}

/** First point where the line rises above the face (both piecewise linear, so breakpoints suffice). */
function findEmergence(line: Point[], face: Point[]): Point | null {
  const lo = Math.max(line[0][0], face[0][0]);
  const hi = Math.min(line[line.length - 1][0], face[face.length - 1][0]);
  if (lo > hi) return null;
  const xs = [...line, ...face].map((p) => p[0]).filter((x) => x >= lo && x <= hi);
  xs.push(lo, hi);
  xs.sort((p, q) => p - q);
  for (const x of xs) {
    const yl = interpolate(line, x);
    if (yl - interpolate(face, x) > TOL) return [x, yl];
  }
  return null;
}

function interpolate(poly: Point[], x: number): number {
  if (x <= poly[0][0]) return poly[0][1];
  for (let i = 1; i < poly.length; i++) {
    const [x1, y1] = poly[i];
    if (x <= x1) {
      const [x0, y0] = poly[i - 1];
      return x1 === x0 ? Math.max(y0, y1) : y0 + ((y1 - y0) * (x - x0)) / (x1 - x0);
    }
  }
  return poly[poly.length - 1][1];
}
