import { describe, expect, test } from "vitest";
import { isWaterLike, MATERIAL_FILLS, materialPalette } from "@/lib/sections/material-palette";
import { materialFills } from "@/lib/runs/view/material-tints";
import { CANVAS_COLORS } from "@/components/section-editor/palette";
import type { SectionDocument } from "@/lib/stability";

/** WCAG 2.1 relative luminance and contrast ratio (W3C, Web Content Accessibility Guidelines 2.1, §1.4.3). */
function luminance(hex: string): number {
  const n = parseInt(hex.slice(1), 16);
  const [r, g, b] = [(n >> 16) & 255, (n >> 8) & 255, n & 255].map((v) => {
    const c = v / 255;
    return c <= 0.03928 ? c / 12.92 : ((c + 0.055) / 1.055) ** 2.4;
  });
  return 0.2126 * r + 0.7152 * g + 0.0722 * b;
}
const contrast = (a: string, b: string) => {
  const [hi, lo] = [luminance(a), luminance(b)].sort((x, y) => y - x);
  return (hi + 0.05) / (lo + 0.05);
};

const doc = {
  version: 1,
  materials: [
    { id: "fill", model: "mohr-coulomb", gamma: 19, c: 5, phi: 30 },
    { id: "blue-clay", model: "mohr-coulomb", gamma: 18, c: 10, phi: 22, color: "#3a7bd5" },
    { id: "sand", model: "mohr-coulomb", gamma: 20, c: 0, phi: 34, color: "#d2a05a" },
    { id: "rock", model: "impenetrable" },
  ],
  regions: [],
} as unknown as SectionDocument;

describe("one material palette", () => {
  test("the canvas water colours read as water; no palette fill does", () => {
    expect(isWaterLike(CANVAS_COLORS.waterLine)).toBe(true);
    expect(isWaterLike(CANVAS_COLORS.pondFill)).toBe(true);
    for (const fill of MATERIAL_FILLS) expect(isWaterLike(fill), fill).toBe(false);
  });

  test("a material's own blue is replaced; its other colours are kept; rock is stone grey", () => {
    const colours = Object.fromEntries(materialPalette(doc.materials).map((m) => [m.key, m.color]));
    expect(isWaterLike(colours["blue-clay"])).toBe(false);
    expect(colours.sand).toBe("#d2a05a");
    expect(colours.rock).toBe("#bdb7ab");
  });

  test("the run canvas gives each material the colour the editor and the PDF give it", () => {
    const palette = Object.fromEntries(materialPalette(doc.materials).map((m) => [m.key, m.color]));
    expect(materialFills(doc)).toEqual(palette);
  });

  test("hint text (ink-faint) meets WCAG AA 4.5:1 on every page background", () => {
    // Values of tailwind.config.ts: ink.faint on paper, paper.raised and paper.sunk.
    for (const bg of ["#f6f4ef", "#fffdf8", "#ece8df"])
      expect(contrast(CANVAS_COLORS.inkFaint, bg)).toBeGreaterThanOrEqual(4.5);
  });
});
