/**
 * The phreatic surface of a generated section from the finite-element seepage solution
 * (docs/seepage.md), for what the basic parabola cannot do: a zoned fill (core and shells) or a
 * pervious foundation. The toe drain's base is held at atmospheric pressure; the base under the
 * foundation, and a foundation marked as much less permeable than the fill, pass no water
 * (`seepage.noFlow`). The
 * generated document then takes its water from the solution (`"water": {"source": "seepage"}`):
 * its pore pressures in the steady case and its phreatic surface as the pre-drawdown line.
 */
import { runSeepage, type ExitGradient, type SeepageIssue } from "@/lib/seepage";
import type { Material, Region } from "@/lib/stability";
import type { EmbankmentGeometry, XY } from "./embankment-geometry";
import type { EmbankmentParams } from "./parameters";

/** Codes of the basic parabola's refusals that the seepage solution answers instead. */
export const SOLVED_BY_SEEPAGE = new Set(["E_DESIGN_ZONED", "E_DESIGN_PERVIOUS_FOUNDATION"]);

export interface DesignSeepage {
  /** The solution's phreatic surface, x increasing. */
  phreatic: XY[];
  q: number;
  nodes: number;
  meshSize: number;
  /** The least factor against piping over the exits where the solution knows γsat, or null. */
  leastPipingFactor: ExitGradient | null;
  /** The seepage block and the materials with k, for the generated document. */
  block: { pools: { side: "left"; level: number }[]; drains: XY[][]; crestLength: number; noFlow: string[] };
  materials: Material[];
  warnings: SeepageIssue[];
}

export type DesignSeepageOutcome = { ok: true; seepage: DesignSeepage } | { ok: false; errors: SeepageIssue[] };

/** k and kv/kh of each material for the seepage run: the fill's from the parameters, the others' from the library. */
function withConductivity(p: EmbankmentParams, used: readonly Material[]): Material[] {
  return used.map((m) => {
    if (p.zoning.kind === "homogeneous" && m.id === p.zoning.fill)
      return { ...m, k: p.fillPermeability, kRatio: p.anisotropy } as unknown as Material;
    return m;
  });
}

export function solveDesignSeepage(
  p: EmbankmentParams,
  g: EmbankmentGeometry,
  poolLevel: number,
  used: readonly Material[],
  regions: readonly Region[],
): DesignSeepageOutcome {
  const materials = withConductivity(p, used);
  const block = {
    pools: [{ side: "left" as const, level: poolLevel }],
    drains: [[g.drain.start, g.downstreamToe]],
    crestLength: p.crestLength,
    // The base, and a foundation marked as much less permeable than the fill, pass no water.
    noFlow: p.foundationImpervious ? [p.baseMaterial, p.foundationMaterial] : [p.baseMaterial],
  };
  const run = runSeepage({
    version: 1,
    materials,
    regions: regions.map((r) => ({ material: r.material, points: r.points })),
    seepage: block,
  });
  if (!run.ok) return run;
  const s = run.solution;
  let least: ExitGradient | null = null;
  for (const e of s.exitGradients)
    if (e.pipingFactor !== null && (least === null || e.pipingFactor < (least.pipingFactor ?? Infinity))) least = e;
  return {
    ok: true,
    seepage: {
      phreatic: s.phreatic,
      q: s.q,
      nodes: s.mesh.nodes,
      meshSize: run.model.problem.meshSize,
      leastPipingFactor: least,
      block,
      materials,
      warnings: s.warnings,
    },
  };
}
