/**
 * The one material palette: the editor, the run canvas, the comparison, the import preview and the
 * PDF all colour a material through materialPalette, so a material has one colour everywhere.
 *
 * Region fills for materials without a colour of their own are muted tones after Okabe & Ito's
 * 2008 colour-blind-safe set, lightened for area fills so outlines and result lines stay readable
 * on top. Blue is kept for water alone: no fill is blue, and a material's own colour in the blue
 * family is replaced by the palette's, so a region never reads as the pool or the phreatic line.
 */
export const MATERIAL_FILLS = ["#e8c07a", "#8fcfb5", "#e8a98f", "#c6a8d6", "#d8d08a", "#c9b49a", "#b0b0b0", "#a9c98f"];

/** Impenetrable layers (bedrock) take a stone grey unless they carry their own colour. */
const IMPENETRABLE_FILL = "#bdb7ab";

function hueAndSaturation(hex: string): { hue: number; saturation: number } | null {
  const m = /^#([0-9a-f]{6})$/i.exec(hex.trim());
  if (!m) return null;
  const n = parseInt(m[1], 16);
  const [r, g, b] = [(n >> 16) & 255, (n >> 8) & 255, n & 255].map((v) => v / 255);
  const max = Math.max(r, g, b);
  const min = Math.min(r, g, b);
  const l = (max + min) / 2;
  const d = max - min;
  if (d === 0) return { hue: 0, saturation: 0 };
  const saturation = d / (1 - Math.abs(2 * l - 1));
  const hue = max === r ? 60 * (((g - b) / d) % 6) : max === g ? 60 * ((b - r) / d + 2) : 60 * ((r - g) / d + 4);
  return { hue: (hue + 360) % 360, saturation };
}

/**
 * Whether a colour reads as water: a blue between cyan and ultramarine (hue 180–250°) with some
 * saturation. The water line (#0072b2) and pond fill (#56b4e9) of the canvases both fall inside.
 */
export function isWaterLike(hex: string): boolean {
  const hs = hueAndSaturation(hex);
  return hs !== null && hs.hue >= 180 && hs.hue <= 250 && hs.saturation >= 0.2;
}

export function materialPalette(
  materials: { id: string; name?: string; color?: string; model?: string }[],
): { key: string; name: string; color: string }[] {
  return materials.map((m, i) => ({
    key: m.id,
    name: m.name ?? m.id,
    color:
      m.color && /^#[0-9a-f]{6}$/i.test(m.color) && !isWaterLike(m.color)
        ? m.color
        : m.model === "impenetrable"
          ? IMPENETRABLE_FILL
          : MATERIAL_FILLS[i % MATERIAL_FILLS.length],
  }));
}

/** Fill per material id, from the one palette. */
export function materialColorMap(
  materials: { id: string; name?: string; color?: string; model?: string }[],
): Record<string, string> {
  return Object.fromEntries(materialPalette(materials).map((m) => [m.key, m.color]));
}
