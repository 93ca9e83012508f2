/**
 * Region fills for materials that have no colour of their own: muted tones from a palette chosen
 * to stay distinct for the common colour-vision deficiencies (after Okabe & Ito's 2008 set,
 * lightened for area fills so outlines and result lines stay readable on top).
 */
export const MATERIAL_FILLS = ["#9cc3e6", "#e8c07a", "#8fcfb5", "#e8a98f", "#c6a8d6", "#d8d08a", "#b0b0b0", "#a3d2e8"];

export function materialPalette(
  materials: { id: string; name?: string; color?: string }[],
): { key: string; name: string; color: string }[] {
  return materials.map((m, i) => ({
    key: m.id,
    name: m.name ?? m.id,
    color: m.color ?? MATERIAL_FILLS[i % MATERIAL_FILLS.length],
  }));
}
