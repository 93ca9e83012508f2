/** Domain types of stability runs on seepage water (docs/seepage.md §6). */
import type { Pool } from "@/lib/seepage";

/** What a run on seepage water keeps of its solution, for the run page and the review. */
export interface SeepageSummary {
  /** Flow through the section, in and out (m³/s per metre). */
  q: number;
  qIn: number;
  qOut: number;
  /** Target element size (m) and the mesh it gave. */
  meshSize: number;
  nodes: number;
  elements: number;
  freeSurfaceRounds: number;
  converged: boolean;
  pools: Pool[];
  /** The water line the engine was handed (solution's phreatic surface and pools), for drawing the run. */
  waterLine: [number, number][];
  warnings: { code: string; message: string }[];
}
