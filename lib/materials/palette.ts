/**
 * Material colours: Paul Tol's "muted" qualitative scheme, chosen to stay apart for readers with
 * the common colour-vision deficiencies (P. Tol, "Colour Schemes", SRON/EPS/TN/09-002, 2021).
 * Pale grey is left out: it is reserved for impenetrable ground.
 */
export const MATERIAL_COLORS = [
  "#CC6677",
  "#332288",
  "#DDCC77",
  "#117733",
  "#88CCEE",
  "#882255",
  "#44AA99",
  "#999933",
  "#AA4499",
] as const;

/** Colour for impenetrable materials (rock): Tol's pale grey. */
export const IMPENETRABLE_COLOR = "#DDDDDD";

/** A colour written as #RRGGBB. */
export const HEX_COLOR = /^#[0-9a-fA-F]{6}$/;

/**
 * The first palette colour not already in use (case-insensitive); when all are taken the palette
 * repeats in order, so a large library still gets colours spread over the whole palette.
 */
export function pickMaterialColor(used: readonly string[]): string {
  const taken = new Set(used.map((c) => c.toUpperCase()));
  const free = MATERIAL_COLORS.find((c) => !taken.has(c));
  return free ?? MATERIAL_COLORS[used.length % MATERIAL_COLORS.length];
}

/** Colours for several new materials at once, each also avoiding the ones picked before it. */
export function pickMaterialColors(used: readonly string[], count: number): string[] {
  const all = [...used];
  const out: string[] = [];
  for (let i = 0; i < count; i++) {
    const c = pickMaterialColor(all);
    out.push(c);
    all.push(c);
  }
  return out;
}
