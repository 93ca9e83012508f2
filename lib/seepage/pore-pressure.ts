/**
 * What a stability run with `"water": {"source": "seepage"}` takes from a seepage solution
 * (docs/seepage.md §6): the pore pressure at any point (for each slice base), the ponded water
 * from the pools, and the phreatic surface as the pre-drawdown line of a drawdown run.
 */
import { headAt } from "./results";
import type { SeepageModel } from "./solve";
import type { Point, Pool } from "./types";

export interface SeepageWater {
  /** Pore pressure (kPa) at (x, y): γw·(h − y); suction counts as zero; zero outside the pervious regions. */
  porePressure(x: number, y: number): number;
  /** The solution's phreatic surface, x increasing (m): the pre-drawdown line of a drawdown run. */
  phreatic: Point[];
  /** Free water standing against the section (its weight and thrust load the slope). */
  pools: Pool[];
  gammaW: number;
}

export function seepageWater(model: SeepageModel, phreatic: Point[]): SeepageWater {
  const { field, problem } = model;
  return {
    porePressure(x, y) {
      const h = headAt(field, x, y);
      if (h === null || !Number.isFinite(h)) return 0;
      return Math.max(0, field.gammaW * (h - y));
    },
    phreatic: phreatic.map(([x, y]) => [x, y]),
    pools: problem.pools.map((p) => ({ ...p })),
    gammaW: field.gammaW,
  };
}
