/**
 * Fills in the analysis defaults so every caller works with a complete analysis:
 * 50 slices, direction auto, both methods, steady case, classical ordinary method,
 * 10 lowest circles kept, no refinement, no minimum depth.
 */
import type {
  Analysis,
  AnalysisMethod,
  Direction,
  Drawdown,
  Grid,
  IntersliceFunction,
  LoadCase,
  Method,
  OrdinaryForm,
  Radii,
  RigorousMethod,
  SearchKind,
} from "./schema";

export const DEFAULT_SLICES = 50;
export const DEFAULT_GAMMA_W = 9.81; // kN/m³
export const DEFAULT_LOWEST_COUNT = 10;
/** The most slices a user may ask for (analysis.slices). */
export const MAX_SLICES = 500;
/**
 * Slice breaks closer than this fraction of the nominal slice width (slip mass width / slices)
 * are merged (docs/engine.md §3), so a survey of thousands of vertices cuts no more slices
 * than an outline of a few: at most slices·(1 + 1/MERGE_FRACTION) + 1 per mass.
 */
export const MERGE_FRACTION = 0.25;
/** Capacity of the per-mass slice buffers: the bound above at MAX_SLICES, plus a margin. */
export const SLICE_CAPACITY = Math.ceil(MAX_SLICES * (1 + 1 / MERGE_FRACTION)) + 8;

/** An analysis with every default applied; grid and radii stay optional (one-circle runs need neither). */
export interface ResolvedAnalysis {
  case: LoadCase;
  /** The circular methods asked for (both when analysis.methods is not given). */
  methods: Method[];
  /** Spencer and Morgenstern–Price, when asked for (docs/engine.md §11). */
  rigorous: RigorousMethod[];
  /** Every method asked for, in the order given. */
  allMethods: AnalysisMethod[];
  interslice: IntersliceFunction;
  search: SearchKind;
  slices: number;
  direction: Direction;
  ordinaryForm: OrdinaryForm;
  refine: boolean;
  lowestCount: number;
  minDepth: number;
  grid?: Grid;
  radii?: Radii;
  drawdown?: Drawdown;
}

/** Returns a complete analysis from a partial one (or none), without changing the input. */
export function resolveAnalysis(analysis?: Analysis | null): ResolvedAnalysis {
  const a = analysis ?? {};
  const allMethods: AnalysisMethod[] =
    a.methods && a.methods.length > 0 ? [...new Set(a.methods)] : ["bishop", "fellenius"];
  const methods = allMethods.filter((m): m is Method => m === "bishop" || m === "fellenius");
  const rigorous = allMethods.filter((m): m is RigorousMethod => m === "spencer" || m === "morgenstern-price");
  const out: ResolvedAnalysis = {
    case: a.case ?? "steady",
    methods,
    rigorous,
    allMethods,
    interslice: a.interslice ?? "half-sine",
    search: a.search ?? "circles",
    slices: a.slices ?? DEFAULT_SLICES,
    direction: a.direction ?? "auto",
    ordinaryForm: a.ordinaryForm ?? "classical",
    refine: a.refine ?? false,
    lowestCount: a.lowestCount ?? DEFAULT_LOWEST_COUNT,
    minDepth: a.minDepth ?? 0,
  };
  if (a.grid) out.grid = { ...a.grid };
  if (a.radii) out.radii = { ...a.radii };
  if (a.drawdown) out.drawdown = { ...a.drawdown };
  return out;
}
