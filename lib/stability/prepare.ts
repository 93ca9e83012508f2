/**
 * Turns a valid section document and a resolved analysis into the flat, typed-array model
 * the slice loop reads (docs/engine.md §5): the strip table with water and surcharge per strip,
 * the ground polyline, vertical faces and the material table for the load case.
 */
import { resolveAnalysis, DEFAULT_GAMMA_W, type ResolvedAnalysis } from "./defaults";
import { deriveGround, type GroundLine } from "./ground";
import type { EngineWarning } from "./issues";
import { buildMaterialTable, type MaterialTable } from "./load-cases";
import type { SectionDocument } from "./schema";
import { buildStripTable, type RingInput, type StripTable } from "./strip-table";
import { buildWaterModel, WATER_LINE, type WaterModel } from "./water";
import { activeField, type WaterField } from "./water-field";
import { buildStagedModel, VARIANT_THREE_STAGE, VARIANT_TWO_STAGE, type StagedModel } from "./drawdown/staged-model";

/** A ground vertex turning by more than this (rad, 30°) is a corner the slices must not run across. */
export const SHARP_TURN = Math.PI / 6;

/** Everything one run needs, precomputed once. Lengths m, pressures kPa, weights kN/m³. */
export interface PreparedSection {
  table: StripTable;
  ground: GroundLine;
  xmin: number;
  xmax: number;
  mat: MaterialTable;
  /** 0 dry, 1 water surface per strip, 2 ru. */
  waterKind: number;
  gammaW: number;
  ru: number;
  /** Water surface per strip: y = waterA[k] + waterB[k]·x. */
  waterA: Float64Array;
  waterB: Float64Array;
  /** Factor on phreatic pore pressure per strip: cos²θ of the line when cos2Correction is on, else 1. */
  waterCos2: Float64Array;
  /** A second water surface per strip whose arc crossings also break slices (staged drawdown), or null. */
  extraWaterA: Float64Array | null;
  extraWaterB: Float64Array | null;
  /** Pore pressure at a slice base from outside (seepage water, docs/engine.md §3(d)), or null: the line's. */
  uField: WaterField | null;
  /** Surcharge pressure per strip (kPa). */
  q: Float64Array;
  kh: number;
  /** faceTop[k] > faceBot[k] where the ground steps at strip boundary k; faceSoil = −1 soil left, +1 soil right. */
  hasFaces: boolean;
  faceTop: Float64Array;
  faceBot: Float64Array;
  faceSoil: Int8Array;
  /** 1 at strip boundaries where the ground steps or turns by more than SHARP_TURN: always a slice break. */
  sharp: Uint8Array;
  slices: number;
  /** 0 classical ordinary method, 1 effective-weight form. */
  ordinaryForm: number;
  minDepth: number;
  /** +1 sliding toward +x, −1 toward −x, 0 auto. */
  direction: number;
  analysis: ResolvedAnalysis;
  warnings: EngineWarning[];
  /** Staged drawdown (docs/engine.md §7(b)): the stage-1 section and the staged strengths; null otherwise. */
  staged: StagedModel | null;
}

/** The ground surface of a valid section as [x, y] points (m); vertical faces give two points at one x. */
export function sectionGround(doc: SectionDocument): [number, number][] {
  const base = buildStripTable(sectionRings(doc));
  if (!base.table) return [];
  const g = deriveGround(base.table);
  return Array.from(g.x, (x, i) => [x, g.y[i]] as [number, number]);
}

/** Builds the rings the strip table needs from the section's regions. */
export function sectionRings(doc: SectionDocument): RingInput[] {
  const index = new Map(doc.materials.map((m, i) => [m.id, i] as const));
  return doc.regions.map((r, i) => ({ points: r.points, material: index.get(r.material) ?? 0, region: i }));
}

/** True when the analysis asks for a staged total-stress drawdown (docs/engine.md §7(b)). */
export function isStagedDrawdown(analysis: ResolvedAnalysis): boolean {
  return analysis.case === "drawdown" && analysis.drawdown?.method === "staged";
}

/**
 * Prepares a validated section for computation. For a staged drawdown the result is the
 * post-drawdown section (stages 2 and 3) and carries the pre-drawdown one (stage 1) in
 * `staged.pre`; both share one strip table, so a circle cuts both into identical slices.
 * @throws Error when the regions cannot form a strip table (call validateSection first).
 */
export function prepareSection(
  doc: SectionDocument,
  analysisIn?: ResolvedAnalysis,
  field?: WaterField,
): PreparedSection {
  const analysis = analysisIn ?? resolveAnalysis(doc.analysis);
  const rings = sectionRings(doc);
  const base = buildStripTable(rings);
  if (!base.table) throw new Error("section regions do not form one section; run validateSection first");
  const ground = deriveGround(base.table);
  const gammaW = doc.water?.gammaW ?? DEFAULT_GAMMA_W;
  const water = buildWaterModel(doc.water, ground, analysis.case, analysis.drawdown, gammaW);
  // A drawdown also breaks slices at the pre-drawdown line, whichever method: stage 1 of a
  // staged analysis needs it, and so both methods cut a circle into the same slices.
  const preWater =
    analysis.case === "drawdown" && analysis.drawdown && water.surface
      ? buildWaterModel(doc.water, ground, "steady", undefined, gammaW)
      : null;
  const surcharges = doc.loads?.surcharges ?? [];
  const breaks = [...water.breaks];
  if (preWater) breaks.push(...preWater.breaks);
  for (const s of surcharges) breaks.push(s.x1, s.x2);
  // Without water or load breaks the first table is already the one needed.
  const table = breaks.length === 0 ? base.table : (buildStripTable(rings, breaks).table ?? base.table);
  const { table: mat, warnings } = buildMaterialTable(doc.materials, analysis.case);
  const P = assemble(doc, analysis, table, water, mat, warnings);
  P.uField = water.kind === WATER_LINE ? activeField(doc, analysis.case, field) : null;
  if (preWater) {
    // The section as it stands before drawdown (stage 1); each breaks at the other's line.
    const pre = assemble(doc, analysis, table, preWater, mat, []);
    P.extraWaterA = pre.waterA;
    P.extraWaterB = pre.waterB;
    pre.extraWaterA = P.waterA;
    pre.extraWaterB = P.waterB;
    if (isStagedDrawdown(analysis)) {
      P.staged = buildStagedModel(
        doc.materials,
        pre,
        analysis.drawdown?.stagedVariant === "usace-two-stage" ? VARIANT_TWO_STAGE : VARIANT_THREE_STAGE,
      );
    }
  }
  return P;
}

/** Fills the per-strip water, surcharge and face arrays of one water model. */
function assemble(
  doc: SectionDocument,
  analysis: ResolvedAnalysis,
  table: StripTable,
  water: WaterModel,
  mat: MaterialTable,
  warnings: EngineWarning[],
): PreparedSection {
  const surcharges = doc.loads?.surcharges ?? [];
  const n = table.n;
  const waterA = new Float64Array(n);
  const waterB = new Float64Array(n);
  const q = new Float64Array(n);
  const waterCos2 = new Float64Array(n).fill(1);
  for (let k = 0; k < n; k++) {
    const x0 = table.xs[k];
    const x1 = table.xs[k + 1];
    const xm = (x0 + x1) / 2;
    for (const s of surcharges) if (Math.min(s.x1, s.x2) <= xm && Math.max(s.x1, s.x2) >= xm) q[k] += s.q;
    if (water.surface) {
      // The surface is linear inside a strip, so two interior samples define it.
      const top = table.lineOff[k];
      const ga = table.lineA[top];
      const gb = table.lineB[top];
      const xa = x0 + (x1 - x0) / 4;
      const xb = x1 - (x1 - x0) / 4;
      const ya = water.surface(xa, ga + gb * xa);
      const yb = water.surface(xb, ga + gb * xb);
      waterB[k] = (yb - ya) / (xb - xa);
      waterA[k] = ya - waterB[k] * xa;
      if (doc.water?.cos2Correction) waterCos2[k] = 1 / (1 + waterB[k] * waterB[k]);
    }
  }
  const faceTop = new Float64Array(n + 1);
  const faceBot = new Float64Array(n + 1);
  const faceSoil = new Int8Array(n + 1);
  const sharp = new Uint8Array(n + 1);
  let hasFaces = false;
  for (let k = 1; k < n; k++) {
    const x = table.xs[k];
    const yl = table.lineA[table.lineOff[k - 1]] + table.lineB[table.lineOff[k - 1]] * x;
    const yr = table.lineA[table.lineOff[k]] + table.lineB[table.lineOff[k]] * x;
    const turn = Math.abs(Math.atan(table.lineB[table.lineOff[k]]) - Math.atan(table.lineB[table.lineOff[k - 1]]));
    if (turn > SHARP_TURN || Math.abs(yl - yr) > 1e-9) sharp[k] = 1;
    if (Math.abs(yl - yr) <= 1e-9) continue;
    hasFaces = true;
    faceTop[k] = Math.max(yl, yr);
    faceBot[k] = Math.min(yl, yr);
    faceSoil[k] = yl > yr ? -1 : 1;
  }
  return {
    table,
    ground: deriveGround(table),
    xmin: table.xs[0],
    xmax: table.xs[n],
    mat,
    waterKind: water.kind,
    gammaW: water.gammaW,
    ru: water.ru,
    waterA,
    waterB,
    waterCos2,
    extraWaterA: null,
    extraWaterB: null,
    uField: null,
    q,
    kh: doc.loads?.kh ?? 0,
    hasFaces: hasFaces && water.kind === WATER_LINE,
    faceTop,
    faceBot,
    faceSoil,
    sharp,
    slices: analysis.slices,
    ordinaryForm: analysis.ordinaryForm === "effective-weight" ? 1 : 0,
    minDepth: analysis.minDepth,
    direction: analysis.direction === "right" ? 1 : analysis.direction === "left" ? -1 : 0,
    analysis,
    warnings,
    staged: null,
  };
}
