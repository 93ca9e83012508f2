/**
 * A stored section made ready for a run on seepage water (docs/seepage.md §6): the seepage block
 * (pools from the water condition, drains and mesh size from the condition's saved settings) and
 * each material's k and kRatio from the library, so the run's frozen document can be solved again.
 * Pure: the browser builds the same document for its preview as the server does for the save.
 */
import { buildSeepageDocument, type SeepageIssueForView } from "@/lib/section-seepage/document";
import type { MaterialConductivity, SeepageSettingsInput } from "@/lib/section-seepage/types";
import { withWater, type WaterCondition } from "@/lib/sections/water-conditions";
import type { SectionDocument } from "@/lib/stability";

/** What a section needs from outside its document for a seepage run under one water condition. */
export interface SeepageInputs {
  conductivities: MaterialConductivity[];
  settings: SeepageSettingsInput;
}

export type AttachedSeepage = { ok: true; section: SectionDocument } | { ok: false; errors: SeepageIssueForView[] };

/** The section (water conditions kept) with the seepage block and conductivities of one water condition. */
export function attachSeepage(
  section: SectionDocument,
  condition: WaterCondition,
  inputs: SeepageInputs,
): AttachedSeepage {
  const built = buildSeepageDocument(
    withWater(section, condition.water),
    condition,
    inputs.conductivities,
    inputs.settings,
  );
  if (!built.ok) return built;
  const byId = new Map(built.document.materials.map((m) => [m.id, m]));
  const materials = section.materials.map((m) => {
    const s = byId.get(m.id);
    return {
      ...m,
      ...(s?.k !== undefined ? { k: s.k } : {}),
      ...(s?.kRatio !== undefined ? { kRatio: s.kRatio } : {}),
    };
  });
  return { ok: true, section: { ...section, materials, seepage: built.document.seepage } as SectionDocument };
}

/** The water block of a run on seepage water: the solution replaces the condition's drawn line. */
export function seepageWaterBlock(gammaW: number | undefined): NonNullable<SectionDocument["water"]> {
  return gammaW === undefined ? { source: "seepage" } : { source: "seepage", gammaW };
}
