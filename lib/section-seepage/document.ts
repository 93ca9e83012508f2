/**
 * The seepage solver's input (docs/seepage.md; docs/engine-io.md §2) from a stored section, one of
 * its water conditions, the library's conductivities and the saved seepage settings.
 */
import type { SectionDocument } from "@/lib/stability";
import type { SeepageDocument } from "@/lib/seepage";
import { poolLevels, type WaterCondition } from "@/lib/sections/water-conditions";
import type { MaterialConductivity, SeepageSettingsInput } from "./types";

export interface SeepageIssueForView {
  path: string;
  message: string;
}

export type BuiltSeepageDocument =
  { ok: true; document: SeepageDocument } | { ok: false; errors: SeepageIssueForView[] };

/**
 * Builds the document a seepage run reads. Conductivities come from the materials library by key,
 * so they are edited in one place with their lab provenance; a pervious material without k is
 * named here, before any solve, with where to set it.
 */
export function buildSeepageDocument(
  section: SectionDocument,
  condition: WaterCondition,
  conductivities: readonly MaterialConductivity[],
  settings: SeepageSettingsInput,
): BuiltSeepageDocument {
  const byKey = new Map(conductivities.map((c) => [c.key, c]));
  const errors: SeepageIssueForView[] = [];
  const used = new Set(section.regions.map((r) => r.material));
  const materials = section.materials.map((m, i) => {
    if (m.model === "impenetrable") return { ...m };
    const c = byKey.get(m.id);
    // k lives in the library only: a value left in an older section copy must not win over it.
    const own: SeepageDocument["materials"][number] = { ...m };
    delete own.k;
    delete own.kRatio;
    if (used.has(m.id) && c?.k === undefined)
      errors.push({
        path: `materials[${i}].k`,
        message:
          `Material '${m.id}'${m.name ? ` (${m.name})` : ""} has no hydraulic conductivity kh: ` +
          "set it in the materials library (typed, or from a permeability test set).",
      });
    return {
      ...own,
      ...(c?.k !== undefined ? { k: c.k } : {}),
      ...(c?.kRatio !== undefined ? { kRatio: c.kRatio } : {}),
    };
  });
  if (errors.length > 0) return { ok: false, errors };

  // Levels set in the seepage view win over the water condition's line, side by side.
  const drawn = poolLevels(section, condition.water);
  const levels = {
    left: settings.pools?.left ?? drawn.left,
    right: settings.pools?.right ?? drawn.right,
  };
  const pools: { side: "left" | "right"; level: number }[] = [];
  if (levels.left !== null) pools.push({ side: "left", level: levels.left });
  if (levels.right !== null) pools.push({ side: "right", level: levels.right });
  const tw = settings.tailwater;
  if (tw && !pools.some((p) => p.side === tw.side)) pools.push(tw);

  const document: SeepageDocument = {
    version: 1,
    materials,
    regions: section.regions.map((r) => ({ material: r.material, points: r.points })),
    seepage: {
      pools,
      drains: settings.drains,
      ...(settings.meshSize !== undefined ? { meshSize: settings.meshSize } : {}),
      ...(settings.crestLength !== undefined ? { crestLength: settings.crestLength } : {}),
      ...(settings.headDrops !== undefined ? { headDrops: settings.headDrops } : {}),
    },
    ...(section.water?.gammaW !== undefined ? { water: { gammaW: section.water.gammaW } } : {}),
  };
  return { ok: true, document };
}
