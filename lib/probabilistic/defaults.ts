/**
 * The spread a probabilistic run starts from, per material of a kept run: from the lab set that
 * backs the material's c′ and φ′ (or su) where the library records one (its fit's standard
 * deviations, ./lab-scatter.ts), otherwise from typical coefficients of variation (./cov-table.ts).
 * Each default says where it came from; the engineer may change any of them before submitting.
 */
import type { Vary } from "@/lib/stability";
import type { LabTestRecord } from "@/lib/materials/lab-kinds";
import { covBasis, typicalCov, TYPICAL_COV, type CovQuantity } from "./cov-table";
import { labSetScatter, labSetSuSd } from "./lab-scatter";
import type { MaterialDefaults, VariedQuantity } from "./types";

/** A run document's material, as far as the defaults need it. */
export interface DocMaterial {
  id: string;
  name?: string;
  model: string;
  c?: number;
  phi?: number;
  su?: number;
  gamma?: number;
  freeDraining?: boolean;
}

/** The lab set a parameter of the library material came from (its `sources`), with its name. */
export interface BackingSet {
  id: number;
  name: string;
  record: LabTestRecord;
}

const round = (v: number, digits: number) => Number(v.toFixed(digits));

/** Which strength the load case uses for a material (lib/stability/load-cases.ts decides the same way). */
export function strengthKeys(m: DocMaterial, loadCase: string): VariedQuantity[] {
  if (m.model === "impenetrable") return [];
  const useSu = m.model === "undrained" || (loadCase === "undrained" && m.su !== undefined && !m.freeDraining);
  const keys: VariedQuantity[] = useSu ? ["su"] : ["c", "phi"];
  return [...keys.filter((k) => typeof m[k] === "number"), ...(typeof m.gamma === "number" ? ["gamma" as const] : [])];
}

function typical(key: CovQuantity, mean: number) {
  const r = TYPICAL_COV[key];
  return { d: { dist: r.dist, sd: round(Math.abs(mean) * typicalCov(key), 3) }, basis: covBasis(key) };
}

/**
 * The default variation of one material.
 * @param sets the lab sets its c, phi and su came from, keyed by parameter (absent when typed by hand)
 */
export function materialDefaults(
  m: DocMaterial,
  loadCase: string,
  sets: Partial<Record<"c" | "phi" | "su", BackingSet>>,
): MaterialDefaults {
  const vary: Vary = {};
  const basis: MaterialDefaults["basis"] = {};
  const keys = strengthKeys(m, loadCase);
  const strengthSet = sets.phi ?? sets.c;
  const scatter = strengthSet ? labSetScatter(strengthSet.record) : null;
  for (const key of keys) {
    const mean = m[key] as number;
    if (key === "c" && mean === 0) {
      basis.c = "not varied: c′ = 0 (a cohesionless material)";
      continue;
    }
    if ((key === "c" || key === "phi") && scatter && strengthSet) {
      const sd = key === "c" ? scatter.cSd : scatter.phiSd;
      if (sd !== null && sd > 0) {
        vary[key] = { dist: key === "c" ? "lognormal" : "normal", sd: round(sd, 3) };
        basis[key] =
          `sd of the fitted ${key === "c" ? "c′" : "φ′"} from lab set '${strengthSet.name}' (${scatter.n} tests)`;
        continue;
      }
    }
    const suSd = key === "su" && sets.su ? labSetSuSd(sets.su.record) : null;
    if (key === "su" && suSd !== null && suSd > 0 && sets.su) {
      vary.su = { dist: "lognormal", sd: round(suSd, 3) };
      basis.su = `sd of the tests in lab set '${sets.su.name}'`;
      continue;
    }
    const t = typical(key, mean);
    vary[key] = t.d;
    basis[key] = t.basis;
  }
  if (vary.c && vary.phi && scatter?.correlation != null && strengthSet && basis.c?.startsWith("sd of the fitted")) {
    vary.correlation = round(scatter.correlation, 2);
    basis.correlation = `correlation of the fitted c′ and φ′ in lab set '${strengthSet.name}'`;
  }
  return { materialId: m.id, name: m.name ?? m.id, model: m.model, keys, values: pick(m, keys), vary, basis };
}

function pick(m: DocMaterial, keys: VariedQuantity[]): Partial<Record<VariedQuantity, number>> {
  return Object.fromEntries(keys.map((k) => [k, m[k] as number]));
}
