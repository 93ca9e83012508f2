/**
 * Sequential colour scales for the map of lowest FS over the centre grid. Both are
 * perceptually uniform and stay readable for colour-blind viewers and in greyscale print,
 * because their lightness rises steadily from one end to the other.
 *
 * Control points are every 16th entry (plus the last) of the published 256-entry tables
 * in matplotlib's `_cm_listed.py`:
 * - cividis: Nuñez, Anderton & Renslow (2018), "Optimizing colormaps with consideration
 *   for color vision deficiency to enable accurate interpretation of scientific data",
 *   PLoS ONE 13(7): e0199239.
 * - viridis: van der Walt & Smith (2015), matplotlib's default colour map.
 * Between control points the scale interpolates linearly in sRGB.
 */

/** An sRGB colour with channels in [0, 1]. */
export type Rgb = readonly [number, number, number];

/** A scale: control colours evenly spread over t ∈ [0, 1]. */
export interface ColourScale {
  name: "cividis" | "viridis";
  stops: readonly { t: number; rgb: Rgb }[];
}

function fromTable(
  name: ColourScale["name"],
  rows: readonly (readonly [number, number, number, number])[],
): ColourScale {
  // Each row is [table index 0–255, r, g, b]; the index fixes where the colour sits on t.
  return { name, stops: rows.map(([i, r, g, b]) => ({ t: i / 255, rgb: [r, g, b] as const })) };
}

/** cividis, entries 0, 16, …, 240, 255 of the published table. */
export const CIVIDIS: ColourScale = fromTable("cividis", [
  [0, 0.0, 0.135112, 0.304751],
  [16, 0.0, 0.178802, 0.414764],
  [32, 0.103401, 0.220406, 0.43579],
  [48, 0.195057, 0.264372, 0.425924],
  [64, 0.263738, 0.307831, 0.422789],
  [80, 0.32425, 0.351289, 0.42625],
  [96, 0.38083, 0.395164, 0.435653],
  [112, 0.435168, 0.439763, 0.451134],
  [128, 0.488697, 0.485318, 0.471008],
  [144, 0.54784, 0.531895, 0.471704],
  [160, 0.609105, 0.579816, 0.463638],
  [176, 0.671991, 0.629316, 0.448018],
  [192, 0.736488, 0.680629, 0.424028],
  [208, 0.802667, 0.733978, 0.390153],
  [224, 0.870717, 0.789572, 0.343333],
  [240, 0.941147, 0.84753, 0.275815],
  [255, 0.995737, 0.909344, 0.217772],
]);

/** viridis, entries 0, 32, …, 224, 255 of the published table (8-bit values). */
export const VIRIDIS: ColourScale = fromTable(
  "viridis",
  [
    [0, 68, 1, 84],
    [32, 71, 44, 122],
    [64, 59, 81, 139],
    [96, 44, 113, 142],
    [128, 33, 144, 141],
    [160, 39, 173, 129],
    [192, 92, 200, 99],
    [224, 170, 220, 50],
    [255, 253, 231, 37],
  ].map(([i, r, g, b]) => [i, r / 255, g / 255, b / 255] as const),
);

/**
 * Colour of the scale at t (clamped to [0, 1]).
 * @returns sRGB channels in [0, 1]
 */
export function sampleScale(scale: ColourScale, t: number): Rgb {
  const s = scale.stops;
  const u = Number.isFinite(t) ? Math.min(1, Math.max(0, t)) : 0;
  let k = 0;
  while (k < s.length - 2 && s[k + 1].t < u) k++;
  const a = s[k];
  const b = s[k + 1];
  const f = b.t === a.t ? 0 : (u - a.t) / (b.t - a.t);
  return [
    a.rgb[0] + (b.rgb[0] - a.rgb[0]) * f,
    a.rgb[1] + (b.rgb[1] - a.rgb[1]) * f,
    a.rgb[2] + (b.rgb[2] - a.rgb[2]) * f,
  ];
}

/** `#rrggbb` of an sRGB colour. */
export function rgbToHex(rgb: Rgb): string {
  const h = (v: number) =>
    Math.round(Math.min(1, Math.max(0, v)) * 255)
      .toString(16)
      .padStart(2, "0");
  return `#${h(rgb[0])}${h(rgb[1])}${h(rgb[2])}`;
}

/** `#rrggbb` of the scale at t. */
export function scaleHex(scale: ColourScale, t: number): string {
  return rgbToHex(sampleScale(scale, t));
}

/** The scale the FS map uses: cividis, chosen for readers with red–green colour vision deficiency. */
export const FS_MAP_SCALE = CIVIDIS;
