/** A material key: a lowercase slug, as the section document refers to materials by it. */
export const MATERIAL_KEY_PATTERN = /^[a-z][a-z0-9-]{0,59}$/;

export const MATERIAL_KEY_HINT =
  "Use 1–60 characters: a lowercase letter first, then lowercase letters, digits or hyphens (e.g. core-clay).";

/** Whether `key` is a valid material key. */
export function isMaterialKey(key: string): boolean {
  return MATERIAL_KEY_PATTERN.test(key);
}

/**
 * Suggests a key from a display name: "Compacted clay fill (zone 2)" → "compacted-clay-fill-zone-2".
 * Returns "" when the name has no letter to start with.
 */
export function suggestMaterialKey(name: string): string {
  const slug = name
    .normalize("NFKD")
    .replace(/[\u0300-\u036f]/g, "")
    .toLowerCase()
    .replace(/[^a-z0-9]+/g, "-")
    .replace(/^[^a-z]+/, "")
    .replace(/-+$/, "");
  return slug.slice(0, 60).replace(/-+$/, "");
}
