import type { SectionDocument } from "@/lib/stability";

/**
 * An invented two-region embankment on a foundation, 60 m wide: fill on top of a clay
 * layer; the two share the vertices (20, 10) and (50, 10) exactly.
 */
export function embankment(): SectionDocument {
  return {
    version: 1,
    materials: [
      { id: "fill", model: "mohr-coulomb", gamma: 19, c: 5, phi: 30 },
      { id: "clay", model: "undrained", gamma: 17, su: 30 },
    ],
    regions: [
      {
        material: "fill",
        points: [
          [20, 10],
          [25, 20],
          [35, 20],
          [50, 10],
        ],
      },
      {
        material: "clay",
        points: [
          [0, 0],
          [60, 0],
          [60, 10],
          [50, 10],
          [20, 10],
          [0, 10],
        ],
      },
    ],
    water: {
      phreatic: [
        [0, 12],
        [22, 12],
        [50, 9],
        [60, 9],
      ],
    },
  };
}
