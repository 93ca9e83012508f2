/**
 * The run set-up form's flat values and their conversion to the engine-facing RunSetup.
 * Validation is the shared runSetupSchema (the engine's grid and radii schemas inside), with
 * issue paths mapped back onto the form's field names.
 */
import type { FieldErrors, Resolver } from "react-hook-form";
import { runSetupSchema, type RunSetup } from "@/lib/analysis/run-setup";
import type { LoadingConditionKey } from "@/lib/analysis/required-fs";
import type { AnalysisMethod, IntersliceFunction } from "@/lib/stability";

export interface RunSetupInput {
  condition: LoadingConditionKey;
  /** Key of the section's water condition; "" leaves it to the loading condition's usual water. */
  waterCondition: string;
  /** true: pore pressures from the condition's finite-element seepage solution. */
  fromSeepage: boolean;
  face: "upstream" | "downstream";
  methods: AnalysisMethod[];
  interslice: IntersliceFunction;
  search: "circles" | "surfaces";
  /** The drawn slip surface ([x, y] in m), or none. */
  surface?: [number, number][];
  slices: number;
  ordinaryForm: "classical" | "effective-weight";
  grid: { x1: number; y1: number; x2: number; y2: number; nx: number; ny: number };
  radiusMode: "tangent" | "range";
  tangentY1: number;
  tangentY2: number;
  r1: number;
  r2: number;
  radiusCount: number;
  refine: boolean;
  drawdownFrom?: number;
  drawdownTo?: number;
  drawdownMethod: "effective" | "staged";
  requiredFs: number;
}

const nanToUndefined = (v: number | undefined) => (v === undefined || Number.isNaN(v) ? undefined : v);

export function toRunSetup(v: RunSetupInput): unknown {
  return {
    condition: v.condition,
    waterCondition: v.waterCondition || undefined,
    ...(v.fromSeepage ? { waterSource: "seepage" } : {}),
    face: v.face,
    methods: Array.isArray(v.methods) ? v.methods : [v.methods].filter(Boolean),
    interslice: v.interslice ?? "half-sine",
    search: v.search === "surfaces" ? "surfaces" : undefined,
    surface: v.surface && v.surface.length > 0 ? v.surface : undefined,
    slices: v.slices,
    ordinaryForm: v.ordinaryForm,
    grid: v.grid,
    radii:
      v.radiusMode === "tangent"
        ? { tangentY1: v.tangentY1, tangentY2: v.tangentY2, n: v.radiusCount }
        : { r1: v.r1, r2: v.r2, n: v.radiusCount },
    refine: v.refine,
    drawdownFrom: nanToUndefined(v.drawdownFrom),
    drawdownTo: nanToUndefined(v.drawdownTo),
    drawdownMethod: v.drawdownMethod ?? "effective",
    requiredFs: v.requiredFs,
  };
}

export function fromRunSetup(s: RunSetup): RunSetupInput {
  const tangent = "tangentY1" in s.radii;
  return {
    condition: s.condition,
    waterCondition: s.waterCondition ?? "",
    fromSeepage: s.waterSource === "seepage",
    face: s.face,
    methods: s.methods,
    interslice: s.interslice ?? "half-sine",
    search: s.search ?? "circles",
    surface: s.surface,
    slices: s.slices,
    ordinaryForm: s.ordinaryForm,
    grid: s.grid,
    radiusMode: tangent ? "tangent" : "range",
    tangentY1: tangent ? (s.radii as { tangentY1: number }).tangentY1 : 0,
    tangentY2: tangent ? (s.radii as { tangentY2: number }).tangentY2 : 0,
    r1: tangent ? 0 : (s.radii as { r1: number }).r1,
    r2: tangent ? 0 : (s.radii as { r2: number }).r2,
    radiusCount: s.radii.n,
    refine: s.refine,
    drawdownFrom: s.drawdownFrom,
    drawdownTo: s.drawdownTo,
    drawdownMethod: s.drawdownMethod ?? "effective",
    requiredFs: s.requiredFs,
  };
}

const RADII_FIELDS: Record<string, string> = {
  tangentY1: "tangentY1",
  tangentY2: "tangentY2",
  r1: "r1",
  r2: "r2",
  n: "radiusCount",
};

function formPath(path: PropertyKey[]): string {
  if (path[0] === "radii") return RADII_FIELDS[String(path[1])] ?? "radiusCount";
  if (path[0] === "grid" && path.length === 1) return "grid.root";
  return path.map(String).join(".");
}

/** react-hook-form resolver over the shared schema. */
export const runSetupResolver: Resolver<RunSetupInput, unknown, RunSetup> = async (values) => {
  const parsed = runSetupSchema.safeParse(toRunSetup(values));
  if (parsed.success) return { values: parsed.data, errors: {} };
  const errors: Record<string, unknown> = {};
  for (const issue of parsed.error.issues) {
    const keys = formPath(issue.path).split(".");
    let node = errors;
    keys.forEach((k, i) => {
      if (i === keys.length - 1) node[k] ??= { type: issue.code, message: issue.message };
      else node = (node[k] ??= {}) as Record<string, unknown>;
    });
  }
  return { values: {}, errors: errors as FieldErrors<RunSetupInput> };
};
