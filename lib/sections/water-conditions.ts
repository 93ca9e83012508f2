/**
 * Named water conditions of a section. A dam is checked under several waters (steady seepage at
 * the normal pool, at the flood pool, end of construction with no reservoir, a
 * drawdown from one pool to another), so the stored section keeps one engine `water` block per
 * condition and a run picks one. The engine still sees ONE `water` block: the chosen condition's
 * (see documentForRun in lib/analysis/run-setup.ts).
 *
 * Pool levels are not stored twice: the free water against each face is where the condition's
 * phreatic line stands above the ground at that edge (docs/engine-io.md, ponded water).
 */
import { z } from "zod";
import { sectionDocumentSchema, waterSchema, type SectionDocument, type Water } from "@/lib/stability";
import { LOADING_CONDITION_KEYS, type LoadingConditionKey } from "@/lib/analysis/required-fs";
import { groundProfile } from "@/lib/analysis/ground-profile";
import { elevationAt } from "@/lib/plane-geometry";

/**
 * construction: pore pressures of construction, no reservoir; steady: seepage from the pools;
 * drawdown: a pool lowered.
 */
export const WATER_KINDS = ["construction", "steady", "drawdown"] as const;
export type WaterKind = (typeof WATER_KINDS)[number];

export const WATER_KIND_LABELS: Record<WaterKind, string> = {
  construction: "Construction pore pressures, no reservoir",
  steady: "Steady seepage from the pools",
  drawdown: "Drawdown of the pool",
};

export const waterConditionSchema = z.object({
  id: z.string().regex(/^[a-z0-9][a-z0-9-]{0,39}$/, "Use 1 to 40 lower-case letters, digits and hyphens for the key."),
  name: z
    .string()
    .trim()
    .min(2, "Name the water condition (at least 2 characters).")
    .max(120, "At most 120 characters."),
  kind: z.enum(WATER_KINDS, { error: "Choose what kind of water this is." }),
  /** The engine's water block: a phreatic line, an ru value, or neither (dry). */
  water: waterSchema.optional(),
  /** drawdown only: the pool level after drawdown (m); the level before is the line's pool. */
  drawdownTo: z.number().finite().optional(),
  /** The loading conditions this water is the usual one for (each at most once in a section). */
  usualFor: z.array(z.enum(LOADING_CONDITION_KEYS)).default([]),
});

export type WaterCondition = z.infer<typeof waterConditionSchema>;

/** The stored section: the engine document plus its named water conditions. */
export type StoredSection = SectionDocument & { waterConditions?: WaterCondition[] };

/** A stored section version as it is frozen into a job: the engine's document plus its named waters. */
export const storedSectionSchema = sectionDocumentSchema.extend({
  waterConditions: z.array(waterConditionSchema).optional(),
});

/** The kind of water each loading condition calls for (common practice, e.g. USACE EM 1110-2-1902 ch. 3). */
export const USUAL_KIND: Record<LoadingConditionKey, WaterKind> = {
  "end-of-construction": "construction",
  "steady-seepage": "steady",
  "surcharge-pool": "steady",
  "drawdown-storage": "drawdown",
  "drawdown-surcharge": "drawdown",
};

/** Id of the one condition an older section (a single water block) is read as. */
export const SINGLE_WATER_ID = "section-water";

function storedConditions(doc: SectionDocument): WaterCondition[] | null {
  const raw = (doc as StoredSection).waterConditions;
  return Array.isArray(raw) && raw.length > 0 ? raw : null;
}

/** The section's water conditions; a section saved before they existed reads as one condition. */
export function waterConditionsOf(doc: SectionDocument): WaterCondition[] {
  const stored = storedConditions(doc);
  if (stored) return stored;
  return [
    {
      id: SINGLE_WATER_ID,
      name: "Section water line",
      kind: doc.water?.phreatic ? "steady" : "construction",
      water: doc.water,
      usualFor: [],
    },
  ];
}

/** Free-water level against each edge of the section (m), or null where the line is not above the ground. */
export function poolLevels(
  doc: SectionDocument,
  water: Water | undefined,
): { left: number | null; right: number | null } {
  const line = water?.phreatic;
  const ground = groundProfile(doc);
  if (!line || line.length < 2 || ground.length < 2) return { left: null, right: null };
  const at = (x: number, g: number) => {
    const y = elevationAt(line, x);
    return y > g + 1e-6 ? y : null;
  };
  return { left: at(ground[0][0], ground[0][1]), right: at(ground.at(-1)![0], ground.at(-1)![1]) };
}

/** The pool a drawdown starts from: the higher of the two edge pools. */
export function poolBefore(doc: SectionDocument, water: Water | undefined): number | null {
  const { left, right } = poolLevels(doc, water);
  if (left === null) return right;
  if (right === null) return left;
  return Math.max(left, right);
}

/**
 * The water a loading condition usually takes: the condition marked as usual for it, else the
 * first of the kind it calls for, else the first condition.
 */
export function pickWaterCondition(doc: SectionDocument, key: LoadingConditionKey): WaterCondition {
  const all = waterConditionsOf(doc);
  return all.find((c) => c.usualFor.includes(key)) ?? all.find((c) => c.kind === USUAL_KIND[key]) ?? all[0];
}

/** The condition with this id, or null. */
export function findWaterCondition(doc: SectionDocument, id: string): WaterCondition | null {
  return waterConditionsOf(doc).find((c) => c.id === id) ?? null;
}

/** What an engineer should know when the chosen water is not the kind the loading condition calls for. */
export function waterMismatch(doc: SectionDocument, key: LoadingConditionKey, c: WaterCondition): string | null {
  const wanted = USUAL_KIND[key];
  if (wanted === "construction") {
    const pools = poolLevels(doc, c.water);
    if (pools.left !== null || pools.right !== null)
      return "This water keeps a reservoir against the section; end of construction usually has none.";
  }
  if (wanted === "drawdown" && !c.water?.phreatic)
    return "A drawdown needs a phreatic line before drawdown; this water has none.";
  if (wanted !== c.kind && !(wanted === "drawdown" && c.kind === "steady"))
    return (
      `This water is “${WATER_KIND_LABELS[c.kind].toLowerCase()}”; ` +
      `the loading condition usually takes “${WATER_KIND_LABELS[wanted].toLowerCase()}”.`
    );
  return null;
}

/** The engine document without the conditions, with the given water block. */
export function withWater(doc: SectionDocument, water: Water | undefined): SectionDocument {
  const rest = { ...(doc as StoredSection) };
  delete rest.waterConditions;
  delete rest.water;
  return water ? { ...rest, water } : rest;
}
