/**
 * Turns the parametric embankment into an ordinary section document (docs/engine-io.md, version 1)
 * that the section editor opens and changes like any other: regions for the base, the foundation,
 * the fill (or core and shells) and the toe drain, and the phreatic line for the chosen pool.
 */
import type { Material, Region, SectionDocument } from "@/lib/stability";
import { embankmentGeometry, type EmbankmentGeometry, type XY } from "./embankment-geometry";
import { fillQuantities, type FillQuantities } from "./fill-quantities";
import { materialRoles, type EmbankmentParams } from "./parameters";
import { HAND_LINE_REQUEST } from "./phreatic-line";
import {
  phreaticForPool,
  pipingOnLine,
  saturatedUnitWeight,
  spanSection,
  type PhreaticOutcome,
  type PoolName,
} from "./phreatic-line";
import { solveDesignSeepage, SOLVED_BY_SEEPAGE } from "./seepage-solution";

export interface DesignWarning {
  code: string;
  message: string;
  /** The parameter the warning is about, when there is one (dotted path). */
  field?: string;
}

export interface GeneratedEmbankment {
  document: SectionDocument;
  geometry: EmbankmentGeometry;
  quantities: FillQuantities;
  /** The phreatic line of the document's pool, with the seepage and piping numbers when constructed. */
  seepage: PhreaticOutcome;
  warnings: DesignWarning[];
}

export class DesignInputError extends Error {
  constructor(
    readonly field: string,
    message: string,
  ) {
    super(message);
    this.name = "DesignInputError";
  }
}

function pickMaterials(p: EmbankmentParams, library: readonly Material[]): Material[] {
  const byId = new Map(library.map((m) => [m.id, m]));
  const used: Material[] = [];
  for (const { key, role, field } of materialRoles(p)) {
    const m = byId.get(key);
    if (!m)
      throw new DesignInputError(
        field,
        `The ${role} material '${key}' is not in the project's materials library: ` +
          `choose another or add it to the library.`,
      );
    if (role !== "base" && m.model === "impenetrable")
      throw new DesignInputError(
        field,
        `The ${role} material '${key}' is impenetrable: only the base may be. Choose a soil.`,
      );
    if (!used.some((u) => u.id === m.id)) used.push(m);
  }
  return used;
}

/** Vertices of the dam's base on the foundation top, right to left, so the regions share them. */
function baseVertices(g: EmbankmentGeometry): XY[] {
  const xs = [g.upstreamToe[0], g.drain.start[0], g.downstreamToe[0]];
  if (g.core) xs.push(g.core.upstreamBase[0], g.core.downstreamBase[0]);
  const y = g.upstreamToe[1];
  return [...new Set(xs)].sort((a, b) => b - a).map((x) => [x, y] as XY);
}

/** The downstream face above the drain's top, from the drain up to the crest (x decreasing). */
function downstreamAboveDrain(g: EmbankmentGeometry): XY[] {
  const face = g.downstreamFace.slice(0, -1).reverse(); // from the lowest corner above the toe up to the crest
  return [[g.drain.faceX, g.drain.top], ...face];
}

function samePoint(a: XY, b: XY): boolean {
  return Math.abs(a[0] - b[0]) <= 1e-9 && Math.abs(a[1] - b[1]) <= 1e-9;
}

function zoneRegions(p: EmbankmentParams, g: EmbankmentGeometry): Region[] {
  // Upstream berm corners from the crest downward (the face without its toe and crest).
  const upMid = g.upstreamFace.slice(1, -1).reverse();
  // Along the drain's upstream end and top, then up the downstream face to the crest corner.
  const drainCut: XY[] = [g.drain.start, [g.drain.start[0], g.drain.top], ...downstreamAboveDrain(g)];
  const drain: Region = { name: "Toe drain", material: p.drainMaterial, points: g.drain.polygon };
  if (p.zoning.kind === "homogeneous" || !g.core) {
    const fill = p.zoning.kind === "homogeneous" ? p.zoning.fill : p.zoning.shell;
    return [
      { name: "Embankment fill", material: fill, points: [g.upstreamToe, ...drainCut, g.upstreamCrest, ...upMid] },
      drain,
    ];
  }
  const c = g.core;
  const upstreamShell: XY[] = [g.upstreamToe, c.upstreamBase, c.upstreamTop];
  if (!samePoint(c.upstreamTop, g.upstreamCrest)) upstreamShell.push(g.upstreamCrest);
  upstreamShell.push(...upMid);
  const downstreamShell: XY[] = [c.downstreamBase, ...drainCut];
  if (!samePoint(c.downstreamTop, g.downstreamCrest)) downstreamShell.push(c.downstreamTop);
  return [
    { name: "Upstream shell", material: p.zoning.shell, points: upstreamShell },
    { name: "Core", material: p.zoning.core, points: c.polygon },
    { name: "Downstream shell", material: p.zoning.shell, points: downstreamShell },
    drain,
  ];
}

function groundRegions(p: EmbankmentParams, g: EmbankmentGeometry): Region[] {
  const ft = p.foundationTop;
  const fb = ft - p.foundationThickness;
  const regions: Region[] = [
    {
      name: "Base",
      material: p.baseMaterial,
      points: [
        [0, fb - p.baseThickness],
        [g.xmax, fb - p.baseThickness],
        [g.xmax, fb],
        [0, fb],
      ],
    },
  ];
  if (p.foundationThickness > 0) {
    regions.push({
      name: "Foundation",
      material: p.foundationMaterial,
      points: [[0, fb], [g.xmax, fb], [g.xmax, ft], ...baseVertices(g), [0, ft]],
    });
  } else {
    // Without a foundation layer the base itself carries the dam: give it the dam's base vertices.
    regions[0].points = [
      [0, fb - p.baseThickness],
      [g.xmax, fb - p.baseThickness],
      [g.xmax, fb],
      ...baseVertices(g),
      [0, fb],
    ];
  }
  return regions;
}

function freeboardWarnings(p: EmbankmentParams): DesignWarning[] {
  const out: DesignWarning[] = [];
  const freeboard = p.crestElevation - p.floodPool;
  if (freeboard < p.minFreeboard) {
    out.push({
      code: "W_DESIGN_LOW_FREEBOARD",
      field: "floodPool",
      message:
        `Freeboard above the flood pool is ${freeboard.toFixed(2)} m, less than the ` +
        `${p.minFreeboard.toFixed(2)} m asked for: raise the crest or lower the flood pool.`,
    });
  }
  if (p.crestWidth < 3)
    out.push({
      code: "W_DESIGN_NARROW_CREST",
      field: "crestWidth",
      message: `A crest ${p.crestWidth} m wide is narrow for construction plant and access; 3 m or more is usual.`,
    });
  return out;
}

/**
 * Builds the section document of the parametric embankment.
 * @param params valid parameters (embankmentParamsSchema)
 * @param materials the project's library as engine materials (ids are the library keys)
 * @param options.pool which pool's phreatic line the document carries (normal by default)
 * @throws DesignInputError naming the field when a material is missing or unfit
 */
export function generateEmbankment(
  params: EmbankmentParams,
  materials: readonly Material[],
  options: { pool?: PoolName } = {},
): GeneratedEmbankment {
  const used = pickMaterials(params, materials);
  const g = embankmentGeometry(params);
  if (g.core && g.core.downstreamBase[0] > g.drain.start[0] - 0.5) {
    throw new DesignInputError(
      "drainLength",
      `The toe drain reaches under the core (drain starts at x = ${g.drain.start[0].toFixed(2)} m, core base ends ` +
        `at x = ${g.core.downstreamBase[0].toFixed(2)} m): shorten the drain or narrow the core.`,
    );
  }
  const fillKey = params.zoning.kind === "homogeneous" ? params.zoning.fill : params.zoning.core;
  const gammaSat = saturatedUnitWeight(used.find((m) => m.id === fillKey));
  let seepage = phreaticForPool(params, g, options.pool ?? "normal", gammaSat);
  const regions = [...groundRegions(params, g), ...zoneRegions(params, g)];
  let document: SectionDocument = {
    version: 1,
    materials: used,
    regions,
    ...(seepage.line ? { water: { gammaW: 9.81, phreatic: seepage.line } } : {}),
  };
  // What the basic parabola refuses (a zoned fill, a pervious foundation) the finite-element solution answers.
  if (seepage.source === "none" && seepage.limits.some((l) => SOLVED_BY_SEEPAGE.has(l.code))) {
    const fe = solveDesignSeepage(params, g, seepage.poolLevel, used, regions);
    if (fe.ok) {
      const line = spanSection(fe.seepage.phreatic, g.xmax);
      seepage = {
        ...seepage,
        source: "seepage-solution",
        line,
        limits: fe.seepage.warnings.map((w) => ({ code: w.code, severity: "warning" as const, message: w.message })),
        piping: pipingOnLine(params, g, line, gammaSat),
        solution: fe.seepage,
      };
      // The line is kept for drawing; a run solves the seepage again from the block (one orchestrator).
      document = {
        ...document,
        materials: fe.seepage.materials,
        water: { gammaW: 9.81, source: "seepage", phreatic: line },
        seepage: fe.seepage.block,
      } as SectionDocument;
    } else {
      seepage = {
        ...seepage,
        limits: fe.errors.map((e) => ({
          code: "E_DESIGN_SEEPAGE",
          severity: "error" as const,
          message: `The seepage solution cannot be found: ${e.message} ${HAND_LINE_REQUEST}`,
        })),
      };
    }
  }
  const warnings = freeboardWarnings(params);
  for (const l of seepage.limits) warnings.push({ code: l.code, message: l.message });
  return { document, geometry: g, quantities: fillQuantities(g, params.crestLength), seepage, warnings };
}
