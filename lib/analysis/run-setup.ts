/**
 * The analysis set-up a user fills in, and how it becomes the engine's analysis block.
 * One zod schema serves the form (client) and the run route (server).
 */
import { z } from "zod";
import {
  analysisMethodSchema,
  gridSchema,
  intersliceSchema,
  pointSchema,
  searchKindSchema,
  radiiSchema,
  type Analysis,
  type SectionDocument,
} from "@/lib/stability";
import { directionForFace } from "./face";
import { LOADING_CONDITION_KEYS, loadingCondition, type LoadingConditionKey } from "./required-fs";
import { MAX_SEARCH_CIRCLES, searchCircleCount, tooManyCirclesMessage } from "@/lib/runs/record/limits";
import {
  findWaterCondition,
  pickWaterCondition,
  withWater,
  type WaterCondition,
} from "@/lib/sections/water-conditions";
import { seepageWaterBlock } from "@/lib/seepage-stability/attach";

/** More bends than a hand-drawn surface along layers needs; keeps a stored set-up small. */
export const MAX_SURFACE_POINTS = 40;

export const runSetupSchema = z
  .object({
    condition: z.enum(LOADING_CONDITION_KEYS, { error: "Choose a loading condition." }),
    /** Key of the section's water condition analysed; absent: the loading condition's usual water. */
    waterCondition: z.string().max(40).optional(),
    /**
     * Where the pore pressures come from: the condition's own water (absent), or the finite-element
     * seepage solution of that condition (docs/seepage.md §6; its pools come from the condition).
     */
    waterSource: z.enum(["condition", "seepage"]).optional(),
    face: z.enum(["upstream", "downstream"], { error: "Choose the face to check." }),
    methods: z
      .array(analysisMethodSchema)
      .min(1, "Choose at least one method.")
      .refine(
        // An empty list already has its own message above.
        (ms) => ms.length === 0 || ms.includes("bishop") || ms.includes("fellenius"),
        "Keep Bishop's simplified or the ordinary method: the circle search runs on them.",
      ),
    /** Circles on the grid (absent), or then surfaces of any shape for the rigorous methods. */
    search: searchKindSchema.optional(),
    /** Morgenstern–Price's interslice function; absent: half-sine (docs/engine-io.md). */
    interslice: intersliceSchema.optional(),
    /**
     * One slip surface the user drew, from ground to ground ([x, y] in m): every method asked for is
     * also reported on it. The engine judges whether it is admissible (lib/runs/record/rigorous-part.ts).
     */
    surface: z
      .array(pointSchema)
      .min(2, "A slip surface needs at least two points.")
      .max(MAX_SURFACE_POINTS, `A drawn slip surface may have at most ${MAX_SURFACE_POINTS} points.`)
      .optional(),
    slices: z
      .number({ error: "Enter a number of slices." })
      .int("Whole slices only.")
      .min(10, "At least 10 slices.")
      .max(500, "At most 500 slices."),
    grid: gridSchema
      .refine((g) => g.x2 > g.x1 && g.y2 > g.y1, "The grid's second corner must be right of and above the first.")
      .refine(
        (g) => g.nx >= 2 && g.ny >= 2 && g.nx * g.ny <= 10000,
        "Use 2 to 100 points each way (at most 10,000 centres).",
      ),
    radii: radiiSchema,
    refine: z.boolean(),
    drawdownFrom: z.number().optional(),
    drawdownTo: z.number().optional(),
    /**
     * effective: pore pressures held (docs/engine.md §7(a)); staged: Duncan–Wright–Wong total-stress stages (§7(b)).
     */
    drawdownMethod: z.enum(["effective", "staged"]).default("effective"),
    requiredFs: z
      .number({ error: "Enter the required factor of safety." })
      .min(1, "At least 1.0.")
      .max(5, "At most 5."),
    ordinaryForm: z.enum(["classical", "effective-weight"]).default("classical"),
  })
  .superRefine((v, ctx) => {
    if (v.search === "surfaces" && !v.methods.some((m) => m === "spencer" || m === "morgenstern-price"))
      ctx.addIssue({
        code: "custom",
        path: ["search"],
        message: "A search of surfaces of any shape runs Spencer's or the Morgenstern–Price method: tick one.",
      });
    if (loadingCondition(v.condition).engineCase === "drawdown") {
      if (v.drawdownFrom === undefined)
        ctx.addIssue({ code: "custom", path: ["drawdownFrom"], message: "Enter the pool level before drawdown (m)." });
      if (v.drawdownTo === undefined)
        ctx.addIssue({ code: "custom", path: ["drawdownTo"], message: "Enter the pool level after drawdown (m)." });
      if (v.drawdownFrom !== undefined && v.drawdownTo !== undefined && v.drawdownTo > v.drawdownFrom) {
        ctx.addIssue({
          code: "custom",
          path: ["drawdownTo"],
          message: "The pool after drawdown must not be above the pool before it.",
        });
      }
    }
    const n = v.radii.n;
    if (!Number.isInteger(n) || n < 1 || n > 100)
      ctx.addIssue({ code: "custom", path: ["radii", "n"], message: "Use 1 to 100 radii per centre." });
    else if (searchCircleCount(v.grid, v.radii) > MAX_SEARCH_CIRCLES)
      ctx.addIssue({
        code: "custom",
        path: ["radii", "n"],
        message: tooManyCirclesMessage(searchCircleCount(v.grid, v.radii)),
      });
  });

export type RunSetup = z.infer<typeof runSetupSchema>;

/** The engine's analysis block for a set-up on a given section. */
export function toAnalysis(doc: SectionDocument, setup: RunSetup): Analysis {
  const condition = loadingCondition(setup.condition as LoadingConditionKey);
  const analysis: Analysis = {
    case: condition.engineCase,
    methods: setup.methods,
    slices: setup.slices,
    direction: directionForFace(doc, setup.face),
    grid: setup.grid,
    radii: setup.radii,
    refine: setup.refine,
    ordinaryForm: setup.ordinaryForm,
  };
  if (setup.methods.includes("morgenstern-price")) analysis.interslice = setup.interslice ?? "half-sine";
  if (setup.search === "surfaces") analysis.search = "surfaces";
  if (condition.engineCase === "drawdown") {
    analysis.drawdown = { from: setup.drawdownFrom!, to: setup.drawdownTo!, method: setup.drawdownMethod };
  }
  return analysis;
}

/** Thrown when a set-up names a water condition the section version does not have. */
export class UnknownWaterConditionError extends Error {
  constructor(readonly id: string) {
    super(`The section has no water condition “${id}”. Reload the run form and choose one of its waters.`);
    this.name = "UnknownWaterConditionError";
  }
}

/** The section's water condition a set-up analyses: the one it names, else its loading condition's usual one. */
export function waterConditionForRun(section: SectionDocument, setup: Pick<RunSetup, "condition" | "waterCondition">) {
  if (setup.waterCondition === undefined) return pickWaterCondition(section, setup.condition);
  const found = findWaterCondition(section, setup.waterCondition);
  if (!found) throw new UnknownWaterConditionError(setup.waterCondition);
  return found;
}

/**
 * The document a run analyses: the section version with the chosen condition's water as the
 * engine's one water block (or, for water from seepage, the block that asks for the solution: the
 * section must then carry its seepage block, lib/seepage-stability/attach.ts), and the run's analysis block.
 */
export function documentForRun(section: SectionDocument, setup: RunSetup, water?: WaterCondition): SectionDocument {
  const condition = water ?? waterConditionForRun(section, setup);
  const block = setup.waterSource === "seepage" ? seepageWaterBlock(condition.water?.gammaW) : condition.water;
  // The face's direction is read from the whole section: an end-of-construction water has no pool to tell it.
  return { ...withWater(section, block), analysis: toAnalysis(section, setup) };
}
