/**
 * The one orchestrator of seepage water in a stability run (docs/seepage.md §6): a document with
 * `"water": {"source": "seepage"}` is solved for seepage, and the engine gets the same document
 * with the solution's water line filled in plus the pore-pressure field to read at each slice
 * base. The command line, the server's authoritative save and the browser's worker all go
 * through here, so a stored run recomputes from its frozen document alone.
 */
import { runSeepage, seepageWater, type SeepageIssue } from "@/lib/seepage";
import { sectionGround, usesSeepageWater, type SectionDocument, type WaterField } from "@/lib/stability";
import type { SeepageSummary } from "./types";
import { seepageWaterLine } from "./water-line";

export type SolvedWater =
  | { ok: true; document: unknown; waterField?: WaterField; seepage: SeepageSummary | null }
  | { ok: false; errors: SeepageIssue[] };

function isRecord(v: unknown): v is Record<string, unknown> {
  return typeof v === "object" && v !== null && !Array.isArray(v);
}

/** True when the (unchecked) document asks for seepage water. */
export function asksForSeepage(doc: unknown): boolean {
  return isRecord(doc) && isRecord(doc.water) && usesSeepageWater(doc as Pick<SectionDocument, "water">);
}

/**
 * Solves the seepage of a document whose water comes from it; any other document passes through
 * untouched (and with no field, so the engine's own water paths run exactly as before).
 */
export function solveWater(doc: unknown, onRound?: (round: number, most: number) => boolean | void): SolvedWater {
  if (!asksForSeepage(doc)) return { ok: true, document: doc, seepage: null };
  const d = doc as Record<string, unknown> & { water: Record<string, unknown> };
  if (!isRecord(d.seepage))
    return {
      ok: false,
      errors: [
        {
          code: "seepage-missing",
          path: "seepage",
          message:
            'water.source = "seepage" needs a "seepage" block (pools, drains, meshSize) and k on every pervious ' +
            "material: add them or choose another water source.",
        },
      ],
    };
  const run = runSeepage(doc, { onRound });
  if (!run.ok) return run;
  const water = seepageWater(run.model, run.solution.phreatic);
  const ground = sectionGround({ ...d, water: undefined } as unknown as SectionDocument);
  const line = ground.length >= 2 ? seepageWaterLine(ground, water.phreatic, water.pools) : water.phreatic;
  const { solution, model } = run;
  return {
    ok: true,
    document: { ...d, water: { ...d.water, phreatic: line } },
    waterField: { porePressure: water.porePressure },
    seepage: {
      q: solution.q,
      qIn: solution.qIn,
      qOut: solution.qOut,
      meshSize: model.problem.meshSize,
      nodes: solution.mesh.nodes,
      elements: solution.mesh.elements,
      freeSurfaceRounds: solution.iterations.freeSurface,
      converged: solution.iterations.converged,
      pools: water.pools,
      waterLine: line,
      warnings: solution.warnings.map((w) => ({ code: w.code, message: w.message })),
    },
  };
}

/**
 * The engine's validation keeps only the keys it knows; a run on seepage water must keep the
 * `seepage` block and each material's k and kRatio, or its frozen document could not be solved
 * again. Copies them from the document as written onto the cleaned one (materials by position).
 */
export function withSeepageKeys(original: unknown, cleaned: SectionDocument): SectionDocument {
  if (!asksForSeepage(original)) return cleaned;
  const o = original as { seepage?: unknown; materials?: unknown };
  const mats = Array.isArray(o.materials) ? o.materials : [];
  const materials = cleaned.materials.map((m, i) => {
    const src: unknown = mats[i];
    if (!isRecord(src)) return m;
    return {
      ...m,
      ...(typeof src.k === "number" ? { k: src.k } : {}),
      ...(typeof src.kRatio === "number" ? { kRatio: src.kRatio } : {}),
    };
  });
  return { ...cleaned, materials, seepage: o.seepage } as SectionDocument;
}
