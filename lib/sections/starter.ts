import type { SectionDocument } from "@/lib/stability";

/**
 * The drawing a new section starts from when nothing is imported: a plain 8 m bank at 2H:1V on
 * level ground with a firm base, one fill material with typical values. It is meant to be redrawn.
 */
export function starterSection(): SectionDocument {
  return {
    version: 1,
    materials: [
      { id: "fill", name: "Fill (edit me)", model: "mohr-coulomb", gamma: 19, gammaSat: 20, c: 5, phi: 28 },
      { id: "base", name: "Firm base", model: "impenetrable", gamma: 22 },
    ],
    regions: [
      {
        name: "Base",
        material: "base",
        points: [
          [0, -2],
          [60, -2],
          [60, 0],
          [0, 0],
        ],
      },
      {
        name: "Bank",
        material: "fill",
        points: [
          [10, 0],
          [60, 0],
          [60, 4],
          [42, 4],
          [34, 8],
          [26, 8],
        ],
      },
    ],
    water: { gammaW: 9.81 },
  };
}
