/**
 * Domain types of the seepage solver (docs/seepage.md). Units: m, m/s, kPa, m³/s per metre of
 * section; x to the right, y up (elevation).
 */

export type Point = [number, number];

/** A problem found in the input, with where it is (`seepage.drains[0][1]`) and what to do. */
export interface SeepageIssue {
  code: string;
  path: string;
  message: string;
}

/** A conductivity-bearing material as the solver sees it. */
export interface FlowMaterial {
  id: string;
  /** false for impenetrable material: it passes no water and is left out of the flow domain. */
  pervious: boolean;
  /** Horizontal and vertical saturated conductivity (m/s); 0 when not pervious. */
  kx: number;
  ky: number;
  /** Saturated unit weight (kN/m³) for the critical gradient, or null when the document gives none. */
  gammaSat: number | null;
}

export interface FlowRegion {
  material: number;
  points: Point[];
}

export interface Pool {
  side: "left" | "right";
  level: number;
}

/** Everything the solver needs, checked and with defaults filled in. */
export interface SeepageProblem {
  materials: FlowMaterial[];
  regions: FlowRegion[];
  pools: Pool[];
  drains: Point[][];
  meshSize: number;
  probes: Point[];
  gammaW: number;
  crestLength: number | null;
  /** Number of equal head drops for the drawn flow net. */
  headDrops: number;
  maxNodes: number;
}

/** A triangular mesh: node coordinates, three nodes per triangle (counter-clockwise), region per triangle. */
export interface TriMesh {
  x: Float64Array;
  y: Float64Array;
  tri: Int32Array;
  region: Int32Array;
}

export interface ProbeResult {
  x: number;
  y: number;
  head: number;
  pressure: number;
}

/** The largest gradient on one stretch where water leaves the section. */
export interface ExitGradient {
  x: number;
  y: number;
  i: number;
  /** The stretch of boundary (from, to) over which water leaves. */
  from: Point;
  to: Point;
  material: string;
  /** γ'/γw of the material at the exit, or null without a saturated unit weight. */
  iCritical: number | null;
  /** iCritical / i, or null. */
  pipingFactor: number | null;
}

/** Water pressure on the underside of an impenetrable region (a structure) where it rests on pervious soil. */
export interface Uplift {
  region: number;
  /** [x, y, pressure kPa] along the underside, x increasing. */
  points: [number, number, number][];
  /** Resultant vertical force per metre of section (kN/m). */
  force: number;
}

export interface FlowNet {
  headDrops: number;
  /** Total head lost across the section (m): highest minus lowest prescribed head. */
  deltaH: number;
  /** √(kh·kv) of the material through which most water moves (m/s). */
  kRef: number;
  /** The material kRef belongs to. */
  kRefMaterial: string;
  /** Whole flow channels whose cells come nearest to square: round(q·Nd / (kRef·ΔH)), at most 40. */
  flowChannels: number;
  /** Channels the flow lines split the flow into: flowChannels, but at least 4. */
  drawnChannels: number;
  /** The practitioner's estimate kRef·ΔH·Nf/Nd (m³/s per metre). */
  qFlowNet: number;
  equipotentials: { head: number; lines: Point[][] }[];
  flowLines: Point[][];
}

export interface SeepageSolution {
  ok: true;
  q: number;
  qIn: number;
  qOut: number;
  /** q times the crest length (m³/s) when the document gives one. */
  qTotal: number | null;
  phreatic: Point[];
  probes: ProbeResult[];
  exitGradients: ExitGradient[];
  uplift: Uplift[];
  flowNet: FlowNet;
  mesh: { nodes: number; elements: number };
  iterations: { freeSurface: number; solver: number; converged: boolean };
  warnings: SeepageIssue[];
  cautions: string[];
}

export interface SeepageFailure {
  ok: false;
  errors: SeepageIssue[];
}
