/**
 * Strength model per material for a load case (docs/engine.md §4, §7, §8):
 * - steady and drawdown (effective-stress method, §7(a)): Mohr–Coulomb materials use c', φ'
 *   with pore pressure; undrained materials keep su (total stress).
 * - undrained (end of construction): undrained materials, and Mohr–Coulomb materials that
 *   carry an su and are not marked free-draining, use su with φ = 0 and ignore pore
 *   pressure; the rest are treated as free-draining with c', φ' (a warning says which).
 */
import type { EngineWarning } from "./issues";
import type { LoadCase, Material } from "./schema";

export const KIND_EFFECTIVE = 0;
export const KIND_UNDRAINED = 1;
export const KIND_RIGID = 2;

/** Material properties as typed arrays indexed by material number (kPa, kN/m³, m). */
export interface MaterialTable {
  kind: Uint8Array;
  /** γ above the water line; −1 when unknown (an impenetrable material without γ). */
  gamma: Float64Array;
  gammaSat: Float64Array;
  c: Float64Array;
  tanPhi: Float64Array;
  su: Float64Array;
  suGradient: Float64Array;
  suDatum: Float64Array;
  ids: string[];
}

/** Builds the strength table for one load case, with the warnings that case calls for. */
export function buildMaterialTable(
  materials: ReadonlyArray<Material>,
  loadCase: LoadCase,
): { table: MaterialTable; warnings: EngineWarning[] } {
  const n = materials.length;
  const t: MaterialTable = {
    kind: new Uint8Array(n),
    gamma: new Float64Array(n),
    gammaSat: new Float64Array(n),
    c: new Float64Array(n),
    tanPhi: new Float64Array(n),
    su: new Float64Array(n),
    suGradient: new Float64Array(n),
    suDatum: new Float64Array(n),
    ids: materials.map((m) => m.id),
  };
  const drained: string[] = [];
  const undrainedLongTerm: string[] = [];
  materials.forEach((m, i) => {
    const g = m.gamma ?? -1;
    t.gamma[i] = g;
    t.gammaSat[i] = m.model === "impenetrable" ? g : (m.gammaSat ?? g);
    if (m.model === "impenetrable") {
      t.kind[i] = KIND_RIGID;
      return;
    }
    if (m.model === "mohr-coulomb") {
      t.c[i] = m.c;
      t.tanPhi[i] = Math.tan((m.phi * Math.PI) / 180);
    }
    const useSu = m.model === "undrained" || (loadCase === "undrained" && m.su !== undefined && !m.freeDraining);
    if (useSu && m.su !== undefined) {
      t.kind[i] = KIND_UNDRAINED;
      t.su[i] = m.su;
      t.suGradient[i] = m.suGradient ?? 0;
      t.suDatum[i] = m.suDatum ?? 0;
      if (m.model === "undrained" && loadCase !== "undrained") undrainedLongTerm.push(m.id);
    } else {
      t.kind[i] = KIND_EFFECTIVE;
      if (loadCase === "undrained") drained.push(m.id);
    }
  });
  const warnings: EngineWarning[] = [];
  if (drained.length > 0) {
    warnings.push({
      code: "treated-as-free-draining",
      message: `End of construction: ${list(drained)} ${drained.length > 1 ? "have" : "has"} no undrained strength su (or ${drained.length > 1 ? "are" : "is"} marked free-draining), so ${drained.length > 1 ? "they are" : "it is"} treated as free-draining with effective strength c', φ' and the given pore pressures.`,
    });
  }
  if (undrainedLongTerm.length > 0) {
    warnings.push({
      code: "undrained-in-long-term-case",
      message: `${list(undrainedLongTerm)} ${undrainedLongTerm.length > 1 ? "are undrained materials" : "is an undrained material"}: ${undrainedLongTerm.length > 1 ? "their" : "its"} su (total stress) is used in this ${loadCase === "drawdown" ? "drawdown" : "long-term"} case too. Give c', φ' for an effective-stress check.`,
    });
  }
  return { table: t, warnings };
}

function list(ids: string[]): string {
  return ids.map((s) => `'${s}'`).join(", ");
}
