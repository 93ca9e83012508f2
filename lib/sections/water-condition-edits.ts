/**
 * Edits of a section's named water conditions, as pure document-in, document-out steps for the
 * editor's undo history. The editor draws one water at a time: the document's own `water` is
 * the drawn copy of the condition being edited, written back into it on every edit.
 */
import type { SectionDocument, Water } from "@/lib/stability";
import { waterConditionsOf, type StoredSection, type WaterCondition } from "./water-conditions";

const sameWater = (a: Water | undefined, b: Water | undefined) =>
  JSON.stringify(a ?? null) === JSON.stringify(b ?? null);

/** The condition the drawn water belongs to: the one whose water it is, else the first. */
export function drawnConditionId(doc: SectionDocument): string {
  const all = waterConditionsOf(doc);
  return (all.find((c) => sameWater(c.water, doc.water)) ?? all[0]).id;
}

function setConditions(doc: SectionDocument, conditions: WaterCondition[]): StoredSection {
  return { ...doc, waterConditions: conditions };
}

/** Writes the drawn water into the condition being edited (a section with one water is left alone). */
export function keepDrawnWater(doc: SectionDocument, activeId: string): SectionDocument {
  const stored = (doc as StoredSection).waterConditions;
  if (!stored || stored.length === 0) return doc;
  const i = stored.findIndex((c) => c.id === activeId);
  if (i < 0 || sameWater(stored[i].water, doc.water)) return doc;
  const next = stored.slice();
  next[i] = { ...next[i], water: doc.water };
  return setConditions(doc, next);
}

/**
 * The stored document after an edit of the drawing made while `activeId` is drawn: the edited
 * water goes into that condition, and the document's own water changes only when it is that
 * condition's (so looking at another condition is not an edit).
 */
export function storeDrawnWater(stored: SectionDocument, edited: SectionDocument, activeId: string): SectionDocument {
  const kept = keepDrawnWater(edited, activeId);
  if (!(stored as StoredSection).waterConditions?.length || drawnConditionId(stored) === activeId) return kept;
  const out = { ...kept } as StoredSection;
  if (stored.water) out.water = stored.water;
  else delete out.water;
  return out;
}

/** Draws another condition's water for editing. */
export function showWaterCondition(doc: SectionDocument, id: string): SectionDocument {
  const c = waterConditionsOf(doc).find((x) => x.id === id);
  if (!c) return doc;
  const out = { ...doc } as StoredSection;
  if (c.water) out.water = c.water;
  else delete out.water;
  return out;
}

/** A key from a name: lower-case words joined by hyphens, made unique among the others. */
export function conditionKey(name: string, taken: readonly string[]): string {
  const base =
    name
      .toLowerCase()
      .replace(/[^a-z0-9]+/g, "-")
      .replace(/^-+|-+$/g, "")
      .slice(0, 34) || "water";
  let key = base;
  for (let n = 2; taken.includes(key); n++) key = `${base}-${n}`;
  return key;
}

/** Adds a condition starting from a copy of the drawn water; a one-water section first becomes a list. */
export function addWaterCondition(doc: SectionDocument, name: string): { doc: SectionDocument; id: string } {
  const all = waterConditionsOf(doc);
  const id = conditionKey(
    name,
    all.map((c) => c.id),
  );
  const added: WaterCondition = {
    id,
    name,
    kind: doc.water?.phreatic ? "steady" : "construction",
    water: doc.water,
    usualFor: [],
  };
  return { doc: setConditions(doc, [...all, added]), id };
}

/** Changes a condition's name, kind, lowered pool or the loading conditions it is usual for. */
export function updateWaterCondition(
  doc: SectionDocument,
  id: string,
  patch: Partial<Pick<WaterCondition, "name" | "kind" | "drawdownTo" | "usualFor">>,
): SectionDocument {
  const all = waterConditionsOf(doc).map((c) => {
    if (c.id !== id) return c;
    const next = { ...c, ...patch };
    if (next.kind !== "drawdown") delete next.drawdownTo;
    return next;
  });
  return setConditions(doc, all);
}

/** Removes a condition (never the last); the drawn water becomes the first remaining one's. */
export function removeWaterCondition(doc: SectionDocument, id: string): { doc: SectionDocument; shown: string } | null {
  const all = waterConditionsOf(doc);
  if (all.length <= 1) return null;
  const rest = all.filter((c) => c.id !== id);
  return { doc: showWaterCondition(setConditions(doc, rest), rest[0].id), shown: rest[0].id };
}
