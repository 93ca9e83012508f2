/**
 * The parametric embankment a designer describes by its dimensions (docs/engine.md §9). One zod
 * schema serves the parameters form in the browser and every design route on the server.
 * Units: metres (elevations and lengths), H:V ratios, m/s for permeability.
 * Reservoir on the left: the upstream face is the left face of the generated section.
 */
import { z } from "zod";

const metres = (what: string) =>
  z
    .number({ error: `Enter ${what} in metres.` })
    .min(-1e4, `${what} is out of range.`)
    .max(1e4, `${what} is out of range.`);
const ratio = (what: string) =>
  z
    .number({ error: `Enter the ${what} as an H:V ratio, e.g. 2.5 for 2.5H:1V.` })
    .min(1, `The ${what} must be at least 1H:1V.`)
    .max(10, `The ${what} must be at most 10H:1V.`);
const materialKey = (what: string) =>
  z.string({ error: `Choose the ${what} material.` }).min(1, `Choose the ${what} material.`);

export const bermSchema = z.object({
  elevation: metres("the berm elevation"),
  width: z
    .number({ error: "Enter the berm width in metres." })
    .positive("The berm width must be positive.")
    .max(100, "The berm width must be at most 100 m."),
});

const point = z.tuple([z.number(), z.number()]);
/** A phreatic line drawn by hand (x increasing), replacing the constructed one for one pool. */
export const handLineSchema = z
  .array(point)
  .min(2, "A hand-drawn line needs at least two points.")
  .max(500, "A hand-drawn line may have at most 500 points.");

export const zoningSchema = z.discriminatedUnion("kind", [
  z.object({ kind: z.literal("homogeneous"), fill: materialKey("fill") }),
  z.object({
    kind: z.literal("zoned"),
    core: materialKey("core"),
    shell: materialKey("shell"),
    /** Width of the core's top, at the crest (m). */
    coreTopWidth: z
      .number({ error: "Enter the core's top width in metres." })
      .positive("The core's top width must be positive."),
    /** H:V of both core faces. */
    coreSlope: z
      .number({ error: "Enter the core's side slope as an H:V ratio." })
      .min(0, "The core's side slope must not be negative.")
      .max(5, "The core's side slope must be at most 5H:1V."),
  }),
]);

const paramsShape = z.object({
  crestElevation: metres("the crest elevation"),
  crestWidth: z
    .number({ error: "Enter the crest width in metres." })
    .min(1, "The crest must be at least 1 m wide.")
    .max(100, "The crest must be at most 100 m wide."),
  /** Top of the foundation layer, where the fill is placed (m). */
  foundationTop: metres("the foundation level"),
  foundationThickness: z
    .number({ error: "Enter the foundation thickness in metres." })
    .min(0, "The foundation thickness must not be negative.")
    .max(200, "The foundation thickness must be at most 200 m."),
  /** Thickness drawn for the base under the foundation (m); it only has to exist. */
  baseThickness: z
    .number({ error: "Enter the base thickness in metres." })
    .min(0.5, "Draw at least 0.5 m of base.")
    .max(50, "The base thickness must be at most 50 m."),
  upstreamSlope: ratio("upstream slope"),
  downstreamSlope: ratio("downstream slope"),
  upstreamBerm: bermSchema.nullable(),
  downstreamBerm: bermSchema.nullable(),
  zoning: zoningSchema,
  foundationMaterial: materialKey("foundation"),
  baseMaterial: materialKey("base"),
  drainMaterial: materialKey("toe drain"),
  /** The foundation is much less permeable than the fill, so the seepage line may take its top as impervious. */
  foundationImpervious: z.boolean(),
  drainLength: z
    .number({ error: "Enter the toe drain's length in metres." })
    .positive("The toe drain's length must be positive.")
    .max(500, "The toe drain must be at most 500 m long."),
  drainThickness: z
    .number({ error: "Enter the toe drain's thickness in metres." })
    .min(0.2, "The toe drain must be at least 0.2 m thick.")
    .max(5, "The toe drain must be at most 5 m thick."),
  normalPool: metres("the normal pool level"),
  floodPool: metres("the flood pool level"),
  drawdownTo: metres("the level after drawdown"),
  /** Least freeboard above the flood pool that the designer accepts (m). */
  minFreeboard: z
    .number({ error: "Enter the least freeboard in metres." })
    .min(0, "The freeboard must not be negative.")
    .max(20, "The freeboard must be at most 20 m."),
  /** Horizontal permeability of the fill, kh (m/s), and kv/kh. */
  fillPermeability: z
    .number({ error: "Enter the fill's permeability in m/s." })
    .positive("The permeability must be positive.")
    .max(1, "The permeability must be at most 1 m/s."),
  anisotropy: z
    .number({ error: "Enter kv/kh." })
    .positive("kv/kh must be positive.")
    .max(1, "kv/kh must be at most 1 (layered fill is more permeable across the layers' plane)."),
  /** Length of the dam along its crest (m), for the seepage total and the fill volume. */
  crestLength: z
    .number({ error: "Enter the crest length in metres." })
    .positive("The crest length must be positive.")
    .max(1e5, "The crest length must be at most 100 km."),
  requiredPipingFactor: z
    .number({ error: "Enter the required factor against piping." })
    .min(1, "The required factor against piping must be at least 1.")
    .max(10, "The required factor against piping must be at most 10."),
  handLines: z.object({ normal: handLineSchema.nullable(), flood: handLineSchema.nullable() }),
});

export type Berm = z.infer<typeof bermSchema>;
export type Zoning = z.infer<typeof zoningSchema>;
export type EmbankmentParams = z.infer<typeof paramsShape>;
type Ctx = z.core.$RefinementCtx<EmbankmentParams>;

function issue(ctx: Ctx, path: (string | number)[], message: string) {
  ctx.addIssue({ code: "custom", path, message });
}

function checkBerm(ctx: Ctx, p: EmbankmentParams, side: "upstream" | "downstream") {
  const berm = side === "upstream" ? p.upstreamBerm : p.downstreamBerm;
  if (!berm) return;
  const low = p.foundationTop + (side === "downstream" ? p.drainThickness + 0.5 : 0.5);
  if (!(berm.elevation > low && berm.elevation < p.crestElevation - 0.5)) {
    issue(
      ctx,
      [`${side}Berm`, "elevation"],
      `The ${side} berm must lie between ${low.toFixed(2)} m and ${(p.crestElevation - 0.5).toFixed(2)} m (at least ` +
        `0.5 m below the crest and above the foundation${side === "downstream" ? " and the toe drain" : ""}).`,
    );
  }
}

/** Cross-field checks: each message names the field and the limit it broke. */
function checkParams(p: EmbankmentParams, ctx: Ctx) {
  const H = p.crestElevation - p.foundationTop;
  if (H < 1)
    issue(
      ctx,
      ["crestElevation"],
      `The crest (${p.crestElevation} m) must be at least 1 m above the foundation level (${p.foundationTop} m).`,
    );
  if (!(p.normalPool > p.foundationTop))
    issue(
      ctx,
      ["normalPool"],
      `The normal pool (${p.normalPool} m) must be above the foundation level (${p.foundationTop} m).`,
    );
  if (p.floodPool < p.normalPool)
    issue(
      ctx,
      ["floodPool"],
      `The flood pool (${p.floodPool} m) must not be below the normal pool (${p.normalPool} m).`,
    );
  if (p.floodPool > p.crestElevation)
    issue(
      ctx,
      ["floodPool"],
      `The flood pool (${p.floodPool} m) is above the crest (${p.crestElevation} m): the dam would overtop.`,
    );
  if (!(p.drawdownTo >= p.foundationTop && p.drawdownTo < p.normalPool)) {
    issue(
      ctx,
      ["drawdownTo"],
      `The level after drawdown (${p.drawdownTo} m) must lie from the foundation level (${p.foundationTop} m) up to ` +
        `below the normal pool (${p.normalPool} m).`,
    );
  }
  checkBerm(ctx, p, "upstream");
  checkBerm(ctx, p, "downstream");
  const minDrain = p.downstreamSlope * p.drainThickness + 0.5;
  if (p.drainLength < minDrain)
    issue(
      ctx,
      ["drainLength"],
      `The toe drain must be at least ${minDrain.toFixed(2)} m long so its top meets the downstream face (slope × ` +
        `thickness + 0.5 m).`,
    );
  if (p.zoning.kind === "zoned") {
    const z = p.zoning;
    if (z.coreTopWidth > p.crestWidth)
      issue(
        ctx,
        ["zoning", "coreTopWidth"],
        `The core's top (${z.coreTopWidth} m) must not be wider than the crest (${p.crestWidth} m).`,
      );
    if (z.coreSlope >= Math.min(p.upstreamSlope, p.downstreamSlope)) {
      issue(
        ctx,
        ["zoning", "coreSlope"],
        `The core's side slope (${z.coreSlope}H:1V) must be steeper than both faces ` +
          `(${Math.min(p.upstreamSlope, p.downstreamSlope)}H:1V) so the shells cover it.`,
      );
    }
  }
  for (const pool of ["normal", "flood"] as const) {
    const line = p.handLines[pool];
    if (!line) continue;
    for (let i = 1; i < line.length; i++) {
      if (!(line[i][0] > line[i - 1][0])) {
        issue(
          ctx,
          ["handLines", pool, i],
          `Hand-drawn line (${pool} pool), point ${i + 1} (x = ${line[i][0]} m) is not right of point ${i} (x = ` +
            `${line[i - 1][0]} m): list the points left to right.`,
        );
        break;
      }
    }
  }
}

export const embankmentParamsSchema = paramsShape.superRefine(checkParams);

/**
 * The demo embankment (db/seeds/demo-section.ts): crest 18.0 m and 6 m wide on a foundation
 * 6 m thick whose top is at 6.0 m, over rock; 3:1 upstream, 2.5:1 downstream; a 12 m toe drain;
 * normal pool 16.0 m, flood pool 17.0 m, drawdown to 8.0 m. Material keys are the demo library's.
 */
export const DEFAULT_PARAMS: EmbankmentParams = {
  crestElevation: 18,
  crestWidth: 6,
  foundationTop: 6,
  foundationThickness: 6,
  baseThickness: 4,
  upstreamSlope: 3,
  downstreamSlope: 2.5,
  upstreamBerm: null,
  downstreamBerm: null,
  zoning: { kind: "homogeneous", fill: "fill" },
  foundationMaterial: "foundation",
  baseMaterial: "rock",
  drainMaterial: "drain",
  foundationImpervious: true,
  drainLength: 12,
  drainThickness: 0.5,
  normalPool: 16,
  floodPool: 17,
  drawdownTo: 8,
  minFreeboard: 1,
  fillPermeability: 5e-9,
  anisotropy: 1,
  crestLength: 300,
  requiredPipingFactor: 3,
  handLines: { normal: null, flood: null },
};

/** The material keys the parameters refer to, each with the role it plays. */
export function materialRoles(p: EmbankmentParams): { key: string; role: string; field: string }[] {
  const zone =
    p.zoning.kind === "homogeneous"
      ? [{ key: p.zoning.fill, role: "fill", field: "zoning.fill" }]
      : [
          { key: p.zoning.core, role: "core", field: "zoning.core" },
          { key: p.zoning.shell, role: "shell", field: "zoning.shell" },
        ];
  return [
    ...zone,
    { key: p.foundationMaterial, role: "foundation", field: "foundationMaterial" },
    { key: p.baseMaterial, role: "base", field: "baseMaterial" },
    { key: p.drainMaterial, role: "toe drain", field: "drainMaterial" },
  ];
}

/**
 * Defaults for a new study in a project whose library may differ from the demo's: the demo
 * dimensions, with each material role taken from the demo key when the library has it, else the
 * first fitting material (a soil for the zones, an impenetrable material for the base).
 */
export function defaultParamsFor(library: readonly { key: string; model: string }[]): EmbankmentParams {
  const has = (key: string) => library.some((m) => m.key === key);
  const soil = library.find((m) => m.model !== "impenetrable")?.key ?? "";
  const rigid = library.find((m) => m.model === "impenetrable")?.key ?? soil;
  const pick = (key: string, fallback: string) => (has(key) ? key : fallback);
  return {
    ...DEFAULT_PARAMS,
    zoning: { kind: "homogeneous", fill: pick("fill", soil) },
    foundationMaterial: pick("foundation", soil),
    baseMaterial: pick("rock", rigid),
    drainMaterial: pick("drain", soil),
  };
}
