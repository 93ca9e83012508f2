/**
 * The phreatic line of the generated section for one pool: the engine's Kozeny–Casagrande
 * construction (docs/engine.md §6) for a homogeneous fill on an impervious foundation with the toe
 * drain as its filter, or the designer's hand-drawn line. Outside the method's limits (a zoned
 * dam, a pervious foundation, a berm under water, a line that emerges on the face) it returns
 * the reasons and asks for a hand-drawn line rather than guessing one.
 */
import { computeFilterSeepage, type SeepageLimit, type SeepageResult } from "@/lib/stability";
import type { EmbankmentGeometry, XY } from "./embankment-geometry";
import type { EmbankmentParams } from "./parameters";
import { assessPipingExits, type PipingAtExits } from "./piping-exit";
import type { DesignSeepage } from "./seepage-solution";

export type PoolName = "normal" | "flood";

export const HAND_LINE_REQUEST = "Draw the phreatic line by hand for this pool (Edit the line by hand).";

export interface PhreaticOutcome {
  pool: PoolName;
  poolLevel: number;
  /**
   * "constructed" by the method, "hand-drawn" by the designer, "seepage-solution" from the finite-element
   * solution (zoned fills, pervious foundations: lib/design/seepage-solution.ts), or "none".
   */
  source: "constructed" | "hand-drawn" | "seepage-solution" | "none";
  /** The line across the whole section (x from 0 to xmax), for the document; null when there is none. */
  line: XY[] | null;
  /** The construction's result (flow, piping, construction values), when the method applied. */
  seepage: SeepageResult | null;
  /** Why the method does not apply, or its warnings. */
  limits: SeepageLimit[];
  /** Piping where the line shows water leaving the fill (lib/design/piping-exit.ts); null without a line. */
  piping: PipingAtExits | null;
  /** The finite-element solution the line came from (source "seepage-solution"). */
  solution?: DesignSeepage;
}

/** γsat of a material, for the critical gradient (kN/m³); 20 when the material has none. */
export function saturatedUnitWeight(m: { model: string; gamma?: number; gammaSat?: number } | undefined): number {
  if (!m || m.model === "impenetrable") return 20;
  return m.gammaSat ?? m.gamma ?? 20;
}

/** Rounds to the millimetre and drops points that do not move right, for a tidy document. */
function tidy(points: readonly XY[]): XY[] {
  const out: XY[] = [];
  for (const [x, y] of points) {
    const p: XY = [Math.round(x * 1000) / 1000, Math.round(y * 1000) / 1000];
    if (out.length === 0 || p[0] > out[out.length - 1][0]) out.push(p);
  }
  return out;
}

/** Holds a line level out to both sides of the section, so it spans x = 0 … xmax. */
export function spanSection(line: readonly XY[], xmax: number): XY[] {
  const out = tidy(line).filter(([x]) => x >= 0 && x <= xmax);
  if (out.length === 0) return [];
  if (out[0][0] > 0) out.unshift([0, out[0][1]]);
  if (out[out.length - 1][0] < xmax) out.push([xmax, out[out.length - 1][1]]);
  return out;
}

function methodLimits(p: EmbankmentParams): SeepageLimit[] {
  const limits: SeepageLimit[] = [];
  if (p.zoning.kind === "zoned") {
    limits.push({
      code: "E_DESIGN_ZONED",
      severity: "error",
      message:
        "A zoned dam (core and shells) is outside the basic parabola's limits: it assumes one homogeneous fill. " +
        HAND_LINE_REQUEST,
    });
  }
  if (!p.foundationImpervious) {
    limits.push({
      code: "E_DESIGN_PERVIOUS_FOUNDATION",
      severity: "error",
      message:
        "The foundation is marked as not much less permeable than the fill: the method needs an impervious base " +
        `under the fill. ${HAND_LINE_REQUEST}`,
    });
  }
  return limits;
}

/** The upstream face as the seepage construction sees it: a berm above the pool leaves the wetted face plane. */
function wettedUpstreamFace(
  g: EmbankmentGeometry,
  p: EmbankmentParams,
  pool: number,
): { toe: XY; crest: XY } | { points: XY[] } {
  if (!p.upstreamBerm) return { toe: g.upstreamToe, crest: g.upstreamCrest };
  if (p.upstreamBerm.elevation >= pool) return { toe: g.upstreamToe, crest: g.upstreamFace[1] };
  return { points: g.upstreamFace };
}

/** Piping at the exits a line shows, for any line of the generated section. */
export function pipingOnLine(p: EmbankmentParams, g: EmbankmentGeometry, line: readonly XY[], gammaSat: number) {
  return assessPipingExits({
    line,
    downstreamFace: g.downstreamFace,
    drainTop: g.drain.top,
    gammaSat,
    required: p.requiredPipingFactor,
  });
}

export function phreaticForPool(
  p: EmbankmentParams,
  g: EmbankmentGeometry,
  pool: PoolName,
  fillGammaSat: number,
): PhreaticOutcome {
  const poolLevel = pool === "normal" ? p.normalPool : p.floodPool;
  const exits = (line: readonly XY[]): PipingAtExits => pipingOnLine(p, g, line, fillGammaSat);
  const hand = p.handLines[pool];
  if (hand) {
    const line = spanSection(hand, g.xmax);
    return { pool, poolLevel, source: "hand-drawn", line, seepage: null, limits: [], piping: exits(line) };
  }

  const refused = methodLimits(p);
  if (refused.length > 0)
    return { pool, poolLevel, source: "none", line: null, seepage: null, limits: refused, piping: null };
  const seepage = computeFilterSeepage({
    baseElevation: p.foundationTop,
    poolElevation: poolLevel,
    upstreamFace: wettedUpstreamFace(g, p, poolLevel),
    filterStartX: g.drain.start[0],
    downstreamFace: { points: g.downstreamFace },
    permeability: p.fillPermeability,
    anisotropyRatio: p.anisotropy,
    gammaSat: fillGammaSat,
    crestLength: p.crestLength,
    requiredPipingFactor: p.requiredPipingFactor,
  });
  if (!seepage.ok) {
    const limits = seepage.limits.map((l) =>
      l.severity === "error" && !l.message.includes("by hand") && !l.message.includes("draw the line")
        ? { ...l, message: `${l.message} ${HAND_LINE_REQUEST}` }
        : l,
    );
    // A line that comes out on the face is not drawn, but where it comes out is still worth checking.
    const piping = seepage.construction ? exits(spanSection(seepage.construction.waterLine, g.xmax)) : null;
    return { pool, poolLevel, source: "none", line: null, seepage, limits, piping };
  }
  const line = spanSection(seepage.construction.waterLine, g.xmax);
  return { pool, poolLevel, source: "constructed", line, seepage, limits: seepage.limits, piping: exits(line) };
}
