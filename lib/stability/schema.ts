/**
 * The section document (docs/engine-io.md, version 1) as zod schemas. The schemas check the
 * shape only (keys, types, finite numbers); engineering limits such as φ' in [0°, 60°)
 * are checked in validate.ts so their messages can say where and how to fix them.
 * Units: m, kPa, kN/m³, degrees.
 */
import { z } from "zod";

/** Largest coordinate magnitude accepted (m): keeps every product in the slice loop finite. */
export const MAX_COORDINATE = 1e6;
/** Largest strength or pressure accepted (kPa); values above 200–500 kPa already draw a warning. */
export const MAX_PRESSURE = 1e5;

const coordinate = z.number().min(-MAX_COORDINATE).max(MAX_COORDINATE);
const pressure = z.number().min(-MAX_PRESSURE).max(MAX_PRESSURE);
const unitWeight = z.number().min(-1000).max(1000);

/** A point [x, y] in metres (y is elevation). */
export const pointSchema = z.tuple([coordinate, coordinate]);

const materialCommon = {
  id: z.string().min(1, "material id must not be empty"),
  name: z.string().optional(),
  color: z.string().optional(),
};

/** Effective-stress Mohr–Coulomb material: c' (kPa), φ' (°), γ and γsat (kN/m³). */
export const mohrCoulombMaterialSchema = z.object({
  ...materialCommon,
  model: z.literal("mohr-coulomb"),
  gamma: unitWeight,
  gammaSat: unitWeight.optional(),
  c: pressure,
  phi: z.number().min(-360).max(360),
  /** Optional undrained strength used by the end-of-construction case (kPa at suDatum). */
  su: pressure.optional(),
  suGradient: z.number().min(-1e4).max(1e4).optional(),
  suDatum: coordinate.optional(),
  /** Drains during construction or drawdown: keeps effective strength in those cases. */
  freeDraining: z.boolean().optional(),
  /**
   * Total-stress (R) envelope from consolidated-undrained tests, for a staged drawdown
   * (docs/engine.md §7(b)): intercept cR (kPa) and angle phiR (°), plotted against the effective
   * consolidation stress σ'3c. Needed by low-permeability materials in a staged drawdown.
   */
  cR: pressure.optional(),
  phiR: z.number().min(-360).max(360).optional(),
});

/** Undrained (φ = 0) material: su (kPa) at suDatum (m), rising by suGradient (kPa/m) with depth. */
export const undrainedMaterialSchema = z.object({
  ...materialCommon,
  model: z.literal("undrained"),
  gamma: unitWeight,
  gammaSat: unitWeight.optional(),
  su: pressure,
  suGradient: z.number().min(-1e4).max(1e4).optional(),
  suDatum: coordinate.optional(),
  freeDraining: z.boolean().optional(),
});

/** Impenetrable material: no slip surface may enter it; γ only counts if it rides on a slip mass. */
export const impenetrableMaterialSchema = z.object({
  ...materialCommon,
  model: z.literal("impenetrable"),
  gamma: unitWeight.optional(),
});

export const materialSchema = z.discriminatedUnion("model", [
  mohrCoulombMaterialSchema,
  undrainedMaterialSchema,
  impenetrableMaterialSchema,
]);

/** A closed polygon (first point not repeated) made of one material. */
export const regionSchema = z.object({
  material: z.string(),
  points: z.array(pointSchema).min(3, "a region needs at least 3 points"),
  name: z.string().optional(),
});

/** Water: a phreatic line (x increasing), or a pore-pressure ratio ru, or neither (dry). */
export const waterSchema = z.object({
  gammaW: unitWeight.optional(),
  phreatic: z.array(pointSchema).min(2, "a phreatic line needs at least 2 points").optional(),
  ru: z.number().min(-10).max(10).optional(),
  /** Multiply phreatic pore pressure by cos²θ of the line's slope (seepage parallel to it), docs/engine.md §3. */
  cos2Correction: z.boolean().optional(),
  /** Pore pressures from a seepage solution (docs/engine.md §3(d)); `phreatic` is then the solution's. */
  source: z.literal("seepage").optional(),
});

/** A vertical pressure q (kPa) on the ground between x1 and x2 (m). */
export const surchargeSchema = z.object({ x1: coordinate, x2: coordinate, q: pressure });

export const loadsSchema = z.object({
  surcharges: z.array(surchargeSchema).optional(),
  /** Horizontal pseudo-static coefficient, acting out of the slope. */
  kh: z.number().min(-10).max(10).optional(),
});

/** Grid of trial centres, corners (x1, y1) and (x2, y2), nx × ny points. */
export const gridSchema = z.object({
  x1: coordinate,
  y1: coordinate,
  x2: coordinate,
  y2: coordinate,
  nx: z.number().int().min(1),
  ny: z.number().int().min(1),
});

export const tangentRadiiSchema = z.object({
  tangentY1: coordinate,
  tangentY2: coordinate,
  n: z.number().int().min(1),
});
export const rangeRadiiSchema = z.object({ r1: coordinate, r2: coordinate, n: z.number().int().min(1) });
/** Radii either by tangent elevations (R = yc − yt) or by a radius range. */
export const radiiSchema = z.union([tangentRadiiSchema, rangeRadiiSchema]);

/** How a drawdown is analysed: "effective" (docs/engine.md §7(a), the default) or "staged" (§7(b)). */
export const drawdownMethodSchema = z.enum(["effective", "staged"]);
/** Which staged procedure: Duncan, Wright & Wong (1990) three stages (default) or the USACE (1970) two stages. */
export const stagedVariantSchema = z.enum(["three-stage", "usace-two-stage"]);

/**
 * Rapid drawdown: pool from `from` down to `to` (m). `method` "effective" is the
 * effective-stress method (docs/engine.md §7(a)); "staged" the staged total-stress method (§7(b)),
 * whose variant `stagedVariant` picks (three-stage by default).
 */
export const drawdownSchema = z.object({
  from: coordinate,
  to: coordinate,
  method: drawdownMethodSchema.optional(),
  stagedVariant: stagedVariantSchema.optional(),
});

/** The methods that assume a circular slip surface (moment equilibrium about its centre). */
export const methodSchema = z.enum(["bishop", "fellenius"]);
/** Methods that satisfy force and moment equilibrium on a slip surface of any shape (docs/engine.md §11). */
export const rigorousMethodSchema = z.enum(["spencer", "morgenstern-price"]);
/** Any method a run may ask for. */
export const analysisMethodSchema = z.enum(["bishop", "fellenius", "spencer", "morgenstern-price"]);
/** The Morgenstern–Price interslice function f(x) (Spencer's method is f = 1). */
export const intersliceSchema = z.enum(["half-sine", "constant"]);
/** Which slip surfaces a search tries: circles on the grid (default) or surfaces of any shape. */
export const searchKindSchema = z.enum(["circles", "surfaces"]);
export const loadCaseSchema = z.enum(["steady", "drawdown", "undrained"]);
export const directionSchema = z.enum(["auto", "left", "right"]);
export const ordinaryFormSchema = z.enum(["classical", "effective-weight"]);

/** Analysis settings; every key is optional here and completed by resolveAnalysis(). */
export const analysisSchema = z.object({
  case: loadCaseSchema.optional(),
  methods: z.array(analysisMethodSchema).min(1, "choose at least one method").optional(),
  /** Morgenstern–Price interslice function (default half-sine). */
  interslice: intersliceSchema.optional(),
  /** "circles" (the grid, default) or "surfaces" (non-circular search, docs/engine.md §12). */
  search: searchKindSchema.optional(),
  slices: z.number().int().min(1).max(500).optional(),
  direction: directionSchema.optional(),
  grid: gridSchema.optional(),
  radii: radiiSchema.optional(),
  drawdown: drawdownSchema.optional(),
  ordinaryForm: ordinaryFormSchema.optional(),
  /** Refine around the best centres with finer nested grids (docs/engine.md §5). */
  refine: z.boolean().optional(),
  /** How many of the lowest circles each method keeps (default 10). */
  lowestCount: z.number().int().min(0).max(1000).optional(),
  /** Circles whose slip mass is thinner than this (m) are skipped; 0 = off. */
  minDepth: z.number().min(0).max(MAX_COORDINATE).optional(),
});

const documentShape = {
  // The second edition only adds optional keys (docs/engine-io.md), so a document may say either.
  version: z.union([z.literal(1), z.literal(2)], { error: "version must be 1 or 2" }),
  regions: z.array(regionSchema).min(1, "at least one region is needed"),
  water: waterSchema.optional(),
  loads: loadsSchema.optional(),
  analysis: analysisSchema.optional(),
};

/** The whole section document, version 1. `analysis` is optional for a stored section. */
export const sectionDocumentSchema = z.object({
  ...documentShape,
  materials: z.array(materialSchema).min(1, "at least one material is needed"),
});

/**
 * The same document with γ optional: validateSection parses with it so that a missing unit
 * weight is reported together with every other problem, not alone.
 */
export const lenientSectionDocumentSchema = z.object({
  ...documentShape,
  materials: z
    .array(
      z.discriminatedUnion("model", [
        mohrCoulombMaterialSchema.extend({ gamma: unitWeight.optional() }),
        undrainedMaterialSchema.extend({ gamma: unitWeight.optional() }),
        impenetrableMaterialSchema,
      ]),
    )
    .min(1, "at least one material is needed"),
});

export type Point = z.infer<typeof pointSchema>;
export type Material = z.infer<typeof materialSchema>;
export type MohrCoulombMaterial = z.infer<typeof mohrCoulombMaterialSchema>;
export type UndrainedMaterial = z.infer<typeof undrainedMaterialSchema>;
export type ImpenetrableMaterial = z.infer<typeof impenetrableMaterialSchema>;
export type Region = z.infer<typeof regionSchema>;
export type Water = z.infer<typeof waterSchema>;
export type Surcharge = z.infer<typeof surchargeSchema>;
export type Loads = z.infer<typeof loadsSchema>;
export type Grid = z.infer<typeof gridSchema>;
export type Radii = z.infer<typeof radiiSchema>;
export type Drawdown = z.infer<typeof drawdownSchema>;
export type DrawdownMethod = z.infer<typeof drawdownMethodSchema>;
export type StagedVariant = z.infer<typeof stagedVariantSchema>;
export type Method = z.infer<typeof methodSchema>;
export type RigorousMethod = z.infer<typeof rigorousMethodSchema>;
export type AnalysisMethod = z.infer<typeof analysisMethodSchema>;
export type IntersliceFunction = z.infer<typeof intersliceSchema>;
export type SearchKind = z.infer<typeof searchKindSchema>;
export type LoadCase = z.infer<typeof loadCaseSchema>;
export type Direction = z.infer<typeof directionSchema>;
export type OrdinaryForm = z.infer<typeof ordinaryFormSchema>;
export type Analysis = z.infer<typeof analysisSchema>;
export type SectionDocument = z.infer<typeof sectionDocumentSchema>;
export type LenientSectionDocument = z.infer<typeof lenientSectionDocumentSchema>;
