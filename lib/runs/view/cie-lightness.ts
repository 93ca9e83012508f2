/**
 * CIE 1976 L* (lightness) of an sRGB colour, used to check that the map's scale grows
 * steadily lighter and to pick readable label colours over it.
 *
 * sRGB decoding follows IEC 61966-2-1:1999; relative luminance uses the sRGB/ITU-R BT.709
 * primaries (Y = 0.2126 R + 0.7152 G + 0.0722 B); L* follows CIE 15:2004 (CIELAB):
 * L* = 116·f(Y/Yn) − 16, f(t) = t^(1/3) above (6/29)³, else t/(3·(6/29)²) + 4/29.
 */
import type { Rgb } from "./colour-scale";

/** Linear-light value of one sRGB channel in [0, 1]. */
export function srgbToLinear(v: number): number {
  return v <= 0.04045 ? v / 12.92 : ((v + 0.055) / 1.055) ** 2.4;
}

/** Relative luminance Y in [0, 1] (white = 1). */
export function relativeLuminance(rgb: Rgb): number {
  return 0.2126 * srgbToLinear(rgb[0]) + 0.7152 * srgbToLinear(rgb[1]) + 0.0722 * srgbToLinear(rgb[2]);
}

const EPS = (6 / 29) ** 3;

/** CIE L* in [0, 100] of an sRGB colour. */
export function cieLightness(rgb: Rgb): number {
  const y = relativeLuminance(rgb);
  const f = y > EPS ? Math.cbrt(y) : y / (3 * (6 / 29) ** 2) + 4 / 29;
  return 116 * f - 16;
}

/** Ink or white, whichever reads better on a background of the given colour. */
export function labelInkFor(rgb: Rgb): "#1f1d1a" | "#ffffff" {
  return cieLightness(rgb) > 55 ? "#1f1d1a" : "#ffffff";
}
